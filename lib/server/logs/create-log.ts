import "server-only";
import { randomUUID } from "node:crypto";
import { sql } from "drizzle-orm";
import type { Db, Tx } from "@/db/client";
import { oneTrip } from "@/db/one-trip";
import { preparedVariants } from "@/db/prepared";
import { logEntries, logs } from "@/db/schema";
import { sessionBest } from "@/lib/engine/session-assessment";
import type { Actor } from "@/lib/server/actor";
import { withIdempotency } from "@/lib/server/http/idempotency";
import { contextWithEntries } from "@/lib/server/promotions/context-with-entries";
import { evaluateLoaded } from "@/lib/server/promotions/evaluate-after-log";
import { evaluateWithoutActing } from "@/lib/server/promotions/evaluate-position";
import { loadLoggedContexts, loadPositionContext, type PositionContext } from "@/lib/server/promotions/load-position-context";
import type { CreateLog, LogWithVerdicts } from "@/lib/validation/logs";
import { checkSets } from "./check-sets";
import { assertLoggableDate } from "./log-dates";
import { logAthleteOf } from "./log-athlete";
import { toLogDto, type EntryRow, type LogRow } from "./log-dto";
import { currentPositions, lockPlacedRungs, placedOrThrow, type LogRung } from "./log-rungs";

export const CREATE_LOG_SCOPE = "POST /api/v1/logs";

/**
 * The log and its entries in one statement, one shape per number of entries (a log has a few),
 * each prepared once: the log's insert rides in a WITH clause (PostgreSQL checks the entries'
 * reference to it at the end of the statement, when the log's row is in). The ids and created_at
 * are made by the app (see logRows), so nothing needs to come back (the WITH clause's RETURNING is
 * only the selection Drizzle's `$with` asks for). Each entry gets a microsecond more than the one
 * before, so lists ordered by `created_at` keep the order the entries were posted in.
 */
const insertLogWithEntries = preparedVariants((database: Db, count: number) => {
  const log = database.$with("log").as(
    database
      .insert(logs)
      .values({
        id: sql.placeholder("logId"),
        teamId: sql.placeholder("teamId"),
        athleteId: sql.placeholder("athleteId"),
        performedOn: sql.placeholder("performedOn"),
        durationMinutes: sql.placeholder("durationMinutes"),
        sessionRpe: sql.placeholder("sessionRpe"),
        enteredById: sql.placeholder("enteredById"),
        createdAt: sql.placeholder("createdAt"),
      })
      .returning({ id: logs.id }),
  );
  return database
    .with(log)
    .insert(logEntries)
    .values(
      Array.from({ length: count }, (_, i) => ({
        id: sql.placeholder(`id${i}`),
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
        createdAt: sql<Date>`${sql.placeholder("createdAt")}::timestamptz + make_interval(secs => ${sql.raw(String(i))} / 1000000.0)`,
      })),
    )
    .prepare(`insert_log_with_entries_${count}`);
});

/**
 * POST /api/v1/logs: records one post of training at most once per Idempotency-Key. Entries are
 * stored as posted; sessions are merged per (athlete, rung, date) when read. The positions the log
 * names are locked, and those it can move read, in the key's first trip.
 */
export function createLog(actor: Actor, key: string, input: CreateLog): Promise<Response> {
  const athleteId = logAthleteOf(actor, input.athleteId);
  const rungIds = input.entries.map((e) => e.rungId);
  const asOf = new Date();
  return withIdempotency(
    { actor, scope: CREATE_LOG_SCOPE, key, body: input, status: 201 },
    {
      // In this order: the context read goes out after the statement that locks its positions, so
      // it reads them as the lock holds them.
      read: (tx, key) =>
        Promise.all([
          lockPlacedRungs(tx, actor.teamId, athleteId, rungIds, key),
          loadLoggedContexts(tx, { teamId: actor.teamId, athleteId, rungIds, asOf, key }),
        ]),
      write: (tx, [placed, contexts]) => writeLog(tx, actor, { ...input, athleteId }, { placed, contexts, asOf }),
    },
  );
}

