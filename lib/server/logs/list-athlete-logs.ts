import "server-only";
import { and, desc, eq, gte, isNull, lte, sql } from "drizzle-orm";
import { z } from "zod";
import type { z as Z } from "zod";
import { db } from "@/db/client";
import { logs } from "@/db/schema";
import type { Actor } from "@/lib/server/actor";
import { getAthlete } from "@/lib/server/athletes/get-athlete";
import { zDate } from "@/lib/validation/common";
import { decodeCursor, pageOf, zPgTimestamp } from "@/lib/server/http/cursor";
import type { LogDto, ZLogsQuery } from "@/lib/validation/logs";
import { entriesOf, toLogDto } from "./log-dto";

/** The last row's sort key: date, then created_at as text (see zPgTimestamp), then id. */
const zLogCursor = z.object({ d: zDate, at: zPgTimestamp, id: z.uuid() });

/** GET /api/v1/athletes/{id}/logs: newest first (by date, then by when posted), with entries, a page at a time. */
export async function listAthleteLogs(actor: Actor, athleteId: string, query: Z.output<typeof ZLogsQuery>) {
  await getAthlete(actor, athleteId); // 404 for another team's or another athlete's record
  const after = decodeCursor(zLogCursor, query.cursor);
  const rows = await db
    .select({
      id: logs.id,
      athleteId: logs.athleteId,
      performedOn: logs.performedOn,
      durationMinutes: logs.durationMinutes,
      sessionRpe: logs.sessionRpe,
      enteredById: logs.enteredById,
      createdAt: logs.createdAt,
      cursorAt: sql<string>`${logs.createdAt}::text`,
    })
    .from(logs)
    .where(
      and(
        eq(logs.teamId, actor.teamId),
        eq(logs.athleteId, athleteId),
        isNull(logs.deletedAt),
        query.from ? gte(logs.performedOn, query.from) : undefined,
        query.to ? lte(logs.performedOn, query.to) : undefined,
        after
          ? sql`(${logs.performedOn}, ${logs.createdAt}, ${logs.id}) < (${after.d}::date, ${after.at}::timestamptz, ${after.id}::uuid)`
          : undefined,
      ),
    )
    .orderBy(desc(logs.performedOn), desc(logs.createdAt), desc(logs.id))
    .limit(query.limit + 1);
  const page = pageOf(rows, query.limit, (row) => ({ d: row.performedOn, at: row.cursorAt, id: row.id }));
  const entries = await entriesOf(db, page.items.map((l) => l.id));
  const items: LogDto[] = page.items.map((log) => toLogDto(log, entries.get(log.id) ?? []));
  return { items, nextCursor: page.nextCursor };
}
