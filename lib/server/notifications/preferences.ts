import "server-only";
import { inArray } from "drizzle-orm";
import type { Queryable } from "@/db/client";
import { notificationPreferences } from "@/db/schema";
import type { NotificationPreferencesInput, OptionalMailKind } from "@/lib/validation/notifications";

export type Preferences = NotificationPreferencesInput;

/** Everyone gets everything, digests on Monday at 07:00 team time, until they choose otherwise. */
export const DEFAULT_PREFERENCES: Preferences = {
  promotionNotices: true,
  approvalNotices: true,
  weeklyDigest: true,
  digestWeekday: 1,
  digestHour: 7,
  athleteSummary: true,
};

export const PREFERENCE_OF_KIND: Record<OptionalMailKind, keyof Preferences> = {
  promotion: "promotionNotices",
  approval_needed: "approvalNotices",
  digest: "weeklyDigest",
  athlete_summary: "athleteSummary",
};

/** Preferences by (normalised) address, defaults filled in. */
export async function preferencesFor(q: Queryable, emails: string[]): Promise<Map<string, Preferences>> {
  const wanted = [...new Set(emails.map((e) => e.toLowerCase()))];
  const result = new Map<string, Preferences>(wanted.map((e) => [e, DEFAULT_PREFERENCES]));
  if (wanted.length === 0) return result;
  const rows = await q
    .select({
      email: notificationPreferences.email,
      promotionNotices: notificationPreferences.promotionNotices,
      approvalNotices: notificationPreferences.approvalNotices,
      weeklyDigest: notificationPreferences.weeklyDigest,
      digestWeekday: notificationPreferences.digestWeekday,
      digestHour: notificationPreferences.digestHour,
      athleteSummary: notificationPreferences.athleteSummary,
    })
    .from(notificationPreferences)
    .where(inArray(notificationPreferences.email, wanted));
  for (const { email, ...prefs } of rows) result.set(email, prefs);
  return result;
}

export async function wantsMail(q: Queryable, email: string, kind: OptionalMailKind): Promise<boolean> {
  const prefs = (await preferencesFor(q, [email])).get(email.toLowerCase()) ?? DEFAULT_PREFERENCES;
  return Boolean(prefs[PREFERENCE_OF_KIND[kind]]);
}
