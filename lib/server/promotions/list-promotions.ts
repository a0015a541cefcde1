import "server-only";
import { and, desc, eq, sql } from "drizzle-orm";
import { z } from "zod";
import { db } from "@/db/client";
import { promotions } from "@/db/schema";
import type { Actor } from "@/lib/server/actor";
import { decodeCursor, pageOf, zPgTimestamp } from "@/lib/server/http/cursor";
import type { PromotionListQuery } from "@/lib/validation/promotions";
import { selectPromotions, toPromotionDto } from "./promotion-dto";
import { visiblePromotions } from "./promotion-scope";

const zCursor = z.object({ createdAt: zPgTimestamp, id: z.uuid() });

/** Promotions the actor may see, newest first, filtered by status, athlete and ladder. */
export async function listPromotions(actor: Actor, query: PromotionListQuery) {
  const after = decodeCursor(zCursor, query.cursor);
  const rows = await selectPromotions(db)
    .where(
      and(
        visiblePromotions(actor),
        query.status ? eq(promotions.status, query.status) : undefined,
        query.athleteId ? eq(promotions.athleteId, query.athleteId) : undefined,
        query.ladderId ? eq(promotions.ladderId, query.ladderId) : undefined,
        after ? sql`(${promotions.createdAt}, ${promotions.id}) < (${after.createdAt}::timestamptz, ${after.id}::uuid)` : undefined,
      ),
    )
    .orderBy(desc(promotions.createdAt), desc(promotions.id))
    .limit(query.limit + 1);
  const page = pageOf(rows, query.limit, (row) => ({ createdAt: row.createdAt, id: row.id }));
  return { items: page.items.map(toPromotionDto), nextCursor: page.nextCursor };
}
