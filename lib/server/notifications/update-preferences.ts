import "server-only";
import { db } from "@/db/client";
import { notificationPreferences } from "@/db/schema";
import type { Actor } from "@/lib/server/actor";
import type { NotificationPreferencesInput } from "@/lib/validation/notifications";
import type { Preferences } from "./preferences";

/** The actor's own mail choices (keyed by their address, scoped to their team). */
export async function updatePreferences(actor: Actor, input: NotificationPreferencesInput): Promise<Preferences> {
  await db
    .insert(notificationPreferences)
    .values({ email: actor.email.toLowerCase(), teamId: actor.teamId, ...input })
    .onConflictDoUpdate({ target: notificationPreferences.email, set: { ...input, teamId: actor.teamId } });
  return input;
}
