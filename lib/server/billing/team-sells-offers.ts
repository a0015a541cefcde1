import "server-only";
import { and, eq, isNull } from "drizzle-orm";
import type { Queryable } from "@/db/client";
import { DEMO_OWNER } from "@/db/seed/demo-cast";
import { billingOffers, users } from "@/db/schema";
import { paymentsConfig } from "./payments-config";

/**
 * Billing gates a team only while this server takes payments and the team has a live offer:
 * archiving every offer (or running without a payment key) turns gating off. The demo club is never
 * gated, so a tester trying offers on it cannot lock its athletes out of plans.
 */
export async function teamSellsOffers(q: Queryable, teamId: string): Promise<boolean> {
  if (!paymentsConfig()) return false;
  const [offer] = await q
    .select({ id: billingOffers.id })
    .from(billingOffers)
    .where(and(eq(billingOffers.teamId, teamId), isNull(billingOffers.archivedAt)))
    .limit(1);
  if (!offer) return false;
  const [demo] = await q
    .select({ id: users.id })
    .from(users)
    .where(and(eq(users.teamId, teamId), eq(users.email, DEMO_OWNER.email)))
    .limit(1);
  return !demo;
}
