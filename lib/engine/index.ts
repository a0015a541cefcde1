/** The pure readiness and training-load engine. No I/O, no clock: the instant and zone are inputs. */
export * from "./types";
export * from "./tags";
export { rpeFromRir, rirFromRpe, setRpe, effortOk } from "./effort";
export { DEFAULT_STEP_DOWN, MAX_LOOKBACK_SESSIONS, defaultStandard } from "./defaults";
export { evaluate } from "./evaluate";
export { READINESS_WEIGHTS, readinessScore, type ReadinessInput } from "./readiness";
export { mergeSessions, sessionsInRange } from "./merge-sessions";
export { isEachSide, setValue, setMeetsValue, setQualifies } from "./set-value";
export { assessSession, sessionBest, type SessionAssessment } from "./session-assessment";
export { checkStepDown, stepDownRuleOf } from "./step-down";
export { lookbackSessions } from "./lookback";
export { explainVerdict, explainClause, waitingText } from "./explain";
export { describeStandard, effortCeilingText } from "./standard-text";
export { formatValue } from "./format-value";
export { checkPrerequisites, type PrerequisiteRung, type PrerequisiteProblem, type PrerequisiteProblemKind } from "./prerequisites";
export { leastSquares, type LinearFit } from "./linear-trend";
export {
  forecast,
  MIN_FORECAST_SESSIONS,
  DEFAULT_FORECAST_HORIZON_DAYS,
  type Forecast,
  type ForecastInput,
  type ForecastReason,
} from "./forecast";
export {
  sessionLoad,
  weekly,
  WEEKLY_SD_KIND,
  rollingAcwr,
  rollingAcwrFromWeeks,
  ewmaSeries,
  ewmaAcwr,
  DEFAULT_MIN_DAYS_OF_HISTORY,
  type WeeklyLoad,
  type AcuteChronic,
  type EwmaAcuteChronic,
} from "./load";
export { isoWeekOf, isoWeekDate, isoWeekday, isoWeeksInYear, isoWeekOfChecked, parseIsoWeek, weekOfInstant, type IsoWeek } from "./iso-week";
export { localDateOf, endOfLocalDay, instantOfLocal, zoneOffsetMs } from "./local-date";
export { addDays, daysBetween, isValidDate, parseDate, type DateParts } from "./calendar-date";
export {
  blockDurationSec,
  sessionDurationSec,
  setsPerRound,
  workSecondsPerSet,
  WORK_PACE,
  type DurationBlock,
  type DurationSlot,
} from "./duration";
export { pairingWarnings, PAIRING_RULES, LONG_HAND_SUPPORT_SEC, type PairingSlot, type PairingWarning, type PairingRuleId } from "./pairing";
export { backtest, type BacktestInput } from "./backtest";
