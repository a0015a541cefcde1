import "server-only";
import { z } from "zod";
import { db } from "@/db/client";
import type { Actor } from "@/lib/server/actor";
import { decodeCursor, encodeCursor } from "@/lib/server/http/cursor";
import { zDate, zText } from "@/lib/validation/common";
import { invalidField } from "@/lib/errors";
import { type ReadinessCell, type ReadinessPage, type ReadinessQuery, type ReadinessRow } from "@/lib/validation/readiness";
import { readinessStatement, type ReadinessCursor } from "./readiness-sql";
import { reviewWeek, type ReviewWeek } from "./readiness-week";

/** The sort key's type follows the sort, so a forged cursor is a 422 rather than a failed cast. */
const zCursor = z.union([
  z.object({ s: z.enum(["name", "-name"]), k: zText }),
  // Readiness runs 0–100; an athlete with no figure sorts as 101 or -1 (readiness-sql.ts).
  z.object({ s: z.enum(["readiness", "-readiness"]), k: z.number().int().min(-1).max(101) }),
  z.object({ s: z.enum(["lastSession", "-lastSession"]), k: zDate }),
]).and(z.object({ n: zText, id: z.uuid() })) satisfies z.ZodType<ReadinessCursor>;

interface RawRow extends Record<string, unknown> {
  id: string;
  name: string;
  k_text: string;
  ladders: ReadinessCell[];
}

async function fetchRows(actor: Actor, query: ReadinessQuery, week: ReviewWeek, after: ReadinessCursor | undefined, limit: number | null) {
  const statement = readinessStatement({ teamId: actor.teamId, userId: actor.userId, query, week, after, limit });
  const result = await db.execute<RawRow>(statement);
  return result.rows;
}

function toRow(row: RawRow): ReadinessRow {
  return { athleteId: row.id, athleteName: row.name, ladders: row.ladders };
}

/**
 * One page of the weekly readiness table for the actor's team: filtered and sorted in SQL on the
 * stored position figures, with this week's sessions, pain and moves per cell.
 */
export async function listReadiness(actor: Actor, query: ReadinessQuery, now: Date = new Date()): Promise<ReadinessPage> {
  const week = reviewWeek(query.week, actor.timeZone, now);
  const after = decodeCursor(zCursor, query.cursor);
  if (after && after.s !== query.sort) throw invalidField("cursor", "This cursor belongs to another sort order.");
  const rows = await fetchRows(actor, query, week, after, query.limit + 1);
  const items = rows.slice(0, query.limit);
  const last = items.at(-1);
  const numericKey = query.sort.endsWith("readiness");
  return {
    week: week.week,
    weekStart: week.start,
    weekEnd: week.end,
    items: items.map(toRow),
    nextCursor:
      rows.length > query.limit && last
        ? encodeCursor({ s: query.sort, k: numericKey ? Number(last.k_text) : last.k_text, n: last.name, id: last.id } satisfies ReadinessCursor)
        : null,
  };
}

/** Every matching athlete (no paging), for the CSV export. */
export async function listAllReadiness(actor: Actor, query: ReadinessQuery, now: Date = new Date()) {
  const week = reviewWeek(query.week, actor.timeZone, now);
  const rows = await fetchRows(actor, query, week, undefined, null);
  return { week, items: rows.map(toRow) };
}
