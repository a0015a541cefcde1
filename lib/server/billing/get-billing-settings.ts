import "server-only";
import { db } from "@/db/client";
import type { Actor } from "@/lib/server/actor";
import type { BillingSettingsDto } from "@/lib/validation/billing";
import { graceDaysOf } from "./billing-settings";
import { paymentsConfig } from "./payments-config";

export async function getBillingSettings(actor: Actor): Promise<BillingSettingsDto> {
  const config = paymentsConfig();
  return { graceDays: await graceDaysOf(db, actor.teamId), billingEnabled: Boolean(config), testMode: config?.testMode ?? false };
}
