import "server-only";
import { eq, isNull, and } from "drizzle-orm";
import { db } from "@/db/client";
import { passwordResets, users } from "@/db/schema";
import { hashToken, newSecretToken } from "@/lib/server/crypto/secret-token";
import { enqueueMail } from "@/lib/server/jobs/enqueue-mail";
import { appLink } from "@/lib/server/mail/send-mail";

const RESET_MINUTES = 60;

/**
 * Queues a single-use reset link when the address has an account (the reset row and the mail job
 * commit together). The caller answers the same either way, so the form does not reveal who has an
 * account.
 */
export async function requestPasswordReset(email: string): Promise<void> {
  const [user] = await db
    .select({ id: users.id, name: users.name, teamId: users.teamId })
    .from(users)
    .where(and(eq(users.email, email), isNull(users.disabledAt)));
  if (!user) return;
  const token = newSecretToken("rst");
  await db.transaction(async (tx) => {
    const [reset] = await tx
      .insert(passwordResets)
      .values({
        userId: user.id,
        tokenHash: hashToken(token),
        expiresAt: new Date(Date.now() + RESET_MINUTES * 60 * 1000),
      })
      .returning({ id: passwordResets.id });
    await enqueueMail(tx, {
      kind: "password_reset",
      teamId: user.teamId,
      resetId: reset!.id,
      to: email,
      name: user.name,
      link: appLink(`/reset-password/${token}`),
    });
  });
}
