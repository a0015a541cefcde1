import "server-only";
import { and, asc, eq, gt, isNull, or } from "drizzle-orm";
import type { z } from "zod";
import { db } from "@/db/client";
import { squads } from "@/db/schema";
import type { Actor } from "@/lib/server/actor";
import { decodeCursor, pageOf, zNameIdCursor } from "@/lib/server/http/cursor";
import type { ZSquadListQuery } from "@/lib/validation/squads";
import { squadColumns, withMembers } from "./squad-dto";

/** The team's squads by name, a page at a time, each with its members. */
export async function listSquads(actor: Actor, query: z.output<typeof ZSquadListQuery>) {
  const after = decodeCursor(zNameIdCursor, query.cursor);
  const rows = await db
    .select(squadColumns)
    .from(squads)
    .where(
      and(
        eq(squads.teamId, actor.teamId),
        isNull(squads.archivedAt),
        after ? or(gt(squads.name, after.name), and(eq(squads.name, after.name), gt(squads.id, after.id))) : undefined,
      ),
    )
    .orderBy(asc(squads.name), asc(squads.id))
    .limit(query.limit + 1);
  const page = pageOf(rows, query.limit, (row) => ({ name: row.name, id: row.id }));
  return { items: await withMembers(db, actor.teamId, page.items), nextCursor: page.nextCursor };
}
