/** What one logged set is worth against a standard. */
import { effortOk } from "./effort";
import type { Measure, SetEntry, Standard } from "./types";

export function isEachSide(measure: Measure): boolean {
  return measure === "hold_seconds_each_side" || measure === "reps_each_side";
}

function finite(n: number | null | undefined): n is number {
  return typeof n === "number" && Number.isFinite(n);
}

/**
 * The number a set is judged on. Each-side measures count the weaker side; when neither side was
 * logged, `value` is taken as the per-side figure. One side missing means the set can't be judged.
 */
export function setValue(measure: Measure, set: SetEntry): number | null {
  if (isEachSide(measure)) {
    const hasLeft = finite(set.left);
    const hasRight = finite(set.right);
    if (hasLeft && hasRight) return Math.min(set.left as number, set.right as number);
    if (!hasLeft && !hasRight && finite(set.value)) return set.value;
    return null;
  }
  return finite(set.value) ? set.value : null;
}

/** Eccentric standards with `minReps` also need that many lowerings; nothing else uses minReps. */
function needsReps(measure: Measure, standard: Standard): boolean {
  return measure === "eccentric_seconds" && finite(standard.minReps);
}

/** Value (and lowerings) reach the standard, effort aside. */
export function setMeetsValue(measure: Measure, standard: Standard, set: SetEntry): boolean {
  const value = setValue(measure, set);
  if (value === null || value < standard.minValue) return false;
  if (needsReps(measure, standard)) return finite(set.reps) && set.reps >= (standard.minReps as number);
  return true;
}

/** A set that counts toward the standard: value reached within the effort ceiling. */
export function setQualifies(measure: Measure, standard: Standard, set: SetEntry): boolean {
  return setMeetsValue(measure, standard, set) && effortOk(set, standard);
}

/**
 * Partial credit of one set for readiness, 0–1: share of the target value (and of the lowerings
 * for eccentric standards), halved when the set went past the effort ceiling.
 */
export function setFraction(measure: Measure, standard: Standard, set: SetEntry): number {
  const value = setValue(measure, set);
  if (value === null) return 0;
  let fraction = standard.minValue > 0 ? Math.min(1, Math.max(0, value) / standard.minValue) : 1;
  if (needsReps(measure, standard)) {
    const minReps = standard.minReps as number;
    const reps = finite(set.reps) ? set.reps : 0;
    fraction *= minReps > 0 ? Math.min(1, Math.max(0, reps) / minReps) : 1;
  }
  return effortOk(set, standard) ? fraction : fraction / 2;
}
