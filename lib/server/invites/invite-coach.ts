import "server-only";
import { eq } from "drizzle-orm";
import { db } from "@/db/client";
import { users } from "@/db/schema";
import { Conflict } from "@/lib/errors";
import type { Actor } from "@/lib/server/actor";
import { createInvite } from "./create-invite";

/** An owner invites another coach to the team. */
export async function inviteCoach(actor: Actor, email: string) {
  const invite = await db.transaction(async (tx) => {
    const [existing] = await tx.select({ id: users.id }).from(users).where(eq(users.email, email));
    if (existing) throw new Conflict("Someone already has an account with that e-mail address.");
    return createInvite(tx, actor, { email, role: "coach" });
  });
  return { id: invite.id, email: invite.email, role: invite.role, expiresAt: invite.expiresAt.toISOString() };
}
