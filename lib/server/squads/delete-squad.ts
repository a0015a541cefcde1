import "server-only";
import { and, eq } from "drizzle-orm";
import { db } from "@/db/client";
import { squads } from "@/db/schema";
import { NotFound } from "@/lib/errors";
import type { Actor } from "@/lib/server/actor";

/**
 * Deletes a squad and its member list. Assignments made through it stay with each athlete (their
 * squad reference is cleared by the foreign key), so nobody loses a plan.
 */
export async function deleteSquad(actor: Actor, squadId: string): Promise<void> {
  const deleted = await db
    .delete(squads)
    .where(and(eq(squads.id, squadId), eq(squads.teamId, actor.teamId)))
    .returning({ id: squads.id });
  if (deleted.length === 0) throw new NotFound("squad");
}
