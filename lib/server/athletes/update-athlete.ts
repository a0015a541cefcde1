import "server-only";
import { and, eq } from "drizzle-orm";
import { db } from "@/db/client";
import { athletes } from "@/db/schema";
import { NotFound } from "@/lib/errors";
import type { Actor } from "@/lib/server/actor";
import type { UpdateAthleteInput } from "@/lib/validation/athletes";
import { assertCoachInTeam } from "./assert-coach-in-team";
import { assertEmailFree } from "./assert-email-free";
import { getAthlete } from "./get-athlete";

/** Changes an athlete record of the actor's team (staff only; the route checks the role). */
export async function updateAthlete(actor: Actor, athleteId: string, input: UpdateAthleteInput) {
  await db.transaction(async (tx) => {
    if (input.primaryCoachId) await assertCoachInTeam(tx, actor.teamId, input.primaryCoachId);
    if (input.email) await assertEmailFree(tx, actor.teamId, input.email, athleteId);
    const updated = await tx
      .update(athletes)
      .set({
        name: input.name,
        email: input.email,
        primaryCoachId: input.primaryCoachId,
        notes: input.notes,
        archivedAt: input.archived === undefined ? undefined : input.archived ? new Date() : null,
      })
      .where(and(eq(athletes.id, athleteId), eq(athletes.teamId, actor.teamId)))
      .returning({ id: athletes.id });
    if (updated.length === 0) throw new NotFound("athlete");
  });
  return getAthlete(actor, athleteId);
}
