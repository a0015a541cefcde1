import "server-only";
import { eq, isNull, and } from "drizzle-orm";
import { createElement } from "react";
import { db } from "@/db/client";
import { passwordResets, users } from "@/db/schema";
import { PasswordResetEmail } from "@/emails/password-reset-email";
import { hashToken, newSecretToken } from "@/lib/server/crypto/secret-token";
import { appLink, sendMail } from "@/lib/server/mail/send-mail";

const RESET_MINUTES = 60;

/**
 * E-mails a single-use reset link when the address has an account. The caller answers the same
 * either way, so the form does not reveal who has an account.
 */
export async function requestPasswordReset(email: string): Promise<void> {
  const [user] = await db
    .select({ id: users.id, name: users.name })
    .from(users)
    .where(and(eq(users.email, email), isNull(users.disabledAt)));
  if (!user) return;
  const token = newSecretToken("rst");
  await db.insert(passwordResets).values({
    userId: user.id,
    tokenHash: hashToken(token),
    expiresAt: new Date(Date.now() + RESET_MINUTES * 60 * 1000),
  });
  await sendMail({
    to: email,
    subject: "Choose a new Rungwise password",
    body: createElement(PasswordResetEmail, { name: user.name, link: appLink(`/reset-password/${token}`) }),
  });
}
