import "server-only";
import { and, eq, gte, isNotNull, isNull, lte, min, sql } from "drizzle-orm";
import { db } from "@/db/client";
import { logs } from "@/db/schema";
import { addDays, daysBetween } from "@/lib/engine/calendar-date";
import { isoWeekday, isoWeekOf } from "@/lib/engine/iso-week";
import { DEFAULT_MIN_DAYS_OF_HISTORY, WEEKLY_SD_KIND, ewmaAcwr, rollingAcwr, weekly } from "@/lib/engine/load";
import { localDateOf } from "@/lib/engine/local-date";
import { invalidField } from "@/lib/errors";
import type { Actor } from "@/lib/server/actor";
import { getAthlete } from "@/lib/server/athletes/get-athlete";
import { LOAD_MAX_DAYS, type LoadDto, type LoadQuery } from "@/lib/validation/load";

/** The EWMA runs over at most this much logged history (older days weigh almost nothing at N = 28). */
const EWMA_MAX_DAYS = 365;

const withLoad = (athleteId: string, teamId: string) =>
  and(
    eq(logs.athleteId, athleteId),
    eq(logs.teamId, teamId),
    isNull(logs.deletedAt),
    isNotNull(logs.sessionRpe),
    isNotNull(logs.durationMinutes),
  );

/** Session loads (RPE × minutes, Foster et al. 2001) summed per day, in SQL over the indexed date column. */
async function dailyLoads(athleteId: string, teamId: string, from: string, to: string): Promise<Map<string, number>> {
  const rows = await db
    .select({ date: logs.performedOn, load: sql<string>`sum(${logs.sessionRpe} * ${logs.durationMinutes})` })
    .from(logs)
    .where(and(withLoad(athleteId, teamId), gte(logs.performedOn, from), lte(logs.performedOn, to)))
    .groupBy(logs.performedOn);
  return new Map(rows.map((r) => [r.date, Number(r.load)]));
}

function series(loads: Map<string, number>, from: string, to: string): { date: string; load: number }[] {
  const out: { date: string; load: number }[] = [];
  for (let day = from; day <= to; day = addDays(day, 1)) out.push({ date: day, load: loads.get(day) ?? 0 });
  return out;
}

/**
 * Descriptive training-load figures for one athlete: daily and weekly load, weekly monotony and
 * strain (population SD), and acute:chronic ratios as of `to`, shown only after enough history.
 */
export async function getAthleteLoad(actor: Actor, athleteId: string, query: LoadQuery, now: Date = new Date()): Promise<LoadDto> {
  await getAthlete(actor, athleteId);
  const to = query.to ?? localDateOf(now, actor.timeZone);
  const from = query.from ?? addDays(to, -27);
  if (from > to) throw invalidField("from", "`from` must be on or before `to`.");
  if (daysBetween(from, to) + 1 > LOAD_MAX_DAYS) throw invalidField("from", `Ask for at most ${LOAD_MAX_DAYS} days at a time.`);

  const [first] = await db
    .select({ day: min(logs.performedOn) })
    .from(logs)
    .where(and(withLoad(athleteId, actor.teamId), lte(logs.performedOn, to)));
  const firstDay = first?.day ?? null;
  const daysOfHistory = firstDay ? daysBetween(firstDay, to) + 1 : 0;
  const ewmaStart = firstDay ? [firstDay, addDays(to, -(EWMA_MAX_DAYS - 1))].sort().at(-1)! : to;

  const weekStart = addDays(from, 1 - isoWeekday(from));
  const weekEnd = addDays(to, 7 - isoWeekday(to));
  const spanStart = [weekStart, ewmaStart].sort()[0]!;
  const loads = await dailyLoads(athleteId, actor.teamId, spanStart, weekEnd);

  const weeks: LoadDto["weeks"] = [];
  for (let monday = weekStart; monday <= weekEnd; monday = addDays(monday, 7)) {
    const days = series(loads, monday, addDays(monday, 6)).map((d) => d.load);
    const figures = weekly(days);
    weeks.push({
      week: isoWeekOf(monday),
      start: monday,
      load: figures.total,
      monotony: figures.monotony,
      strain: figures.strain,
      complete: addDays(monday, 6) <= localDateOf(now, actor.timeZone),
    });
  }

  const history = firstDay ? series(loads, ewmaStart, to).map((d) => d.load) : [];
  const enough = daysOfHistory >= DEFAULT_MIN_DAYS_OF_HISTORY;
  const rolling = enough ? rollingAcwr(history.slice(-28)) : null;
  const ewma = history.length > 0 ? ewmaAcwr(history) : null;
  return {
    athleteId,
    from,
    to,
    sdKind: WEEKLY_SD_KIND,
    days: series(loads, from, to),
    weeks,
    acwr: {
      rolling,
      ewma: ewma ? { acute: ewma.acute, chronic: ewma.chronic, ratio: enough ? ewma.ratio : null } : null,
      minDaysOfHistory: DEFAULT_MIN_DAYS_OF_HISTORY,
      daysOfHistory,
    },
  };
}
