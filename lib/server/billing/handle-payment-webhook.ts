import "server-only";
import { eq } from "drizzle-orm";
import Stripe from "stripe";
import { db } from "@/db/client";
import { billingEvents, billingPayments, billingSubscriptions } from "@/db/schema";
import { BadRequest } from "@/lib/errors";
import { applyProviderSubscription } from "./apply-provider-subscription";
import { callProvider, paymentsClient } from "./payments-client";
import { paymentsConfig } from "./payments-config";

/** The provider's documented default: signatures older than five minutes are refused. */
const TOLERANCE_SECONDS = 300;
const HANDLED = new Set([
  "checkout.session.completed",
  "invoice.paid",
  "invoice.payment_failed",
  "customer.subscription.updated",
  "customer.subscription.deleted",
]);

const idOf = (value: string | { id: string } | null | undefined) => (typeof value === "string" ? value : (value?.id ?? null));

/** The subscription an event is about (checkout sessions are re-read to find it). */
async function subscriptionIdOf(stripe: Stripe, event: Stripe.Event): Promise<string | null> {
  const object = event.data.object as { object?: string; id?: string };
  if (event.type === "checkout.session.completed") {
    const session = await callProvider(() => stripe.checkout.sessions.retrieve(event.data.object.id));
    return idOf(session.subscription);
  }
  if (event.type === "invoice.paid" || event.type === "invoice.payment_failed") {
    return idOf(event.data.object.parent?.subscription_details?.subscription);
  }
  return object.object === "subscription" && object.id ? object.id : null;
}

/**
 * An object the provider no longer knows is nothing to apply (the event is recorded and ignored);
 * any other failure propagates, the answer is 5xx and the provider retries later.
 */
async function notFoundAsNull<T>(request: Promise<T>): Promise<T | null> {
  try {
    return await request;
  } catch (error) {
    if (error instanceof Stripe.errors.StripeInvalidRequestError && error.statusCode === 404) return null;
    throw error;
  }
}

/**
 * Verifies and handles one webhook delivery. Each event id is handled once (a replay answers
 * `duplicate: true` and changes nothing); the subscription is re-fetched from the provider, so
 * deliveries may arrive in any order. A bad signature is 400 before anything is read or written.
 */
export async function handlePaymentWebhook(rawBody: string, signature: string | null) {
  const secret = paymentsConfig()?.webhookSecret;
  if (!secret) throw new BadRequest("Payments are not set up on this server.");
  const stripe = paymentsClient();
  let event: Stripe.Event;
  try {
    event = stripe.webhooks.constructEvent(rawBody, signature ?? "", secret, TOLERANCE_SECONDS);
  } catch {
    throw new BadRequest("The webhook signature is missing, wrong or too old.");
  }

  const [seen] = await db.select({ id: billingEvents.eventId }).from(billingEvents).where(eq(billingEvents.eventId, event.id));
  if (seen) return { received: true, duplicate: true };

  const subscriptionId = HANDLED.has(event.type) ? await notFoundAsNull(subscriptionIdOf(stripe, event)) : null;
  const subscription = subscriptionId ? await notFoundAsNull(callProvider(() => stripe.subscriptions.retrieve(subscriptionId))) : null;

  const outcome = await db.transaction(async (tx) => {
    const [fresh] = await tx.insert(billingEvents).values({ eventId: event.id, type: event.type }).onConflictDoNothing().returning({ id: billingEvents.eventId });
    if (!fresh) return { duplicate: true, replaced: null };
    const applied = subscription ? await applyProviderSubscription(tx, subscription) : null;
    const rowId = applied?.id ?? null;
    if (event.type === "invoice.paid" && rowId) {
      const invoice = event.data.object;
      const [row] = await tx.select({ teamId: billingSubscriptions.teamId }).from(billingSubscriptions).where(eq(billingSubscriptions.id, rowId));
      if (invoice.id && row && invoice.amount_paid > 0) {
        const paidAt = invoice.status_transitions?.paid_at ?? event.created;
        await tx
          .insert(billingPayments)
          .values({ invoiceId: invoice.id, teamId: row.teamId, subscriptionId: rowId, amountMinor: invoice.amount_paid, currency: invoice.currency.toUpperCase(), paidAt: new Date(paidAt * 1000) })
          .onConflictDoNothing();
      }
    }
    return { duplicate: false, replaced: applied?.replaced ?? null };
  });
  if (outcome.replaced) await endReplacedSubscription(stripe, outcome.replaced);
  return { received: true, duplicate: outcome.duplicate };
}

/**
 * Ends the lapsed subscription a new checkout replaced. Best effort after the commit: if the
 * provider is down, its own retries of the failed renewal end the old one in time; we say so.
 */
async function endReplacedSubscription(stripe: Stripe, subscriptionId: string): Promise<void> {
  try {
    await callProvider(() => stripe.subscriptions.cancel(subscriptionId));
  } catch (error) {
    console.warn(`[billing] could not end replaced subscription ${subscriptionId}:`, error instanceof Error ? error.message : error);
  }
}
