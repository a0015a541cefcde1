/**
 * Training load figures, descriptive only: they show how much and how evenly an athlete trained,
 * never a prediction of injury (design.md §4). Daily load arrays run oldest first; the last entry
 * is the most recent day.
 */

/** Session load in arbitrary units: CR-10 RPE × minutes (Foster et al. 2001, J Strength Cond Res 15(1):109–115). */
export function sessionLoad(rpe: number, minutes: number): number {
  return rpe * minutes;
}

/**
 * Monotony = mean daily load / SD and strain = weekly load × monotony (Foster 1998, Med Sci Sports
 * Exerc 30(7):1164–1168). We use the POPULATION SD (divide by 7): the week is the whole set of days
 * described, not a sample. Shown to the UI so the figure can be labelled.
 */
export const WEEKLY_SD_KIND = "population" as const;

export interface WeeklyLoad {
  total: number;
  mean: number;
  sd: number;
  /** Null when every day had the same load (SD 0): undefined, not infinite. */
  monotony: number | null;
  strain: number | null;
}

export function weekly(dailyLoads: readonly number[]): WeeklyLoad {
  if (dailyLoads.length !== 7) throw new RangeError(`a week has 7 daily loads, got ${dailyLoads.length}`);
  const total = dailyLoads.reduce((sum, load) => sum + load, 0);
  const mean = total / 7;
  const sd = Math.sqrt(dailyLoads.reduce((sum, load) => sum + (load - mean) ** 2, 0) / 7);
  if (sd === 0) return { total, mean, sd, monotony: null, strain: null };
  const monotony = mean / sd;
  return { total, mean, sd, monotony, strain: total * monotony };
}

/**
 * Rolling acute:chronic ratios from weekly loads (Hulin et al. 2014, Br J Sports Med 48(8):708–712):
 * acute = the latest week; coupled chronic = mean of the latest 4 weeks (acute week included);
 * uncoupled chronic = mean of the 3 weeks before it. Null with fewer than 4 weeks; a ratio is null
 * when its chronic load is 0.
 */
export interface AcuteChronic {
  acute: number;
  chronicCoupled: number;
  chronicUncoupled: number;
  coupled: number | null;
  uncoupled: number | null;
}

export function rollingAcwrFromWeeks(weeklyLoads: readonly number[]): AcuteChronic | null {
  const n = weeklyLoads.length;
  if (n < 4) return null;
  const acute = weeklyLoads[n - 1] as number;
  const before = (weeklyLoads[n - 2] as number) + (weeklyLoads[n - 3] as number) + (weeklyLoads[n - 4] as number);
  const chronicCoupled = (before + acute) / 4;
  const chronicUncoupled = before / 3;
  return {
    acute,
    chronicCoupled,
    chronicUncoupled,
    coupled: chronicCoupled > 0 ? acute / chronicCoupled : null,
    uncoupled: chronicUncoupled > 0 ? acute / chronicUncoupled : null,
  };
}

/** The rolling chronic window needs 28 days; `minDaysOfHistory` may only raise that bar. */
export const DEFAULT_MIN_DAYS_OF_HISTORY = 28;

/**
 * The same ratios from daily loads: acute = the last 7 days' sum, chronic = the average weekly load
 * of the last 28 days (coupled) or of the 21 days before the acute week (uncoupled).
 */
export function rollingAcwr(dailyLoads: readonly number[], options: { minDaysOfHistory?: number } = {}): AcuteChronic | null {
  const needed = Math.max(28, options.minDaysOfHistory ?? DEFAULT_MIN_DAYS_OF_HISTORY);
  if (dailyLoads.length < needed) return null;
  const weeks: number[] = [];
  const end = dailyLoads.length;
  for (let w = 3; w >= 0; w -= 1) {
    let sum = 0;
    for (let d = end - 7 * (w + 1); d < end - 7 * w; d += 1) sum += dailyLoads[d] as number;
    weeks.push(sum);
  }
  return rollingAcwrFromWeeks(weeks);
}

/**
 * Exponentially weighted moving average (Williams et al. 2017, Br J Sports Med 51(3):209–210):
 * λ = 2 / (N + 1); EWMA_today = load_today × λ + (1 − λ) × EWMA_yesterday, seeded with day 1's load.
 */
export function ewmaSeries(dailyLoads: readonly number[], days: number): number[] {
  const lambda = 2 / (days + 1);
  const series: number[] = [];
  let previous = dailyLoads[0] ?? 0;
  for (const load of dailyLoads) {
    previous = series.length === 0 ? load : load * lambda + (1 - lambda) * previous;
    series.push(previous);
  }
  return series;
}

export interface EwmaAcuteChronic {
  acute: number;
  chronic: number;
  /** Null before `minDaysOfHistory` days (default 28) or when chronic is 0. */
  ratio: number | null;
}

/** EWMA acute (N = 7) and chronic (N = 28) loads on the last day, and their ratio. Null with no days. */
export function ewmaAcwr(
  dailyLoads: readonly number[],
  options: { acuteDays?: number; chronicDays?: number; minDaysOfHistory?: number } = {},
): EwmaAcuteChronic | null {
  if (dailyLoads.length === 0) return null;
  const acute = ewmaSeries(dailyLoads, options.acuteDays ?? 7).at(-1) as number;
  const chronic = ewmaSeries(dailyLoads, options.chronicDays ?? 28).at(-1) as number;
  const enough = dailyLoads.length >= (options.minDaysOfHistory ?? DEFAULT_MIN_DAYS_OF_HISTORY);
  return { acute, chronic, ratio: enough && chronic > 0 ? acute / chronic : null };
}
