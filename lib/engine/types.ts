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
  /** Pain sessions never count toward `sessionsRequired`; a pain-flagged latest session blocks promotion either way. */
  painFree: boolean;
  /** Omitted: DEFAULT_STEP_DOWN applies. null: the coach switched step-down proposals off. */
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

/** A prerequisite of the rung being evaluated, with whether the athlete has reached it. */
export interface PrerequisiteState {
  rungId: string;
  ladderName: string;
  rungName: string;
  reached: boolean;
}

export interface EvaluationInput {
  measure: Measure;
  standard: Standard;
  /** Sessions on this rung, any order; merged per date by the caller (see mergeSessions). */
  sessions: readonly Session[];
  /** YYYY-MM-DD, the team's local date the athlete reached this rung. */
  since: string;
  /** The instant of evaluation; the engine never reads a clock. */
  asOf: Date;
  /** IANA zone of the team; days on the rung are counted in it. */
  timeZone: string;
  prerequisites: readonly PrerequisiteState[];
}

export const CLAUSE_NAMES = ["sets", "effort", "sessions", "days", "pain", "prerequisites"] as const;
export type ClauseName = (typeof CLAUSE_NAMES)[number];

/** One checked part of a standard. `pass` is the rule; `required`/`have` are for display. */
export interface Clause {
  clause: ClauseName;
  pass: boolean;
  required: number;
  have: number;
  /** Sessions looked at, for clauses that look at the last n sessions. */
  window?: number;
  detail?: string;
}

export const VERDICT_STATUSES = ["met", "not_yet", "blocked", "step_down"] as const;
export type VerdictStatus = (typeof VERDICT_STATUSES)[number];

export interface StepDownProposal {
  reason: "pain" | "drop";
  /** Plain words, e.g. "Pain flagged in 2 of the last 3 sessions". */
  detail: string;
}

export interface Verdict {
  status: VerdictStatus;
  /** Always in CLAUSE_NAMES order. */
  clauses: Clause[];
  /** Integer 0–100; 100 exactly when status is "met" (formula in readiness.ts). */
  readiness: number;
  stepDown: StepDownProposal | null;
  /** Unreached prerequisites, in input order. */
  waitingFor: Omit<PrerequisiteState, "reached">[];
  daysOnRung: number;
  lastSessionDate: string | null;
  /** Sessions meeting the standard among the last `sessionsWindow` sessions. */
  sessionsMet: number;
}
