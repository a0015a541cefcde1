/**
 * Effort on the RIR-based RPE scale of Zourdos et al. 2016 (J Strength Cond Res 30(1):267–275):
 * RPE 10 ↔ 0 reps in reserve, 9 ↔ 1, 8 ↔ 2, 7 ↔ 3, i.e. rpe = 10 − rir.
 */
import type { SetEntry, Standard } from "./types";

export function rpeFromRir(rir: number): number {
  return 10 - rir;
}

export function rirFromRpe(rpe: number): number {
  return 10 - rpe;
}

/**
 * The effort of a set on the RPE scale, or null when none was recorded. When both were recorded
 * and disagree, the harder reading wins: the standard is a ceiling, so doubt goes against promotion.
 */
export function setRpe(set: SetEntry): number | null {
  const fromRpe = typeof set.rpe === "number" ? set.rpe : null;
  const fromRir = typeof set.rir === "number" ? rpeFromRir(set.rir) : null;
  if (fromRpe === null) return fromRir;
  if (fromRir === null) return fromRpe;
  return Math.max(fromRpe, fromRir);
}

/**
 * Whether a set stays within the standard's effort ceiling (maxRpe, minRir, or both — then both).
 * A set with no effort recorded is NOT held against the athlete: effort is optional in the log
 * form, and the coach reads missing effort from the log itself; the value still has to be met.
 */
export function effortOk(set: SetEntry, standard: Pick<Standard, "maxRpe" | "minRir">): boolean {
  const hasMaxRpe = typeof standard.maxRpe === "number";
  const hasMinRir = typeof standard.minRir === "number";
  if (!hasMaxRpe && !hasMinRir) return true;
  const rpe = setRpe(set);
  if (rpe === null) return true;
  if (hasMaxRpe && rpe > (standard.maxRpe as number)) return false;
  if (hasMinRir && rirFromRpe(rpe) < (standard.minRir as number)) return false;
  return true;
}
