import "server-only";
import { and, eq } from "drizzle-orm";
import { db } from "@/db/client";
import { billingSubscriptions } from "@/db/schema";
import { Conflict, Forbidden, NotFound } from "@/lib/errors";
import type { Actor } from "@/lib/server/actor";
import { applyProviderSubscription } from "./apply-provider-subscription";
import { getMembership } from "./get-membership";
import { callProvider, paymentsClient } from "./payments-client";

/**
 * The athlete cancels at the end of the paid period (or takes that back). The provider is told
 * first; its answer is written straight away, and the webhook that follows changes nothing more.
 */
export async function setCancelAtPeriodEnd(actor: Actor, cancelAtPeriodEnd: boolean) {
  if (!actor.athleteId) throw new Forbidden("Only athletes have a membership.");
  const [row] = await db
    .select({ providerSubscriptionId: billingSubscriptions.providerSubscriptionId, status: billingSubscriptions.status })
    .from(billingSubscriptions)
    .where(and(eq(billingSubscriptions.teamId, actor.teamId), eq(billingSubscriptions.athleteId, actor.athleteId)));
  if (!row?.providerSubscriptionId) throw new NotFound("membership");
  if (row.status === "cancelled") throw new Conflict("This membership has already ended.");
  const subscriptionId = row.providerSubscriptionId;
  const sub = await callProvider(() => paymentsClient().subscriptions.update(subscriptionId, { cancel_at_period_end: cancelAtPeriodEnd }));
  await db.transaction((tx) => applyProviderSubscription(tx, sub));
  return getMembership(actor);
}
