import "server-only";
import { and, eq, isNull } from "drizzle-orm";
import { db } from "@/db/client";
import { athletes, billingOffers, billingSubscriptions } from "@/db/schema";
import { env } from "@/lib/env";
import { Conflict, Forbidden, NotFound } from "@/lib/errors";
import type { Actor } from "@/lib/server/actor";
import { callProvider, paymentsClient } from "./payments-client";

/**
 * Starts the provider's hosted checkout for the signed-in athlete and one offer of their team. The
 * membership row exists from here on (pending) so the webhook can find it; it turns active only when
 * the provider says the first invoice is paid.
 */
export async function startCheckout(actor: Actor, offerId: string): Promise<{ url: string }> {
  if (!actor.athleteId) throw new Forbidden("Only athletes buy a membership.");
  const [offer] = await db
    .select({ id: billingOffers.id, name: billingOffers.name, priceMinor: billingOffers.priceMinor, currency: billingOffers.currency })
    .from(billingOffers)
    .where(and(eq(billingOffers.id, offerId), eq(billingOffers.teamId, actor.teamId), isNull(billingOffers.archivedAt)));
  if (!offer) throw new NotFound("offer");
  const [athlete] = await db
    .select({ id: athletes.id, name: athletes.name, email: athletes.email })
    .from(athletes)
    .where(and(eq(athletes.id, actor.athleteId), eq(athletes.teamId, actor.teamId)));
  if (!athlete) throw new NotFound("athlete");

  const stripe = paymentsClient();
  const [existing] = await db
    .select({ id: billingSubscriptions.id, status: billingSubscriptions.status, customerId: billingSubscriptions.providerCustomerId })
    .from(billingSubscriptions)
    .where(eq(billingSubscriptions.athleteId, athlete.id));
  if (existing?.status === "active") throw new Conflict("Your membership is already active.");

  const metadata = { teamId: actor.teamId, athleteId: athlete.id, offerId: offer.id };
  const customerId =
    existing?.customerId ??
    (
      await callProvider(() =>
        stripe.customers.create({ email: athlete.email ?? actor.email, name: athlete.name, metadata: { teamId: actor.teamId, athleteId: athlete.id } }),
      )
    ).id;
  const appUrl = env().APP_URL.replace(/\/$/, "");
  const session = await callProvider(() => stripe.checkout.sessions.create({
    mode: "subscription",
    customer: customerId,
    client_reference_id: athlete.id,
    metadata,
    subscription_data: { metadata },
    line_items: [
      {
        quantity: 1,
        price_data: {
          currency: offer.currency.toLowerCase(),
          unit_amount: offer.priceMinor,
          recurring: { interval: "month" },
          product_data: { name: offer.name },
        },
      },
    ],
    success_url: `${appUrl}/billing?checkout={CHECKOUT_SESSION_ID}`,
    cancel_url: `${appUrl}/billing?checkout=cancelled`,
  }));
  if (!session.url) throw new Conflict("The payment provider returned no checkout page.");

  await db
    .insert(billingSubscriptions)
    .values({ teamId: actor.teamId, athleteId: athlete.id, offerId: offer.id, providerCustomerId: customerId, checkoutSessionId: session.id })
    .onConflictDoUpdate({
      target: billingSubscriptions.athleteId,
      set: { providerCustomerId: customerId, checkoutSessionId: session.id },
    });
  return { url: session.url };
}
