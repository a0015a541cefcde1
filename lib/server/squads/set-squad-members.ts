import "server-only";
import { and, eq, isNull } from "drizzle-orm";
import { db } from "@/db/client";
import { squads } from "@/db/schema";
import { NotFound } from "@/lib/errors";
import type { Actor } from "@/lib/server/actor";
import type { SquadMembersInput } from "@/lib/validation/squads";
import { getSquad } from "./get-squad";
import { replaceMembers } from "./replace-members";

/** Replaces a squad's member list; nothing changes when any id is not an athlete of the team. */
export async function setSquadMembers(actor: Actor, squadId: string, input: SquadMembersInput) {
  return db.transaction(async (tx) => {
    const [squad] = await tx
      .select({ id: squads.id })
      .from(squads)
      .where(and(eq(squads.id, squadId), eq(squads.teamId, actor.teamId), isNull(squads.archivedAt)))
      .for("update");
    if (!squad) throw new NotFound("squad");
    await replaceMembers(tx, actor.teamId, squadId, input.athleteIds);
    return getSquad(actor, squadId, tx);
  });
}
