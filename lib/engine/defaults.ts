/**
 * Starting standards a coach edits per rung. Every number here is common practice, no source
 * (design.md §4): holds of about 20 s, three working sets, two good sessions out of three, a week
 * on the rung, no pain.
 */
import type { Measure, Standard, StepDownRule } from "./types";

/**
 * The limit on each of a standard's look-backs: the sessions window, the pain window and the run of
 * drops are each at most this many (the validation's bounds), so lookbackSessions never exceeds it.
 */
export const MAX_LOOKBACK_SESSIONS = 20;

// common practice, no source
export const DEFAULT_STEP_DOWN: StepDownRule = {
  painSessions: 2,
  painWindow: 3,
  dropBelowPct: 70,
  dropSessions: 2,
};

// common practice, no source
const SHARED = {
  sets: 3,
  maxRpe: 7,
  minRir: null,
  sessionsRequired: 2,
  sessionsWindow: 3,
  minDaysOnRung: 7,
  painFree: true,
} as const;

/** Per-measure targets (common practice, no source). */
const TARGETS: Record<Measure, Pick<Standard, "minValue" | "minReps">> = {
  hold_seconds: { minValue: 20, minReps: null },
  reps: { minValue: 8, minReps: null },
  // 3 lowerings per set, each at least 5 s.
  eccentric_seconds: { minValue: 5, minReps: 3 },
  distance_m: { minValue: 10, minReps: null },
  // Judged on the weaker side; same hold time as the two-sided version.
  hold_seconds_each_side: { minValue: 20, minReps: null },
  // One-sided reps are harder; fewer per side.
  reps_each_side: { minValue: 6, minReps: null },
};

export function defaultStandard(measure: Measure): Standard {
  return { ...SHARED, ...TARGETS[measure], stepDown: { ...DEFAULT_STEP_DOWN } };
}
