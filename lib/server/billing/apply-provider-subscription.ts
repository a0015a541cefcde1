import "server-only";
import { and, eq } from "drizzle-orm";
import type Stripe from "stripe";
import type { Tx } from "@/db/client";
import { athletes, billingOffers, billingSubscriptions } from "@/db/schema";
import type { SubscriptionStatus } from "@/lib/validation/billing";

/** The provider's many subscription states, as the owner needs to read them. */
export function statusOf(providerStatus: Stripe.Subscription.Status): SubscriptionStatus {
  switch (providerStatus) {
    case "active":
    case "trialing":
      return "active";
    case "past_due":
    case "unpaid":
    case "paused":
      return "past_due";
    case "canceled":
    case "incomplete_expired":
      return "cancelled";
    default:
      return "pending";
  }
}

/** Recent API versions keep the billing period on each item, not on the subscription. */
export function periodEndOf(sub: Stripe.Subscription): Date | null {
  const ends = sub.items.data.map((item) => item.current_period_end).filter((n): n is number => typeof n === "number");
  return ends.length ? new Date(Math.max(...ends) * 1000) : null;
}

const idOf = (value: string | { id: string } | null | undefined) => (typeof value === "string" ? value : (value?.id ?? null));

export interface AppliedSubscription {
  /** The athlete's membership row. */
  id: string;
  /**
   * The provider subscription this one replaced while it was still billing (a lapsed athlete paid
   * through a new checkout): the caller ends it at the provider so nobody pays twice.
   */
  replaced: string | null;
}

/**
 * Writes the provider's current view of a subscription onto the athlete's membership row. Called
 * with a freshly fetched object, so the order events arrive in does not matter. Returns null when
 * the subscription is not one of ours.
 */
export async function applyProviderSubscription(tx: Tx, sub: Stripe.Subscription, now = new Date()): Promise<AppliedSubscription | null> {
  const meta = sub.metadata ?? {};
  let [row] = await tx
    .select({ id: billingSubscriptions.id, lapsedAt: billingSubscriptions.lapsedAt, providerSubscriptionId: billingSubscriptions.providerSubscriptionId, status: billingSubscriptions.status })
    .from(billingSubscriptions)
    .where(eq(billingSubscriptions.providerSubscriptionId, sub.id))
    .for("update");
  if (!row && meta.teamId && meta.athleteId) {
    [row] = await tx
      .select({ id: billingSubscriptions.id, lapsedAt: billingSubscriptions.lapsedAt, providerSubscriptionId: billingSubscriptions.providerSubscriptionId, status: billingSubscriptions.status })
      .from(billingSubscriptions)
      .innerJoin(athletes, eq(athletes.id, billingSubscriptions.athleteId))
      .where(and(eq(billingSubscriptions.teamId, meta.teamId), eq(billingSubscriptions.athleteId, meta.athleteId)))
      .for("update");
  }
  if (!row) return null;

  const status = statusOf(sub.status);
  // A late event about an older, ended subscription must not overwrite the athlete's newer one.
  const isNewer = Boolean(row.providerSubscriptionId) && row.providerSubscriptionId !== sub.id;
  if (isNewer && status !== "active" && status !== "past_due") return { id: row.id, replaced: null };
  const replaced = isNewer && status === "active" && row.status === "past_due" ? row.providerSubscriptionId : null;

  let offerId: string | undefined;
  if (meta.offerId && meta.teamId) {
    const [offer] = await tx
      .select({ id: billingOffers.id })
      .from(billingOffers)
      .where(and(eq(billingOffers.id, meta.offerId), eq(billingOffers.teamId, meta.teamId)));
    offerId = offer?.id;
  }
  await tx
    .update(billingSubscriptions)
    .set({
      status,
      ...(offerId ? { offerId } : {}),
      providerSubscriptionId: sub.id,
      providerCustomerId: idOf(sub.customer),
      currentPeriodEnd: periodEndOf(sub),
      cancelAtPeriodEnd: sub.cancel_at_period_end,
      lapsedAt: status === "active" ? null : (row.lapsedAt ?? (status === "pending" ? null : now)),
    })
    .where(eq(billingSubscriptions.id, row.id));
  return { id: row.id, replaced };
}
