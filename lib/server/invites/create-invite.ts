import "server-only";
import { addDays } from "date-fns";
import { eq } from "drizzle-orm";
import type { Queryable } from "@/db/client";
import { invites, teams } from "@/db/schema";
import type { Actor } from "@/lib/server/actor";
import { hashToken, newSecretToken } from "@/lib/server/crypto/secret-token";
import { enqueueMail } from "@/lib/server/jobs/enqueue-mail";
import { appLink } from "@/lib/server/mail/send-mail";

export const INVITE_DAYS = 7;

export interface CreatedInvite {
  id: string;
  email: string;
  role: "coach" | "athlete";
  link: string;
  expiresAt: Date;
  teamName: string;
  inviterName: string;
}

/**
 * A single-use invite; only the token's hash is stored. The e-mail with the link is queued in the
 * caller's transaction (pass the transaction as `q`), so a rolled-back request mails nothing.
 */
export async function createInvite(
  q: Queryable,
  actor: Actor,
  input: { email: string; role: "coach" | "athlete"; athleteId?: string },
): Promise<CreatedInvite> {
  const token = newSecretToken("inv");
  const expiresAt = addDays(new Date(), INVITE_DAYS);
  const [row] = await q
    .insert(invites)
    .values({
      teamId: actor.teamId,
      email: input.email,
      role: input.role,
      athleteId: input.athleteId ?? null,
      invitedById: actor.userId,
      tokenHash: hashToken(token),
      expiresAt,
    })
    .returning({ id: invites.id });
  const [team] = await q.select({ name: teams.name }).from(teams).where(eq(teams.id, actor.teamId));
  const invite: CreatedInvite = {
    id: row!.id,
    email: input.email,
    role: input.role,
    link: appLink(`/invite/${token}`),
    expiresAt,
    teamName: team?.name ?? "your team",
    inviterName: actor.name,
  };
  await enqueueMail(q, {
    kind: "invite",
    teamId: actor.teamId,
    inviteId: invite.id,
    to: invite.email,
    teamName: invite.teamName,
    inviterName: invite.inviterName,
    role: invite.role,
    link: invite.link,
    expiresAt: expiresAt.toISOString(),
  });
  return invite;
}
