import "server-only";
import { eq } from "drizzle-orm";
import { db } from "@/db/client";
import { users } from "@/db/schema";
import { burnPasswordCheck, verifyPassword } from "@/lib/server/crypto/password";
import { ZSignIn } from "@/lib/validation/auth";
import { clearSignInFailures, clientIp, recordSignInFailure, signInRetryAfter, throttleKey } from "./sign-in-throttle";

/**
 * Auth.js `authorize`: the user for a correct e-mail + password, else null. Failures count toward
 * the per e-mail + address throttle; a success clears it.
 */
export async function verifyCredentials(credentials: unknown, headers: Headers): Promise<{ id: string } | null> {
  const parsed = ZSignIn.safeParse(credentials);
  if (!parsed.success) return null;
  const { email, password } = parsed.data;
  const key = throttleKey(email, clientIp(headers));
  if ((await signInRetryAfter(key)) > 0) return null;

  const [user] = await db
    .select({ id: users.id, passwordHash: users.passwordHash, disabledAt: users.disabledAt })
    .from(users)
    .where(eq(users.email, email));
  const ok = user ? await verifyPassword(password, user.passwordHash) : (await burnPasswordCheck(password), false);
  if (!user || !ok || user.disabledAt) {
    await recordSignInFailure(key);
    return null;
  }
  await clearSignInFailures(key);
  return { id: user.id };
}
