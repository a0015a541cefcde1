import "server-only";
import { and, asc, eq, gte, isNull } from "drizzle-orm";
import { db, type Queryable } from "@/db/client";
import { logEntries } from "@/db/schema";
import { mergeSessions } from "@/lib/engine/merge-sessions";
import type { Session } from "@/lib/engine/types";

/**
 * An athlete's sessions on one rung since a date (inclusive), as the engine reads them: every live
 * entry of that rung on a date merged into one session (all sets, pain if any entry had pain),
 * newest first. Callers scope the athlete to the team before asking.
 */
export async function loadSessions(
  athleteId: string,
  rungId: string,
  since: string,
  q: Queryable = db,
): Promise<Session[]> {
  const rows = await q
    .select({ date: logEntries.performedOn, sets: logEntries.sets, pain: logEntries.pain })
    .from(logEntries)
    .where(
      and(
        eq(logEntries.athleteId, athleteId),
        eq(logEntries.rungId, rungId),
        gte(logEntries.performedOn, since),
        isNull(logEntries.deletedAt),
      ),
    )
    .orderBy(asc(logEntries.performedOn), asc(logEntries.createdAt));
  return mergeSessions(rows);
}
