import "server-only";
import { randomUUID } from "node:crypto";
import { sql } from "drizzle-orm";
import type { Db, Tx } from "@/db/client";
import { oneTrip } from "@/db/one-trip";
import { preparedOnce, preparedVariants } from "@/db/prepared";
import { logEntries, logs } from "@/db/schema";
import { sessionBest } from "@/lib/engine/session-assessment";
import type { Actor } from "@/lib/server/actor";
import { withIdempotency } from "@/lib/server/http/idempotency";
import { evaluateLoaded } from "@/lib/server/promotions/evaluate-after-log";
import { loadPositionContext } from "@/lib/server/promotions/load-position-context";
import type { CreateLog, LogWithVerdicts } from "@/lib/validation/logs";
import { checkSets } from "./check-sets";
import { assertLoggableDate } from "./log-dates";
import { logAthleteOf } from "./log-athlete";
import { toLogDto } from "./log-dto";
import { currentPositions, lockPlacedRungs, placedOrThrow, type LogRung } from "./log-rungs";

export const CREATE_LOG_SCOPE = "POST /api/v1/logs";

const insertLog = preparedOnce((database: Db) =>
  database
    .insert(logs)
    .values({
      id: sql.placeholder("id"),
      teamId: sql.placeholder("teamId"),
      athleteId: sql.placeholder("athleteId"),
      performedOn: sql.placeholder("performedOn"),
      durationMinutes: sql.placeholder("durationMinutes"),
      sessionRpe: sql.placeholder("sessionRpe"),
      enteredById: sql.placeholder("enteredById"),
    })
    .returning()
    .prepare("insert_log"),
);

/**
 * One statement per number of entries (a log has a few), each prepared once. Rows written by one
 * statement share now(); each entry gets a microsecond more than the one before, so lists ordered
 * by `created_at` keep the order the entries were posted in.
 */
const insertEntries = preparedVariants((database: Db, count: number) =>
  database
    .insert(logEntries)
    .values(
      Array.from({ length: count }, (_, i) => ({
        teamId: sql.placeholder("teamId"),
        logId: sql.placeholder("logId"),
        athleteId: sql.placeholder("athleteId"),
        performedOn: sql.placeholder("performedOn"),
        ladderId: sql.placeholder(`ladderId${i}`),
        rungId: sql.placeholder(`rungId${i}`),
        sets: sql.placeholder(`sets${i}`),
        bestValue: sql.placeholder(`bestValue${i}`),
        pain: sql.placeholder(`pain${i}`),
        note: sql.placeholder(`note${i}`),
        createdAt: sql<Date>`now() + make_interval(secs => ${sql.raw(String(i))} / 1000000.0)`,
      })),
    )
    .returning()
    .prepare(`insert_log_entries_${count}`),
);

/**
 * POST /api/v1/logs: records one post of training at most once per Idempotency-Key. Entries are
 * stored as posted; sessions are merged per (athlete, rung, date) when read.
 */
export function createLog(actor: Actor, key: string, input: CreateLog): Promise<Response> {
  const athleteId = logAthleteOf(actor, input.athleteId);
  const rungIds = input.entries.map((e) => e.rungId);
  return withIdempotency(
    { actor, scope: CREATE_LOG_SCOPE, key, body: input, status: 201 },
    {
      read: (tx, key) => lockPlacedRungs(tx, actor.teamId, athleteId, rungIds, key),
      write: (tx, placed) => writeLog(tx, actor, { ...input, athleteId }, placed),
    },
  );
}

/**
 * Validates against the team's rungs and the athlete's positions (locked by the read that went out
 * with the key's claim, so the verdicts that follow are computed under the lock), then writes the
 * log and its entries and reads the positions' contexts in one trip, and evaluates. The figures
 * updates go out last, with the stored answer.
 */
async function writeLog(
  tx: Tx,
  actor: Actor,
  input: CreateLog & { athleteId: string },
  placed: Map<string, LogRung>,
): Promise<{ value: LogWithVerdicts; last: () => Promise<unknown>[] }> {
  assertLoggableDate(input.performedOn, actor.timeZone);
  const { athleteId } = input;
  const rungList = await placedOrThrow(tx, actor.teamId, athleteId, input.entries.map((e) => e.rungId), placed);
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

  // The id is made here so the entries can go out in the same trip as their log.
  const logId = randomUUID();
  const asOf = new Date();
  const [[log], entries, ...contexts] = await oneTrip(tx, () => [
    insertLog(tx).execute({
      id: logId,
      teamId: actor.teamId,
      athleteId,
      performedOn: input.performedOn,
      durationMinutes: input.durationMinutes ?? null,
      sessionRpe: input.sessionRpe ?? null,
      enteredById: actor.userId,
    }),
    insertEntries(tx, prepared.length).execute(
      Object.fromEntries([
        ["teamId", actor.teamId],
        ["logId", logId],
        ["athleteId", athleteId],
        ["performedOn", input.performedOn],
        ...prepared.flatMap((e, i) => Object.entries(e).map(([field, value]) => [`${field}${i}`, value])),
      ]),
    ),
    ...currentPositions(rungList).map((positionId) => loadPositionContext(tx, { positionId, teamId: actor.teamId, asOf })),
  ] as const);
  const { verdicts, figures } = await evaluateLoaded(tx, actor, { contexts, logId }, asOf);
  return { value: { ...toLogDto(log!, entries), verdicts }, last: figures };
}
