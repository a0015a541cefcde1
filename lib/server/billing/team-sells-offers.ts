import "server-only";
import { and, eq, isNull } from "drizzle-orm";
import type { Queryable } from "@/db/client";
import { billingOffers } from "@/db/schema";
import { paymentsConfig } from "./payments-config";

/**
 * Billing gates a team only while this server takes payments and the team has a live offer:
 * archiving every offer (or running without a payment key, as the demo does) turns gating off.
 */
export async function teamSellsOffers(q: Queryable, teamId: string): Promise<boolean> {
  if (!paymentsConfig()) return false;
  const [offer] = await q
    .select({ id: billingOffers.id })
    .from(billingOffers)
    .where(and(eq(billingOffers.teamId, teamId), isNull(billingOffers.archivedAt)))
    .limit(1);
  return Boolean(offer);
}
