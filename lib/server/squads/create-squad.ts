import "server-only";
import { db } from "@/db/client";
import { squads } from "@/db/schema";
import type { Actor } from "@/lib/server/actor";
import type { CreateSquadInput } from "@/lib/validation/squads";
import { getSquad } from "./get-squad";
import { replaceMembers } from "./replace-members";

/** A new squad of the actor's team, optionally with its first members, in one transaction. */
export async function createSquad(actor: Actor, input: CreateSquadInput) {
  return db.transaction(async (tx) => {
    const [row] = await tx
      .insert(squads)
      .values({ teamId: actor.teamId, name: input.name, description: input.description || null })
      .returning({ id: squads.id });
    await replaceMembers(tx, actor.teamId, row!.id, input.athleteIds ?? []);
    return getSquad(actor, row!.id, tx);
  });
}
