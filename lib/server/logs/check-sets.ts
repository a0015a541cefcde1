import "server-only";
import { isEachSide } from "@/lib/engine/set-value";
import type { Measure, SetEntry } from "@/lib/engine/types";
import { Unprocessable, type FieldIssue } from "@/lib/errors";
import { SET_LIMITS, type SetInput } from "@/lib/validation/logs";

function limitOf(measure: Measure): { max: number; whole: boolean; unit: string } {
  switch (measure) {
    case "reps":
    case "reps_each_side":
      return { max: SET_LIMITS.reps, whole: true, unit: "reps" };
    case "distance_m":
      return { max: SET_LIMITS.metres, whole: false, unit: "metres" };
    default:
      return { max: SET_LIMITS.seconds, whole: false, unit: "seconds" };
  }
}

/**
 * Checks sets against the rung's measure (the schema already bounded every number): each-side
 * measures take left and right, the others one value; reps are whole and at most 300 per set;
 * lowerings only on eccentric rungs. Returns the sets as stored (no undefined keys) or throws 422
 * naming every offending field under `path`.
 */
export function checkSets(measure: Measure, sets: readonly SetInput[], path: string): SetEntry[] {
  const issues: FieldIssue[] = [];
  const limit = limitOf(measure);
  const sided = isEachSide(measure);
  const stored = sets.map((set, i) => {
    const at = `${path}.${i}`;
    const amounts: [string, number | undefined][] = sided ? [["left", set.left], ["right", set.right]] : [["value", set.value]];
    if (sided && set.value !== undefined) issues.push({ path: `${at}.left`, message: "This rung is logged per side: send left and right." });
    if (!sided && (set.left !== undefined || set.right !== undefined)) issues.push({ path: `${at}.value`, message: "This rung takes one value per set." });
    for (const [field, amount] of amounts) {
      if (amount === undefined) continue;
      if (amount > limit.max) issues.push({ path: `${at}.${field}`, message: `At most ${limit.max} ${limit.unit} per set.` });
      if (limit.whole && !Number.isInteger(amount)) issues.push({ path: `${at}.${field}`, message: "Reps are whole numbers." });
    }
    if (set.reps !== undefined && measure !== "eccentric_seconds") {
      issues.push({ path: `${at}.reps`, message: "Lowerings apply to eccentric rungs only." });
    }
    const entry: SetEntry = {};
    if (set.value !== undefined) entry.value = set.value;
    if (set.left !== undefined) entry.left = set.left;
    if (set.right !== undefined) entry.right = set.right;
    if (set.reps !== undefined) entry.reps = set.reps;
    if (set.rpe !== undefined) entry.rpe = set.rpe;
    if (set.rir !== undefined) entry.rir = set.rir;
    return entry;
  });
  if (issues.length > 0) throw new Unprocessable("Some sets do not fit this rung.", issues);
  return stored;
}
