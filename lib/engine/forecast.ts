/**
 * When might the athlete reach the target, if the recent trend holds? A straight line through the
 * best value of each session against the day; a rough guide for the coach, not a promise.
 */
import { addDays, daysBetween } from "./calendar-date";
import { leastSquares } from "./linear-trend";

export const MIN_FORECAST_SESSIONS = 3;
/** Beyond this many days ahead a straight-line guess says nothing useful (common practice, no source). */
export const DEFAULT_FORECAST_HORIZON_DAYS = 365;

export type ForecastReason = "trending_up" | "not_trending_up" | "already_met" | "too_few_sessions";

export interface ForecastInput {
  /** Best value per session (one point per date); points after `asOfDate` are ignored. */
  points: readonly { date: string; best: number }[];
  target: number;
  asOfDate: string;
  horizonDays?: number;
}

export interface Forecast {
  /** First date the trend line reaches the target (never before asOfDate); null unless trending up within the horizon. */
  estimate: string | null;
  /** Trend in value per day; null with fewer than 3 sessions. */
  slopePerDay: number | null;
  reason: ForecastReason;
}

export function forecast(input: ForecastInput): Forecast {
  const points = input.points.filter((p) => p.date <= input.asOfDate).sort((a, b) => (a.date < b.date ? -1 : a.date > b.date ? 1 : 0));
  const latest = points[points.length - 1];
  const first = points[0];
  const fit =
    points.length >= MIN_FORECAST_SESSIONS && first
      ? leastSquares(
          points.map((p) => daysBetween(first.date, p.date)),
          points.map((p) => p.best),
        )
      : null;
  const slopePerDay = fit ? fit.slope : null;

  if (latest && latest.best >= input.target) return { estimate: null, slopePerDay, reason: "already_met" };
  if (!fit || !first) return { estimate: null, slopePerDay, reason: "too_few_sessions" };
  if (!(fit.slope > 0)) return { estimate: null, slopePerDay, reason: "not_trending_up" };

  const day = Math.ceil((input.target - fit.intercept) / fit.slope);
  const crossing = addDays(first.date, day);
  // A line that already crossed while the latest session fell short means "any session now".
  const estimate = crossing < input.asOfDate ? input.asOfDate : crossing;
  const horizon = input.horizonDays ?? DEFAULT_FORECAST_HORIZON_DAYS;
  return { estimate: daysBetween(input.asOfDate, estimate) <= horizon ? estimate : null, slopePerDay, reason: "trending_up" };
}