/**
 * Validates against the team's rungs and the athlete's positions (locked by the read that went out
 * with the key's claim, so the verdicts are computed under the lock), then judges each position the
 * log counts toward from the context read with the lock plus the new entries. When no verdict has
 * anything to write (the usual log), the inserts go out with the figures, the stored answer and
 * COMMIT in one trip. A verdict that may promote or propose takes the longer way (rare: a standard
 * met, a step down due): the inserts and a fresh read of the contexts, then the moves
 * (evaluateLoaded), then the figures; the judgement made from the first read is dropped.
 */
async function writeLog(
  tx: Tx,
  actor: Actor,
  input: CreateLog & { athleteId: string },
  read: { placed: Map<string, LogRung>; contexts: Map<string, PositionContext>; asOf: Date },
): Promise<{ value: LogWithVerdicts; last: () => Promise<unknown>[] }> {
  const { asOf } = read;
  assertLoggableDate(input.performedOn, actor.timeZone, asOf);
  const rungList = await placedOrThrow(tx, actor.teamId, input.athleteId, input.entries.map((e) => e.rungId), read.placed);
  const { log, entries } = logRows(actor, input, rungList, asOf);
  const dto = toLogDto(log, entries);
  const positionIds = currentPositions(rungList);

  const quiet = positionIds.map((positionId) => {
    const ctx = read.contexts.get(positionId);
    if (!ctx) return null;
    const added = entries.filter((e) => e.rungId === ctx.rung.id).map((e) => ({ date: log.performedOn, sets: e.sets, pain: e.pain }));
    return evaluateWithoutActing(tx, contextWithEntries(ctx, added, asOf), asOf);
  });
  if (quiet.every((evaluation) => evaluation !== null)) {
    return { value: { ...dto, verdicts: quiet.map((e) => e.verdict) }, last: () => [insertRows(tx, actor.teamId, log, entries), ...quiet.flatMap((e) => e.figures())] };
  }

  const [, ...contexts] = await oneTrip(tx, () => [
    insertRows(tx, actor.teamId, log, entries),
    ...positionIds.map((positionId) => loadPositionContext(tx, { positionId, teamId: actor.teamId, asOf })),
  ] as const);
  const { verdicts, figures } = await evaluateLoaded(tx, actor, { contexts, logId: log.id }, asOf);
  return { value: { ...dto, verdicts }, last: figures };
}

/**
 * The log's and its entries' rows, sets checked against each rung's measure. The ids are made here
 * and created_at is `asOf`, so the answer is known before the rows are written.
 */
function logRows(actor: Actor, input: CreateLog & { athleteId: string }, rungList: LogRung[], asOf: Date): { log: LogRow; entries: EntryRow[] } {
  const log: LogRow = {
    id: randomUUID(),
    athleteId: input.athleteId,
    performedOn: input.performedOn,
    durationMinutes: input.durationMinutes ?? null,
    sessionRpe: input.sessionRpe ?? null,
    enteredById: actor.userId,
    createdAt: asOf,
  };
  const entries = input.entries.map((entry, i): EntryRow => {
    const rung = rungList[i]!;
    const sets = checkSets(rung.measure, entry.sets, `entries.${i}.sets`);
    return {
      id: randomUUID(),
      logId: log.id,
      ladderId: rung.ladderId,
      rungId: rung.rungId,
      sets,
      bestValue: sessionBest(rung.measure, { date: input.performedOn, sets, pain: entry.pain }),
      pain: entry.pain,
      note: entry.note || null,
    };
  });
  return { log, entries };
}

/** Sends the log's and its entries' insert (submitting synchronously, for a oneTrip). */
function insertRows(tx: Tx, teamId: string, log: LogRow, entries: readonly EntryRow[]): Promise<unknown> {
  return insertLogWithEntries(tx, entries.length).execute(
    Object.fromEntries([
      ["logId", log.id],
      ["teamId", teamId],
      ["athleteId", log.athleteId],
      ["performedOn", log.performedOn],
      ["durationMinutes", log.durationMinutes],
      ["sessionRpe", log.sessionRpe],
      ["enteredById", log.enteredById],
      ["createdAt", log.createdAt],
      ...entries.flatMap((e, i) => [
        [`id${i}`, e.id],
        [`ladderId${i}`, e.ladderId],
        [`rungId${i}`, e.rungId],
        [`sets${i}`, e.sets],
        [`bestValue${i}`, e.bestValue],
        [`pain${i}`, e.pain],
        [`note${i}`, e.note],
      ]),
    ]),
  );
}
