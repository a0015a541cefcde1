import "server-only";
import { and, eq, isNull } from "drizzle-orm";
import { db } from "@/db/client";
import { ladders } from "@/db/schema";
import { NotFound } from "@/lib/errors";
import type { Actor } from "@/lib/server/actor";

/**
 * DELETE of a ladder archives it: athletes keep their positions and history, and it can be restored
 * with PATCH { archived: false }. Archiving twice is fine (still 204); another team's ladder is 404.
 */
export async function archiveLadder(actor: Actor, ladderId: string): Promise<void> {
  await db
    .update(ladders)
    .set({ archivedAt: new Date() })
    .where(and(eq(ladders.id, ladderId), eq(ladders.teamId, actor.teamId), isNull(ladders.archivedAt)));
  const [found] = await db
    .select({ id: ladders.id })
    .from(ladders)
    .where(and(eq(ladders.id, ladderId), eq(ladders.teamId, actor.teamId)));
  if (!found) throw new NotFound("ladder");
}
