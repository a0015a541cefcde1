import "server-only";
import { and, eq } from "drizzle-orm";
import { db } from "@/db/client";
import { billingOffers, billingSubscriptions } from "@/db/schema";
import { Forbidden } from "@/lib/errors";
import type { Actor } from "@/lib/server/actor";
import type { MembershipDto, SubscriptionStatus } from "@/lib/validation/billing";
import { paymentsConfig } from "./payments-config";

/** The signed-in athlete's own membership: offer, status and the next charge date. */
export async function getMembership(actor: Actor): Promise<MembershipDto> {
  if (!actor.athleteId) throw new Forbidden("Only athletes have a membership.");
  const config = paymentsConfig();
  const [row] = await db
    .select({
      offerId: billingOffers.id,
      offerName: billingOffers.name,
      priceMinor: billingOffers.priceMinor,
      currency: billingOffers.currency,
      status: billingSubscriptions.status,
      currentPeriodEnd: billingSubscriptions.currentPeriodEnd,
      cancelAtPeriodEnd: billingSubscriptions.cancelAtPeriodEnd,
    })
    .from(billingSubscriptions)
    .innerJoin(billingOffers, eq(billingOffers.id, billingSubscriptions.offerId))
    .where(and(eq(billingSubscriptions.teamId, actor.teamId), eq(billingSubscriptions.athleteId, actor.athleteId)));
  const periodEnd = row?.currentPeriodEnd?.toISOString() ?? null;
  return {
    billingEnabled: Boolean(config),
    testMode: config?.testMode ?? false,
    subscription: row
      ? {
          ...row,
          status: row.status as SubscriptionStatus,
          currentPeriodEnd: periodEnd,
          // Nothing more is charged once cancelled, or when the period ends with a cancellation.
          nextChargeAt: row.status === "active" && !row.cancelAtPeriodEnd ? periodEnd : null,
        }
      : null,
  };
}
