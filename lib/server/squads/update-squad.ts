import "server-only";
import { and, eq, isNull } from "drizzle-orm";
import { db } from "@/db/client";
import { squads } from "@/db/schema";
import { NotFound } from "@/lib/errors";
import type { Actor } from "@/lib/server/actor";
import type { UpdateSquadInput } from "@/lib/validation/squads";
import { getSquad } from "./get-squad";

/** Renames or re-describes a squad of the actor's team. */
export async function updateSquad(actor: Actor, squadId: string, input: UpdateSquadInput) {
  const updated = await db
    .update(squads)
    .set({ name: input.name, description: input.description === undefined ? undefined : input.description || null })
    .where(and(eq(squads.id, squadId), eq(squads.teamId, actor.teamId), isNull(squads.archivedAt)))
    .returning({ id: squads.id });
  if (updated.length === 0) throw new NotFound("squad");
  return getSquad(actor, squadId);
}
