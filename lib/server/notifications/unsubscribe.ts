import "server-only";
import { sql } from "drizzle-orm";
import { db } from "@/db/client";
import { notificationPreferences } from "@/db/schema";
import { DEFAULT_PREFERENCES, PREFERENCE_OF_KIND } from "./preferences";
import { readUnsubscribeToken, type UnsubscribeTarget } from "./unsubscribe-link";

/** Turns one kind of mail off for the address in a signed link. Idempotent; null for a bad link. */
export async function unsubscribe(token: string): Promise<UnsubscribeTarget | null> {
  const target = readUnsubscribeToken(token);
  if (!target) return null;
  const column = PREFERENCE_OF_KIND[target.kind];
  await db
    .insert(notificationPreferences)
    .values({ ...DEFAULT_PREFERENCES, email: target.email, teamId: target.teamId, [column]: false })
    .onConflictDoUpdate({ target: notificationPreferences.email, set: { [column]: false, updatedAt: sql`now()` } });
  return target;
}
