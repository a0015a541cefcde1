import "server-only";
import type { Tx } from "@/db/client";
import { logEntries, logs } from "@/db/schema";
import { sessionBest } from "@/lib/engine/session-assessment";
import type { Actor } from "@/lib/server/actor";
import { withIdempotency } from "@/lib/server/http/idempotency";
import { evaluateAfterLog } from "@/lib/server/promotions/evaluate-after-log";
import type { CreateLog, LogWithVerdicts } from "@/lib/validation/logs";
import { checkSets } from "./check-sets";
import { assertLoggableDate } from "./log-dates";
import { logAthleteOf } from "./log-athlete";
import { toLogDto } from "./log-dto";
import { currentPositions, logRungsOf } from "./log-rungs";

export const CREATE_LOG_SCOPE = "POST /api/v1/logs";

/**
 * POST /api/v1/logs: records one post of training at most once per Idempotency-Key. Entries are
 * stored as posted; sessions are merged per (athlete, rung, date) when read.
 */
export function createLog(actor: Actor, key: string, input: CreateLog): Promise<Response> {
  return withIdempotency({ ownerId: actor.userId, scope: CREATE_LOG_SCOPE, key, body: input, status: 201 }, (tx) =>
    writeLog(tx, actor, input),
  );
}

/**
 * Validates against the team's rungs and the athlete's positions (locking those, so the verdicts
 * that follow are computed under the lock), then writes the log and its entries and evaluates.
 */
export async function writeLog(tx: Tx, actor: Actor, input: CreateLog): Promise<LogWithVerdicts> {
  assertLoggableDate(input.performedOn, actor.timeZone);
  const athleteId = logAthleteOf(actor, input.athleteId);
  const rungList = await logRungsOf(
    tx,
    actor.teamId,
    athleteId,
    input.entries.map((e) => e.rungId),
  );
  const prepared = input.entries.map((entry, i) => {
    const rung = rungList[i]!;
    const sets = checkSets(rung.measure, entry.sets, `entries.${i}.sets`);
    return {
      ladderId: rung.ladderId,
      rungId: rung.rungId,
      sets,
      bestValue: sessionBest(rung.measure, { date: input.performedOn, sets, pain: entry.pain }),
      pain: entry.pain,
      note: entry.note || null,
    };
  });

  const [log] = await tx
    .insert(logs)
    .values({
      teamId: actor.teamId,
      athleteId,
      performedOn: input.performedOn,
      durationMinutes: input.durationMinutes ?? null,
      sessionRpe: input.sessionRpe ?? null,
      enteredById: actor.userId,
    })
    .returning();
  const entries = await tx
    .insert(logEntries)
    .values(prepared.map((e) => ({ ...e, teamId: actor.teamId, logId: log!.id, athleteId, performedOn: input.performedOn })))
    .returning();
  const verdicts = await evaluateAfterLog(tx, actor, { positionIds: currentPositions(rungList), logId: log!.id });
  return { ...toLogDto(log!, entries), verdicts };
}
