import "server-only";
import { and, asc, desc, eq, gte, isNull } from "drizzle-orm";
import { db } from "@/db/client";
import { ladders, logEntries, rungs } from "@/db/schema";
import { addDays } from "@/lib/engine/calendar-date";
import { localDateOf } from "@/lib/engine/local-date";
import { mergeSessions } from "@/lib/engine/merge-sessions";
import { sessionBest } from "@/lib/engine/session-assessment";
import type { Measure, Session } from "@/lib/engine/types";
import type { Actor } from "@/lib/server/actor";
import { getAthlete } from "@/lib/server/athletes/get-athlete";

export interface RungHistory {
  rungId: string;
  rungName: string;
  ladderName: string;
  measure: Measure;
  sessions: (Session & { best: number | null })[];
}

/** An athlete's past sessions per rung over the last `weeks` weeks, newest first, sessions merged per date. */
export async function rungHistory(actor: Actor, athleteId: string, weeks = 12): Promise<RungHistory[]> {
  await getAthlete(actor, athleteId);
  const since = addDays(localDateOf(new Date(), actor.timeZone), -weeks * 7);
  const rows = await db
    .select({
      rungId: logEntries.rungId,
      rungName: rungs.name,
      ladderName: ladders.name,
      measure: rungs.measure,
      date: logEntries.performedOn,
      sets: logEntries.sets,
      pain: logEntries.pain,
    })
    .from(logEntries)
    .innerJoin(rungs, eq(rungs.id, logEntries.rungId))
    .innerJoin(ladders, eq(ladders.id, logEntries.ladderId))
    .where(and(eq(logEntries.teamId, actor.teamId), eq(logEntries.athleteId, athleteId), gte(logEntries.performedOn, since), isNull(logEntries.deletedAt)))
    .orderBy(desc(logEntries.performedOn), asc(logEntries.createdAt));
  const byRung = new Map<string, RungHistory>();
  const raw = new Map<string, Session[]>();
  for (const row of rows) {
    if (!byRung.has(row.rungId)) byRung.set(row.rungId, { rungId: row.rungId, rungName: row.rungName, ladderName: row.ladderName, measure: row.measure, sessions: [] });
    raw.set(row.rungId, [...(raw.get(row.rungId) ?? []), { date: row.date, sets: row.sets, pain: row.pain }]);
  }
  return [...byRung.values()].map((rung) => ({
    ...rung,
    sessions: mergeSessions(raw.get(rung.rungId) ?? []).map((s) => ({ ...s, best: sessionBest(rung.measure, s) })),
  }));
}
