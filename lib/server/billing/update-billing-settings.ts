import "server-only";
import { db } from "@/db/client";
import { billingSettings } from "@/db/schema";
import type { Actor } from "@/lib/server/actor";
import type { BillingSettingsInput } from "@/lib/validation/billing";
import { getBillingSettings } from "./get-billing-settings";

/** Sets the team's grace period; it applies at once to every lapsed membership. */
export async function updateBillingSettings(actor: Actor, input: BillingSettingsInput) {
  await db
    .insert(billingSettings)
    .values({ teamId: actor.teamId, graceDays: input.graceDays })
    .onConflictDoUpdate({ target: billingSettings.teamId, set: { graceDays: input.graceDays } });
  return getBillingSettings(actor);
}
