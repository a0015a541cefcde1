import "server-only";
import { and, asc, eq, ilike, isNotNull, isNull, or, gt, type SQL } from "drizzle-orm";
import type { z } from "zod";
import { db } from "@/db/client";
import { athletes } from "@/db/schema";
import type { Actor } from "@/lib/server/actor";
import { decodeCursor, pageOf, zNameIdCursor } from "@/lib/server/http/cursor";
import type { ZAthleteListQuery } from "@/lib/validation/athletes";
import { toAthleteDto, selectAthletes } from "./athlete-dto";
import { visibleAthletes } from "./athlete-scope";

/** The athletes the actor may see, by name, a page at a time. */
export async function listAthletes(actor: Actor, query: z.output<typeof ZAthleteListQuery>) {
  const after = decodeCursor(zNameIdCursor, query.cursor);
  const filters: (SQL | undefined)[] = [
    visibleAthletes(actor),
    query.archived ? isNotNull(athletes.archivedAt) : isNull(athletes.archivedAt),
    query.q ? ilike(athletes.name, `%${query.q.replace(/[%_\\]/g, "\\$&")}%`) : undefined,
    query.mine ? eq(athletes.primaryCoachId, actor.userId) : undefined,
    after ? or(gt(athletes.name, after.name), and(eq(athletes.name, after.name), gt(athletes.id, after.id))) : undefined,
  ];
  const rows = await selectAthletes(db)
    .where(and(...filters))
    .orderBy(asc(athletes.name), asc(athletes.id))
    .limit(query.limit + 1);
  const page = pageOf(rows, query.limit, (row) => ({ name: row.name, id: row.id }));
  return { items: page.items.map(toAthleteDto), nextCursor: page.nextCursor };
}
