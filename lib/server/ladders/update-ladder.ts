import "server-only";
import { and, eq } from "drizzle-orm";
import { db } from "@/db/client";
import { ladders } from "@/db/schema";
import { NotFound } from "@/lib/errors";
import type { Actor } from "@/lib/server/actor";
import type { LadderPatch } from "@/lib/validation/ladders";
import { loadLadder } from "./ladder-dto";

/** Renames, re-describes, switches promotion mode, or archives/restores a ladder of the actor's team. */
export async function updateLadder(actor: Actor, ladderId: string, input: LadderPatch) {
  const updated = await db
    .update(ladders)
    .set({
      name: input.name,
      targetSkill: input.targetSkill,
      promotionMode: input.promotionMode,
      notes: input.notes,
      archivedAt: input.archived === undefined ? undefined : input.archived ? new Date() : null,
    })
    .where(and(eq(ladders.id, ladderId), eq(ladders.teamId, actor.teamId)))
    .returning({ id: ladders.id });
  if (updated.length === 0) throw new NotFound("ladder");
  return loadLadder(db, actor.teamId, ladderId);
}
