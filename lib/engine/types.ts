/** Shared shapes of the pure engine. Nothing here reads a clock, a database or the network. */
import type { RungTag } from "./tags";

export const MEASURES = [
  "hold_seconds",
  "reps",
  "eccentric_seconds",
  "distance_m",
  "hold_seconds_each_side",
  "reps_each_side",
] as const;
export type Measure = (typeof MEASURES)[number];

export const PROMOTION_MODES = ["auto", "approve"] as const;
export type PromotionMode = (typeof PROMOTION_MODES)[number];

/** When to propose moving an athlete down a rung. */
export interface StepDownRule {
  /** Pain flagged in at least this many of the last `painWindow` sessions. */
  painSessions: number;
  painWindow: number;
  /** Best value below this percentage of `minValue`… */
  dropBelowPct: number;
  /** …in this many consecutive most recent sessions. */
  dropSessions: number;
}

/** The readiness rule on one rung. */
export interface Standard {
  sets: number;
  /** Per set; per lowering for eccentric measures; the weaker side for each-side measures. */
  minValue: number;
  /** Lowerings (eccentric) or reps per set, where the measure needs both. */
  minReps?: number | null;
  maxRpe?: number | null;
  minRir?: number | null;
  sessionsRequired: number;
  sessionsWindow: number;
  minDaysOnRung: number;
  painFree: boolean;
  stepDown?: StepDownRule | null;
}

/** One logged set. `value` for one-sided measures, `left`/`right` for each-side measures. */
export interface SetEntry {
  value?: number | null;
  left?: number | null;
  right?: number | null;
  /** Lowerings in an eccentric set. */
  reps?: number | null;
  rpe?: number | null;
  rir?: number | null;
}

/** All entries of one athlete on one rung on one date. */
export interface Session {
  date: string; // YYYY-MM-DD, the team's local date
  sets: SetEntry[];
  pain: boolean;
}

export type { RungTag };
