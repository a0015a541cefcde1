/**
 * Readiness, 0–100, toward the current rung's standard. One formula:
 *
 *   sessionsProgress = min(1, (met + (met < k ? bestPartial : 0)) / k)
 *   daysProgress     = min(1, daysOnRung / minDaysOnRung)
 *   readiness        = met ? 100 : min(99, floor(100 × (0.75 × sessionsProgress + 0.25 × daysProgress)))
 *
 * `met` counts sessions meeting the standard among the last n; `bestPartial` (< 1) is how close
 * the best other session in that window came (mean of its best set fractions, see
 * sessionPartial). k = 0 or minDaysOnRung = 0 make that part complete. Pain, prerequisites and
 * step-down do not lower the figure; they show in the status. Capped at 99 so 100 means "met".
 * A session at least as good as every logged one can only raise the figure (property-tested).
 */
export const READINESS_WEIGHTS = { sessions: 0.75, days: 0.25 } as const;

export interface ReadinessInput {
  met: boolean;
  sessionsMet: number;
  sessionsRequired: number;
  /** 0 to below 1. */
  bestPartial: number;
  daysOnRung: number;
  minDaysOnRung: number;
}

export function readinessScore(input: ReadinessInput): number {
  if (input.met) return 100;
  const k = input.sessionsRequired;
  const credited = input.sessionsMet + (input.sessionsMet < k ? input.bestPartial : 0);
  const sessionsProgress = k > 0 ? Math.min(1, credited / k) : 1;
  const daysProgress = input.minDaysOnRung > 0 ? Math.min(1, Math.max(0, input.daysOnRung) / input.minDaysOnRung) : 1;
  const raw = READINESS_WEIGHTS.sessions * sessionsProgress + READINESS_WEIGHTS.days * daysProgress;
  return Math.min(99, Math.max(0, Math.floor(100 * raw + 1e-9)));
}
