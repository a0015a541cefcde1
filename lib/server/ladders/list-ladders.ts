import "server-only";
import { and, asc, eq, gt, ilike, isNotNull, isNull, or, sql, type SQL } from "drizzle-orm";
import type { z } from "zod";
import { db } from "@/db/client";
import { ladders } from "@/db/schema";
import type { Actor } from "@/lib/server/actor";
import { decodeCursor, pageOf, zNameIdCursor } from "@/lib/server/http/cursor";
import type { LadderSummaryDto, ZLadderListQuery } from "@/lib/validation/ladders";

/** The team's ladders by name, a page at a time, filtered by search text, promotion mode and archive state. */
export async function listLadders(actor: Actor, query: z.output<typeof ZLadderListQuery>) {
  const after = decodeCursor(zNameIdCursor, query.cursor);
  const pattern = query.q ? `%${query.q.replace(/[%_\\]/g, "\\$&")}%` : undefined;
  const filters: (SQL | undefined)[] = [
    eq(ladders.teamId, actor.teamId),
    query.archived ? isNotNull(ladders.archivedAt) : isNull(ladders.archivedAt),
    query.mode ? eq(ladders.promotionMode, query.mode) : undefined,
    pattern ? or(ilike(ladders.name, pattern), ilike(ladders.targetSkill, pattern)) : undefined,
    after ? or(gt(ladders.name, after.name), and(eq(ladders.name, after.name), gt(ladders.id, after.id))) : undefined,
  ];
  const rows = await db
    .select({
      id: ladders.id,
      name: ladders.name,
      targetSkill: ladders.targetSkill,
      promotionMode: ladders.promotionMode,
      starterKey: ladders.starterKey,
      archivedAt: ladders.archivedAt,
      updatedAt: ladders.updatedAt,
      // Drizzle leaves columns unqualified in a one-table select, so inside a subquery "id" would
      // mean the subquery's own table: the correlated subqueries name their tables explicitly.
      rungCount: sql<number>`(select count(*)::int from rungs r where r.ladder_id = ladders.id and r.archived_at is null)`,
      athleteCount: sql<number>`(select count(*)::int from athlete_positions p where p.ladder_id = ladders.id)`,
    })
    .from(ladders)
    .where(and(...filters))
    .orderBy(asc(ladders.name), asc(ladders.id))
    .limit(query.limit + 1);
  const page = pageOf(rows, query.limit, (row) => ({ name: row.name, id: row.id }));
  const items: LadderSummaryDto[] = page.items.map(({ starterKey, archivedAt, updatedAt, ...row }) => ({
    ...row,
    starter: starterKey !== null,
    archived: archivedAt !== null,
    updatedAt: updatedAt.toISOString(),
  }));
  return { items, nextCursor: page.nextCursor };
}
