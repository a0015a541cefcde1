import "server-only";
import { and, eq } from "drizzle-orm";
import { db } from "@/db/client";
import { athletes } from "@/db/schema";
import { Conflict, NotFound, invalidField } from "@/lib/errors";
import type { Actor } from "@/lib/server/actor";
import { createInvite } from "./create-invite";

/** Sends (or re-sends) a sign-up link to an athlete record that has an e-mail and no account yet. */
export async function inviteAthlete(actor: Actor, athleteId: string) {
  const invite = await db.transaction(async (tx) => {
    const [athlete] = await tx
      .select({ id: athletes.id, email: athletes.email, userId: athletes.userId })
      .from(athletes)
      .where(and(eq(athletes.id, athleteId), eq(athletes.teamId, actor.teamId)));
    if (!athlete) throw new NotFound("athlete");
    if (athlete.userId) throw new Conflict("This athlete already has an account.");
    if (!athlete.email) throw invalidField("email", "Add an e-mail address to this athlete first.");
    return createInvite(tx, actor, { email: athlete.email, role: "athlete", athleteId });
  });
  return { id: invite.id, email: invite.email, role: invite.role, expiresAt: invite.expiresAt.toISOString() };
}
