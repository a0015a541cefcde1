import "server-only";
import { db } from "@/db/client";
import { athletes } from "@/db/schema";
import type { Actor } from "@/lib/server/actor";
import { createInvite } from "@/lib/server/invites/create-invite";
import type { CreateAthleteInput } from "@/lib/validation/athletes";
import { assertCoachInTeam } from "./assert-coach-in-team";
import { assertEmailFree } from "./assert-email-free";
import { getAthlete } from "./get-athlete";

/**
 * A new athlete record in the actor's team. Without an e-mail (or without `invite`) it is a record the
 * coach logs for; with `invite: true` a single-use sign-up link is queued for
 * mail in the same transaction.
 */
export async function createAthlete(actor: Actor, input: CreateAthleteInput) {
  const primaryCoachId = input.primaryCoachId ?? actor.userId;
  const { athleteId } = await db.transaction(async (tx) => {
    await assertCoachInTeam(tx, actor.teamId, primaryCoachId);
    if (input.email) await assertEmailFree(tx, actor.teamId, input.email);
    const [row] = await tx
      .insert(athletes)
      .values({
        teamId: actor.teamId,
        name: input.name,
        email: input.email ?? null,
        primaryCoachId,
        notes: input.notes ?? null,
      })
      .returning({ id: athletes.id });
    const athleteId = row!.id;
    const invite =
      input.invite && input.email
        ? await createInvite(tx, actor, { email: input.email, role: "athlete", athleteId })
        : null;
    return { athleteId, invite };
  });
  return getAthlete(actor, athleteId);
}
