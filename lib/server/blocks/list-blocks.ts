import "server-only";
import { and, asc, eq, gt, isNotNull, isNull, or } from "drizzle-orm";
import type { z } from "zod";
import { db } from "@/db/client";
import { blocks } from "@/db/schema";
import type { Actor } from "@/lib/server/actor";
import { decodeCursor, pageOf, zNameIdCursor } from "@/lib/server/http/cursor";
import type { ZBlockListQuery } from "@/lib/validation/blocks";
import { blockColumns, toBlockDtos } from "./block-dto";

/** The team's blocks by name (live ones, or archived ones with `archived=true`), a page at a time. */
export async function listBlocks(actor: Actor, query: z.output<typeof ZBlockListQuery>) {
  const after = decodeCursor(zNameIdCursor, query.cursor);
  const rows = await db
    .select(blockColumns)
    .from(blocks)
    .where(
      and(
        eq(blocks.teamId, actor.teamId),
        query.archived ? isNotNull(blocks.archivedAt) : isNull(blocks.archivedAt),
        after ? or(gt(blocks.name, after.name), and(eq(blocks.name, after.name), gt(blocks.id, after.id))) : undefined,
      ),
    )
    .orderBy(asc(blocks.name), asc(blocks.id))
    .limit(query.limit + 1);
  const page = pageOf(rows, query.limit, (row) => ({ name: row.name, id: row.id }));
  return { items: await toBlockDtos(db, actor.teamId, page.items), nextCursor: page.nextCursor };
}
