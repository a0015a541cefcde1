/**
 * Small builders for the readiness standards of the starter library, starting from the defaults in
 * the design brief §4 (hold 3 × ≥ 20 s at RPE ≤ 7, 2 of the last 3 sessions, ≥ 7 days on the rung,
 * pain-free; reps 3 × 8; eccentric 3 × 3 lowerings of ≥ 5 s).
 *
 * The progressions and numbers are common practice, no source; a coach should adjust them.
 */
import type { Standard, StepDownRule } from "../engine/types";

/** Exactly one effort ceiling: RPE or RIR. `null` in options means no ceiling at all. */
export type Effort = { readonly maxRpe: number } | { readonly minRir: number };

export interface StandardOptions {
  readonly sets?: number;
  readonly effort?: Effort | null;
  readonly sessionsRequired?: number;
  readonly sessionsWindow?: number;
  readonly minDaysOnRung?: number;
  /** `null` for the first rung of a ladder: there is nothing below it to step down to. */
  readonly stepDown?: StepDownRule | null;
}

/** Two pain sessions in the last three, or two sessions in a row under 70 % of the standard. */
export const DEFAULT_STEP_DOWN: Readonly<StepDownRule> = {
  painSessions: 2,
  painWindow: 3,
  dropBelowPct: 70,
  dropSessions: 2,
};

const DEFAULT_EFFORT: Effort = { maxRpe: 7 };

function buildStandard(minValue: number, minReps: number | null, options: StandardOptions): Standard {
  const effort = options.effort === undefined ? DEFAULT_EFFORT : options.effort;
  const stepDown = options.stepDown === undefined ? DEFAULT_STEP_DOWN : options.stepDown;
  return {
    sets: options.sets ?? 3,
    minValue,
    minReps,
    maxRpe: effort !== null && "maxRpe" in effort ? effort.maxRpe : null,
    minRir: effort !== null && "minRir" in effort ? effort.minRir : null,
    sessionsRequired: options.sessionsRequired ?? 2,
    sessionsWindow: options.sessionsWindow ?? 3,
    minDaysOnRung: options.minDaysOnRung ?? 7,
    painFree: true,
    stepDown: stepDown === null ? null : { ...stepDown },
  };
}

/** Hold rungs (`hold_seconds`, `hold_seconds_each_side`): seconds per set, weaker side for each-side. */
export function holdStandard(seconds: number, options: StandardOptions = {}): Standard {
  return buildStandard(seconds, null, options);
}

/** Rep rungs (`reps`, `reps_each_side`): reps per set, weaker side for each-side. */
export function repsStandard(reps: number, options: StandardOptions = {}): Standard {
  return buildStandard(reps, null, options);
}

/** Eccentric rungs: `lowerings` per set, each lasting at least `seconds`. */
export function eccentricStandard(
  lowering: { readonly lowerings: number; readonly seconds: number },
  options: StandardOptions = {},
): Standard {
  return buildStandard(lowering.seconds, lowering.lowerings, options);
}
