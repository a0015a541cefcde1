import "server-only";
import { and, eq, gt, isNull } from "drizzle-orm";
import { db } from "@/db/client";
import { athletes, invites, users } from "@/db/schema";
import { Conflict, NotFound } from "@/lib/errors";
import { hashPassword } from "@/lib/server/crypto/password";
import { hashToken } from "@/lib/server/crypto/secret-token";
import type { AcceptInviteInput } from "@/lib/validation/auth";

/**
 * Turns a live invite into an account: a coach joins the team, an athlete's account is linked to the
 * athlete record the coach created. Single use: the invite row is locked and stamped.
 */
export async function acceptInvite(token: string, input: AcceptInviteInput) {
  const passwordHash = await hashPassword(input.password);
  return db.transaction(async (tx) => {
    const [invite] = await tx
      .select()
      .from(invites)
      .where(and(eq(invites.tokenHash, hashToken(token)), isNull(invites.acceptedAt), gt(invites.expiresAt, new Date())))
      .for("update");
    if (!invite) throw new NotFound("invite (it may have been used or have expired)");
    const [existing] = await tx.select({ id: users.id }).from(users).where(eq(users.email, invite.email));
    if (existing) throw new Conflict("An account with this e-mail address already exists. Sign in instead.");

    const [user] = await tx
      .insert(users)
      .values({ teamId: invite.teamId, email: invite.email, name: input.name, role: invite.role, passwordHash })
      .returning({ id: users.id });
    if (invite.athleteId) {
      await tx
        .update(athletes)
        .set({ userId: user!.id, email: invite.email })
        .where(and(eq(athletes.id, invite.athleteId), eq(athletes.teamId, invite.teamId)));
    }
    await tx.update(invites).set({ acceptedAt: new Date() }).where(eq(invites.id, invite.id));
    return { userId: user!.id, email: invite.email, role: invite.role };
  });
}
