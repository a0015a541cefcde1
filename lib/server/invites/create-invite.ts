import "server-only";
import { addDays, format } from "date-fns";
import { eq } from "drizzle-orm";
import { createElement } from "react";
import type { Queryable } from "@/db/client";
import { invites, teams } from "@/db/schema";
import { InviteEmail } from "@/emails/invite-email";
import type { Actor } from "@/lib/server/actor";
import { hashToken, newSecretToken } from "@/lib/server/crypto/secret-token";
import { appLink, sendMail } from "@/lib/server/mail/send-mail";

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

/** A single-use invite; only the token's hash is stored, the link is returned to be e-mailed. */
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
  return {
    id: row!.id,
    email: input.email,
    role: input.role,
    link: appLink(`/invite/${token}`),
    expiresAt,
    teamName: team?.name ?? "your team",
    inviterName: actor.name,
  };
}

export async function sendInviteEmail(invite: CreatedInvite): Promise<void> {
  await sendMail({
    to: invite.email,
    subject: `${invite.inviterName} invited you to ${invite.teamName} on Rungwise`,
    body: createElement(InviteEmail, {
      teamName: invite.teamName,
      inviterName: invite.inviterName,
      role: invite.role,
      link: invite.link,
      expiresOn: format(invite.expiresAt, "d MMMM yyyy"),
    }),
  });
}
