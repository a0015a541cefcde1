import "server-only";
import { and, asc, eq, gte, isNull, lte } from "drizzle-orm";
import type { Queryable } from "@/db/client";
import { logEntries, logs } from "@/db/schema";
import { mergeSessions, type Session } from "@/lib/engine";

export interface RungSessionsQuery {
  athleteId: string;
  rungId: string;
  /** First date that counts (YYYY-MM-DD): the day the athlete reached the rung. */
  since: string;
  /** Last date that counts, inclusive; omitted: no upper bound (the engine drops future dates). */
  until?: string;
}

/**
 * The athlete's sessions on one rung: every non-deleted entry (of a non-deleted log) dated within
 * the range, merged per date (all entries of one rung on one date form one session), newest first.
 */
export async function loadRungSessions(q: Queryable, query: RungSessionsQuery): Promise<Session[]> {
  const rows = await q
    .select({ date: logEntries.performedOn, sets: logEntries.sets, pain: logEntries.pain })
    .from(logEntries)
    .innerJoin(logs, eq(logs.id, logEntries.logId))
    .where(
      and(
        eq(logEntries.athleteId, query.athleteId),
        eq(logEntries.rungId, query.rungId),
        gte(logEntries.performedOn, query.since),
        query.until ? lte(logEntries.performedOn, query.until) : undefined,
        isNull(logEntries.deletedAt),
        isNull(logs.deletedAt),
      ),
    )
    .orderBy(asc(logEntries.performedOn), asc(logEntries.createdAt))
    // A named statement (one per shape): planned once per connection, run on every log.
    .prepare(query.until ? "rung_sessions_until" : "rung_sessions")
    .execute();
  return mergeSessions(rows.map((row) => ({ date: row.date, sets: row.sets, pain: row.pain })));
}
