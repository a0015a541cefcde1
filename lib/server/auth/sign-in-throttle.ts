import "server-only";
import { and, asc, count, eq, gt, lte } from "drizzle-orm";
import { db } from "@/db/client";
import { signInAttempts } from "@/db/schema";

// 10 failures for one e-mail + address within 15 minutes locks that pair until the oldest expires.
export const SIGN_IN_LIMIT = 10;
export const SIGN_IN_WINDOW_MS = 15 * 60 * 1000;

export function throttleKey(email: string, ip: string): string {
  return `${email.trim().toLowerCase()}|${ip}`;
}

/** Seconds until another attempt is allowed, or 0 when the pair may try now. */
export async function signInRetryAfter(key: string, now = new Date()): Promise<number> {
  const since = new Date(now.getTime() - SIGN_IN_WINDOW_MS);
  const [row] = await db
    .select({ n: count() })
    .from(signInAttempts)
    .where(and(eq(signInAttempts.key, key), gt(signInAttempts.attemptedAt, since)));
  if ((row?.n ?? 0) < SIGN_IN_LIMIT) return 0;
  const [oldest] = await db
    .select({ at: signInAttempts.attemptedAt })
    .from(signInAttempts)
    .where(and(eq(signInAttempts.key, key), gt(signInAttempts.attemptedAt, since)))
    .orderBy(asc(signInAttempts.attemptedAt))
    .limit(1);
  const freeAt = (oldest?.at.getTime() ?? now.getTime()) + SIGN_IN_WINDOW_MS;
  return Math.max(1, Math.ceil((freeAt - now.getTime()) / 1000));
}

export async function recordSignInFailure(key: string, now = new Date()): Promise<void> {
  await db.transaction(async (tx) => {
    await tx
      .delete(signInAttempts)
      .where(and(eq(signInAttempts.key, key), lte(signInAttempts.attemptedAt, new Date(now.getTime() - SIGN_IN_WINDOW_MS))));
    await tx.insert(signInAttempts).values({ key, attemptedAt: now });
  });
}

export async function clearSignInFailures(key: string): Promise<void> {
  await db.delete(signInAttempts).where(eq(signInAttempts.key, key));
}

/** The caller's address as the server sees it (the first hop a proxy reports). */
export function clientIp(headers: Headers): string {
  const forwarded = headers.get("x-forwarded-for")?.split(",")[0]?.trim();
  return forwarded || headers.get("x-real-ip") || "local";
}
