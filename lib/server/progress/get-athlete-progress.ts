import "server-only";
import { and, asc, count, eq, gt, gte, isNull, sql } from "drizzle-orm";
import { alias } from "drizzle-orm/pg-core";
import { db } from "@/db/client";
import { athletePositions, ladders, logEntries, positionMoves, rungs, standards, users } from "@/db/schema";
import { addDays } from "@/lib/engine/calendar-date";
import { forecast } from "@/lib/engine/forecast";
import { localDateOf } from "@/lib/engine/local-date";
import { describeStandard } from "@/lib/engine/standard-text";
import type { Actor } from "@/lib/server/actor";
import { getAthlete } from "@/lib/server/athletes/get-athlete";
import type { LadderProgress, ProgressDto } from "@/lib/validation/progress";
import { standardRuleColumns } from "@/lib/server/ladders/standard-columns";

/** Sessions older than this are left off the charts. */
const HISTORY_DAYS = 365;

const fromRung = alias(rungs, "from_rung");
const toRung = alias(rungs, "to_rung");

async function positionsOf(teamId: string, athleteId: string) {
  const rungCount = db
    .select({ ladderId: rungs.ladderId, n: count().as("n") })
    .from(rungs)
    .where(and(eq(rungs.teamId, teamId), gt(rungs.position, 0)))
    .groupBy(rungs.ladderId)
    .as("rung_count");
  return db
    .select({
      ladderId: athletePositions.ladderId,
      ladderName: ladders.name,
      rungId: athletePositions.rungId,
      rungName: rungs.name,
      position: rungs.position,
      measure: rungs.measure,
      rungCount: rungCount.n,
      since: athletePositions.since,
      readiness: athletePositions.readiness,
      status: athletePositions.status,
      standard: standardRuleColumns,
    })
    .from(athletePositions)
    .innerJoin(ladders, eq(ladders.id, athletePositions.ladderId))
    .innerJoin(rungs, eq(rungs.id, athletePositions.rungId))
    .leftJoin(standards, eq(standards.rungId, athletePositions.rungId))
    .leftJoin(rungCount, eq(rungCount.ladderId, athletePositions.ladderId))
    .where(and(eq(athletePositions.teamId, teamId), eq(athletePositions.athleteId, athleteId)))
    .orderBy(asc(ladders.name));
}

async function movesOf(teamId: string, athleteId: string) {
  return db
    .select({
      id: positionMoves.id,
      ladderId: positionMoves.ladderId,
      effectiveOn: positionMoves.effectiveOn,
      at: positionMoves.createdAt,
      cause: positionMoves.cause,
      toRungId: positionMoves.toRungId,
      fromRungName: fromRung.name,
      toRungName: toRung.name,
      byName: users.name,
    })
    .from(positionMoves)
    .leftJoin(fromRung, eq(fromRung.id, positionMoves.fromRungId))
    .leftJoin(toRung, eq(toRung.id, positionMoves.toRungId))
    .leftJoin(users, eq(users.id, positionMoves.actorUserId))
    .where(and(eq(positionMoves.teamId, teamId), eq(positionMoves.athleteId, athleteId)))
    .orderBy(asc(positionMoves.createdAt), asc(positionMoves.id));
}

/** One point per session (all entries of one rung on one date), best value and any pain. */
async function sessionsOf(teamId: string, athleteId: string, since: string) {
  return db
    .select({
      ladderId: logEntries.ladderId,
      rungId: logEntries.rungId,
      date: logEntries.performedOn,
      best: sql<number | null>`max(${logEntries.bestValue})`,
      pain: sql<boolean>`bool_or(${logEntries.pain})`,
      note: sql<string | null>`string_agg(${logEntries.note}, ' · ' order by ${logEntries.createdAt})`,
    })
    .from(logEntries)
    .where(
      and(
        eq(logEntries.teamId, teamId),
        eq(logEntries.athleteId, athleteId),
        isNull(logEntries.deletedAt),
        gte(logEntries.performedOn, since),
      ),
    )
    .groupBy(logEntries.ladderId, logEntries.rungId, logEntries.performedOn)
    .orderBy(asc(logEntries.performedOn));
}

/**
 * An athlete's progress on every ladder they are placed on: the current rung, the path so far (from
 * the audit of moves), session bests against the current standard, pain notes and a forecast.
 */
export async function getAthleteProgress(actor: Actor, athleteId: string, now: Date = new Date()): Promise<ProgressDto> {
  const athlete = await getAthlete(actor, athleteId);
  const today = localDateOf(now, actor.timeZone);
  const [positions, moves, sessions] = await Promise.all([
    positionsOf(actor.teamId, athleteId),
    movesOf(actor.teamId, athleteId),
    sessionsOf(actor.teamId, athleteId, addDays(today, -HISTORY_DAYS)),
  ]);
  const ladderProgress = positions.map((p): LadderProgress => {
    const ladderMoves = moves.filter((m) => m.ladderId === p.ladderId);
    const ladderSessions = sessions.filter((s) => s.ladderId === p.ladderId);
    const target = p.standard?.minValue ?? null;
    const points = ladderSessions
      .filter((s) => s.rungId === p.rungId && s.best !== null && !s.pain)
      .map((s) => ({ date: s.date, best: Number(s.best) }));
    return {
      ladderId: p.ladderId,
      ladderName: p.ladderName,
      current: {
        rungId: p.rungId,
        rungName: p.rungName,
        position: p.position,
        rungCount: Number(p.rungCount ?? 0),
        since: p.since,
        readiness: p.readiness,
        status: p.status,
      },
      path: ladderMoves
        .filter((m) => m.toRungId !== null)
        .map((m) => ({ rungId: m.toRungId, rungName: m.toRungName, reachedOn: m.effectiveOn, cause: m.cause })),
      sessions: ladderSessions.map((s) => ({
        date: s.date,
        rungId: s.rungId,
        best: s.best === null ? null : Number(s.best),
        pain: s.pain,
        note: s.note,
      })),
      standard: p.standard
        ? { measure: p.measure, sets: p.standard.sets, minValue: p.standard.minValue, text: describeStandard(p.measure, p.standard) }
        : null,
      forecast:
        target === null
          ? { estimate: null, slopePerDay: null, reason: "too_few_sessions" }
          : forecast({ points, target, asOfDate: today }),
      moves: ladderMoves.map((m) => ({
        id: m.id,
        effectiveOn: m.effectiveOn,
        at: m.at.toISOString(),
        cause: m.cause,
        fromRungName: m.fromRungName,
        toRungName: m.toRungName,
        byName: m.byName,
      })),
    };
  });
  return { athleteId, athleteName: athlete.name, asOf: today, ladders: ladderProgress };
}
