import "server-only";
import { eq } from "drizzle-orm";
import { redirect } from "next/navigation";
import { signIn } from "@/auth";
import { db } from "@/db/client";
import { users } from "@/db/schema";
import { homeFor } from "@/lib/navigation";

/**
 * Signs in with e-mail + password (setting the session cookie) and sends the person straight to
 * their role's home. Throws Auth.js's CredentialsSignin on a wrong password; redirects on success.
 */
export async function signInAndGoHome(email: string, password: string): Promise<never> {
  await signIn("credentials", { email, password, redirect: false });
  const [user] = await db.select({ role: users.role }).from(users).where(eq(users.email, email));
  redirect(homeFor(user?.role ?? "athlete"));
}
