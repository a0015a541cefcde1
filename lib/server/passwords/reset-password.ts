import "server-only";
import { and, eq, gt, isNull } from "drizzle-orm";
import { db } from "@/db/client";
import { passwordResets, users } from "@/db/schema";
import { NotFound } from "@/lib/errors";
import { hashPassword } from "@/lib/server/crypto/password";
import { hashToken } from "@/lib/server/crypto/secret-token";

/** Sets a new password from a live reset link, once. */
export async function resetPassword(token: string, password: string): Promise<{ email: string }> {
  const passwordHash = await hashPassword(password);
  return db.transaction(async (tx) => {
    const [reset] = await tx
      .select({ id: passwordResets.id, userId: passwordResets.userId })
      .from(passwordResets)
      .where(
        and(eq(passwordResets.tokenHash, hashToken(token)), isNull(passwordResets.usedAt), gt(passwordResets.expiresAt, new Date())),
      )
      .for("update");
    if (!reset) throw new NotFound("reset link (it may have been used or have expired)");
    const [user] = await tx
      .update(users)
      .set({ passwordHash })
      .where(eq(users.id, reset.userId))
      .returning({ email: users.email });
    await tx.update(passwordResets).set({ usedAt: new Date() }).where(eq(passwordResets.id, reset.id));
    return { email: user!.email };
  });
}
