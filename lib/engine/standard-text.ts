/**
 * A standard in plain words, e.g. "3 sets of at least 20 s at RPE 7 or easier, in 2 of the last 3
 * sessions, at least 7 days on this rung, pain-free".
 */
import { formatValue } from "./format-value";
import type { Measure, Standard } from "./types";

function plural(n: number, one: string, many: string): string {
  return `${n} ${n === 1 ? one : many}`;
}

/** "at RPE 7 or easier", "with at least 3 reps in reserve", both joined by "and", or null. */
export function effortCeilingText(standard: Pick<Standard, "maxRpe" | "minRir">): string | null {
  const parts: string[] = [];
  if (typeof standard.maxRpe === "number") parts.push(`at RPE ${standard.maxRpe} or easier`);
  if (typeof standard.minRir === "number") parts.push(`with at least ${plural(standard.minRir, "rep", "reps")} in reserve`);
  return parts.length > 0 ? parts.join(" and ") : null;
}

function setsText(measure: Measure, standard: Standard): string {
  const sets = plural(standard.sets, "set", "sets");
  if (measure === "eccentric_seconds") {
    const lowerings = typeof standard.minReps === "number" ? `${plural(standard.minReps, "lowering", "lowerings")} ` : "lowerings ";
    return `${sets} of ${lowerings}of at least ${formatValue(measure, standard.minValue)}`;
  }
  return `${sets} of at least ${formatValue(measure, standard.minValue)}`;
}

function sessionsText(standard: Standard): string | null {
  const k = standard.sessionsRequired;
  const n = standard.sessionsWindow;
  if (k <= 0) return null;
  if (n <= 1) return "in the latest session";
  if (k >= n) return `in each of the last ${n} sessions`;
  return `in ${k} of the last ${n} sessions`;
}

export function describeStandard(measure: Measure, standard: Standard): string {
  const first = [setsText(measure, standard), effortCeilingText(standard)].filter(Boolean).join(" ");
  const parts = [first, sessionsText(standard)];
  if (standard.minDaysOnRung > 0) parts.push(`at least ${plural(standard.minDaysOnRung, "day", "days")} on this rung`);
  if (standard.painFree) parts.push("pain-free");
  return parts.filter((p): p is string => Boolean(p)).join(", ");
}

export { formatValue } from "./format-value";
