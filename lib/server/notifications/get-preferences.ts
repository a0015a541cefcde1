import "server-only";
import { db } from "@/db/client";
import type { Actor } from "@/lib/server/actor";
import { DEFAULT_PREFERENCES, preferencesFor, type Preferences } from "./preferences";

export async function getPreferences(actor: Actor): Promise<Preferences> {
  return (await preferencesFor(db, [actor.email])).get(actor.email.toLowerCase()) ?? DEFAULT_PREFERENCES;
}
