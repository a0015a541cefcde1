import "server-only";
import { and, asc, eq, isNull } from "drizzle-orm";
import { db } from "@/db/client";
import { athletePositions, ladders, logEntries, logs, rungs, standards } from "@/db/schema";
import { localDateOf } from "@/lib/engine/local-date";
import { describeStandard } from "@/lib/engine/standard-text";
import type { Actor } from "@/lib/server/actor";
import { getAthlete } from "@/lib/server/athletes/get-athlete";
import { getPositionVerdict } from "@/lib/server/promotions/get-position-verdict";
import type { TodayDto, TodayRung } from "@/lib/validation/logs";
import { entryColumns, toEntryDto } from "./log-dto";
import { plannedBlocksFor } from "./today-plan";
import { standardRuleColumns } from "@/lib/server/ladders/standard-columns";

/**
 * The athlete's day: the planned blocks with, per slot, their current rung of the slot's ladder
 * (cues, caution, the standard in plain words, readiness) and what is already logged on that date;
 * plus every position, so unplanned work can still be logged. The date defaults to today in the
 * team's time zone.
 */
export async function getToday(actor: Actor, athleteId: string, date?: string): Promise<TodayDto> {
  const athlete = await getAthlete(actor, athleteId);
  const day = date ?? localDateOf(new Date(), actor.timeZone);
  const [positionRows, entryRows, dayLogs, planned] = await Promise.all([
    db
      .select({
        ladderId: ladders.id,
        ladderName: ladders.name,
        rungId: rungs.id,
        rungName: rungs.name,
        measure: rungs.measure,
        setting: rungs.setting,
        cues: rungs.cues,
        caution: rungs.caution,
        readiness: athletePositions.readiness,
        status: athletePositions.status,
        since: athletePositions.since,
        standard: standardRuleColumns,
      })
      .from(athletePositions)
      .innerJoin(ladders, eq(ladders.id, athletePositions.ladderId))
      .innerJoin(rungs, eq(rungs.id, athletePositions.rungId))
      .leftJoin(standards, eq(standards.rungId, rungs.id))
      .where(and(eq(athletePositions.teamId, actor.teamId), eq(athletePositions.athleteId, athleteId), isNull(ladders.archivedAt)))
      .orderBy(asc(ladders.name)),
    db
      .select(entryColumns)
      .from(logEntries)
      .where(and(eq(logEntries.teamId, actor.teamId), eq(logEntries.athleteId, athleteId), eq(logEntries.performedOn, day), isNull(logEntries.deletedAt)))
      .orderBy(asc(logEntries.createdAt), asc(logEntries.id)),
    db
      .select({ id: logs.id, durationMinutes: logs.durationMinutes, sessionRpe: logs.sessionRpe })
      .from(logs)
      .where(and(eq(logs.teamId, actor.teamId), eq(logs.athleteId, athleteId), eq(logs.performedOn, day), isNull(logs.deletedAt)))
      .orderBy(asc(logs.createdAt), asc(logs.id)),
    plannedBlocksFor(actor, athleteId, day),
  ]);

  // The live verdict per position, so the athlete reads why they are (not yet) moving up.
  const explanations = await Promise.all(
    positionRows.map((p) =>
      getPositionVerdict(actor, { athleteId, ladderId: p.ladderId }).then(
        (v) => v.explanation,
        () => null,
      ),
    ),
  );
  const positions: TodayRung[] = positionRows.map((p, i) => ({
    ladderId: p.ladderId,
    ladderName: p.ladderName,
    rungId: p.rungId,
    rungName: p.rungName,
    measure: p.measure,
    setting: p.setting,
    cues: p.cues,
    caution: p.caution,
    standard: p.standard,
    standardText: p.standard ? describeStandard(p.measure, p.standard) : null,
    readiness: p.readiness,
    status: p.status,
    explanation: explanations[i] ?? null,
    since: p.since,
    logged: entryRows.filter((e) => e.rungId === p.rungId).map((e) => ({ ...toEntryDto(e), logId: e.logId })),
  }));
  const byLadder = new Map(positions.map((p) => [p.ladderId, p]));
  return {
    athleteId: athlete.id,
    athleteName: athlete.name,
    date: day,
    timeZone: actor.timeZone,
    blocks: planned.map((block) => ({ ...block, slots: block.slots.map((slot) => ({ ...slot, rung: byLadder.get(slot.ladderId) ?? null })) })),
    positions,
    logs: dayLogs,
  };
}
