// Billing tests: each file starts its own development payments fake in-process on a free port (the
// webhooks are held in its outbox, so a test delivers them itself, in any order, as often as it
// likes) and points the app's SDK settings at it.
import { eq } from "drizzle-orm";
import { POST as createOfferRoute } from "@/app/api/v1/offers/route";
import { POST as webhookRoute } from "@/app/api/webhooks/payments/route";
import { db } from "@/db/client";
import { billingSubscriptions } from "@/db/schema";
import { startPaymentsFake, type FakeDelivery, type PaymentsFake } from "@/scripts/dev-fakes/payments-fake.mjs";
import { call } from "./http";

export const TEST_WEBHOOK_SECRET = "whsec_billing_tests_0123456789abcdef";

export async function startFakeForTests(): Promise<PaymentsFake> {
  const fake = await startPaymentsFake({ port: 0, webhookSecret: TEST_WEBHOOK_SECRET, deliver: "hold" });
  Object.assign(process.env, {
    STRIPE_SECRET_KEY: "sk_test_billing_tests_000000",
    STRIPE_WEBHOOK_SECRET: TEST_WEBHOOK_SECRET,
    PAYMENTS_API_HOST: "127.0.0.1",
    PAYMENTS_API_PORT: String(fake.port),
    PAYMENTS_API_PROTOCOL: "http",
  });
  return fake;
}

/** Posts a delivery (or any body and signature header) to the app's webhook route. */
export async function deliver(delivery: Pick<FakeDelivery, "payload" | "header">) {
  return call(webhookRoute, { method: "POST", path: "/api/webhooks/payments", rawBody: delivery.payload, headers: { "stripe-signature": delivery.header, "content-type": "application/json" } });
}

/** Everything the fake has queued since `from`, delivered in order. */
export async function deliverFrom(fake: PaymentsFake, from: number) {
  const statuses = [];
  for (const d of fake.outbox.slice(from)) statuses.push((await deliver(d)).status);
  return statuses;
}

/** A tester's click on the fake's hosted checkout page. */
export async function clickOnCheckout(checkoutUrl: string, button: "pay" | "fail") {
  const res = await fetch(`${checkoutUrl}/${button}`, { method: "POST", redirect: "manual" });
  return { status: res.status, location: res.headers.get("location") };
}

export async function createOffer(token: string, body: Record<string, unknown> = {}) {
  const res = await call(createOfferRoute, { token, json: { name: "Monthly coaching", priceMinor: 4900, currency: "EUR", includes: "Weekly plan review", ...body } });
  if (res.status !== 201) throw new Error(`offer not created: ${JSON.stringify(res.data)}`);
  return res.data.id as string;
}

export async function membershipRow(athleteId: string) {
  const [row] = await db.select().from(billingSubscriptions).where(eq(billingSubscriptions.athleteId, athleteId));
  return row;
}

/** Moves the start of a lapse into the past, as if days had gone by. */
export async function lapseDaysAgo(athleteId: string, days: number) {
  await db
    .update(billingSubscriptions)
    .set({ lapsedAt: new Date(Date.now() - days * 86_400_000) })
    .where(eq(billingSubscriptions.athleteId, athleteId));
}
