import Stripe from "stripe";
import { afterAll, beforeAll, describe, expect, it } from "vitest";
import { POST as checkout } from "@/app/api/v1/offers/[id]/checkout/route";
import { db } from "@/db/client";
import { billingEvents, billingPayments } from "@/db/schema";
import { signPayload, type PaymentsFake } from "@/scripts/dev-fakes/payments-fake.mjs";
import { eq } from "drizzle-orm";
import { clickOnCheckout, createOffer, deliver, deliverFrom, membershipRow, startFakeForTests, TEST_WEBHOOK_SECRET } from "../support/billing-factories";
import { bearerFor, createMember, createTeam } from "../support/factories";
import { call } from "../support/http";

let fake: PaymentsFake;
beforeAll(async () => {
  fake = await startFakeForTests();
});
afterAll(async () => {
  await fake.close();
});

const sdk = new Stripe("sk_test_reference_only", { apiVersion: "2026-10-28.endive" });

/** An athlete who has paid on the fake; the webhooks are still held in the outbox. */
async function paidCheckout() {
  const team = await createTeam();
  const ownerToken = await bearerFor(team.owner);
  const athlete = await createMember(team.teamId, "athlete", "Ines Moreau");
  const offerId = await createOffer(ownerToken, { priceMinor: 3000, currency: "GBP" });
  const athleteToken = await bearerFor(athlete.actor);
  const res = await call(checkout, { token: athleteToken, method: "POST", params: { id: offerId } });
  const from = fake.outbox.length;
  await clickOnCheckout(res.data.url as string, "pay");
  return { athleteId: athlete.actor.athleteId!, athleteToken, offerId, deliveries: fake.outbox.slice(from), from, teamId: team.teamId };
}

describe("webhook signatures", () => {
  // The provider's documented scheme: header `t=<unix>,v1=<hex HMAC-SHA256(secret, "<t>.<payload>")>`;
  // the SDK's own test-header generator is the reference.
  it("the fake signs exactly as the SDK's generateTestHeaderString does", () => {
    const payload = JSON.stringify({ id: "evt_x", object: "event", type: "invoice.paid" });
    const timestamp = 1_790_000_000;
    expect(signPayload(payload, TEST_WEBHOOK_SECRET, timestamp)).toBe(
      sdk.webhooks.generateTestHeaderString({ payload, secret: TEST_WEBHOOK_SECRET, timestamp }),
    );
  });

  it("refuses unsigned, wrongly signed, tampered and stale deliveries with 400, changing nothing", async () => {
    const { athleteId, deliveries } = await paidCheckout();
    const completed = deliveries.find((d) => d.event.type === "checkout.session.completed")!;
    const now = Math.floor(Date.now() / 1000);
    const attempts = [
      { payload: completed.payload, header: "" },
      { payload: completed.payload, header: sdk.webhooks.generateTestHeaderString({ payload: completed.payload, secret: "whsec_someone_else_000000" }) },
      { payload: completed.payload.replace("checkout.session.completed", "invoice.paid"), header: completed.header },
      { payload: completed.payload, header: sdk.webhooks.generateTestHeaderString({ payload: completed.payload, secret: TEST_WEBHOOK_SECRET, timestamp: now - 600 }) },
      { payload: completed.payload, header: `t=${now},v1=${"0".repeat(64)}` },
    ];
    for (const attempt of attempts) {
      const res = await deliver(attempt);
      expect(res.status).toBe(400);
      expect(res.data.error?.code).toBe("bad_request");
    }
    expect((await membershipRow(athleteId))?.status).toBe("pending");
    expect(await db.select().from(billingEvents).where(eq(billingEvents.eventId, completed.event.id))).toEqual([]);

    // The SDK's reference header for the same payload is accepted.
    const good = await deliver({ payload: completed.payload, header: sdk.webhooks.generateTestHeaderString({ payload: completed.payload, secret: TEST_WEBHOOK_SECRET }) });
    expect(good.status).toBe(200);
    expect((await membershipRow(athleteId))?.status).toBe("active");
  });
});

describe("idempotent, order-independent handling", () => {
  it("a replayed event changes nothing: one payment recorded, duplicate reported", async () => {
    const { athleteId, deliveries } = await paidCheckout();
    for (const d of deliveries) expect((await deliver(d)).data.duplicate).toBe(false);
    const row = await membershipRow(athleteId);
    const invoice = deliveries.find((d) => d.event.type === "invoice.paid")!;
    const replay = await deliver(invoice);
    expect(replay.status).toBe(200);
    expect(replay.data.duplicate).toBe(true);
    expect(await membershipRow(athleteId)).toEqual(row);
    const payments = await db.select().from(billingPayments).where(eq(billingPayments.subscriptionId, row!.id));
    expect(payments).toHaveLength(1);
    expect(payments[0]).toMatchObject({ amountMinor: 3000, currency: "GBP" });
  });

  it("events delivered newest first end in the same state as in order (the subscription is re-fetched)", async () => {
    const { athleteId, deliveries, from } = await paidCheckout();
    const subId = (await (async () => {
      const completed = deliveries.find((d) => d.event.type === "customer.subscription.created")!;
      return completed.event.data.object.id as string;
    })());
    // A failed renewal, then a successful one: the provider's latest state is active.
    await fetch(`${fake.url}/_fake/subscriptions/${subId}/renew?outcome=fail`, { method: "POST" });
    await fetch(`${fake.url}/_fake/subscriptions/${subId}/renew?outcome=pay`, { method: "POST" });
    const all = fake.outbox.slice(from);
    for (const d of [...all].reverse()) expect((await deliver(d)).status).toBe(200);
    const row = await membershipRow(athleteId);
    expect(row).toMatchObject({ status: "active", lapsedAt: null, providerSubscriptionId: subId });
    expect(row!.currentPeriodEnd?.getTime()).toBe(fake.subscriptions.get(subId)!.items.data[0]!.current_period_end * 1000);
    // Two paid invoices (first month and renewal), each once.
    expect(await db.select().from(billingPayments).where(eq(billingPayments.subscriptionId, row!.id))).toHaveLength(2);
    // Everything again, in order: nothing changes.
    expect((await deliverFrom(fake, from)).every((s) => s === 200)).toBe(true);
    expect(await membershipRow(athleteId)).toEqual(row);
  });
});

describe("events about unknown objects", () => {
  it("a signed event for a subscription the provider does not know is recorded and ignored", async () => {
    const payload = JSON.stringify({
      id: `evt_test_unknown_${Date.now()}`,
      object: "event",
      type: "customer.subscription.updated",
      created: Math.floor(Date.now() / 1000),
      data: { object: { id: "sub_test_does_not_exist", object: "subscription" } },
    });
    const res = await deliver({ payload, header: sdk.webhooks.generateTestHeaderString({ payload, secret: TEST_WEBHOOK_SECRET }) });
    expect(res.status).toBe(200);
    expect(res.data.duplicate).toBe(false);
  });
});

describe("paying again after a failed renewal", () => {
  it("ends the lapsed subscription at the provider once the new one is paid, so nobody pays twice", async () => {
    const first = await paidCheckout();
    await deliverFrom(fake, first.from);
    const oldSub = (await membershipRow(first.athleteId))!.providerSubscriptionId!;
    const lapseFrom = fake.outbox.length;
    await fetch(`${fake.url}/_fake/subscriptions/${oldSub}/renew?outcome=fail`, { method: "POST" });
    await deliverFrom(fake, lapseFrom);
    expect((await membershipRow(first.athleteId))?.status).toBe("past_due");

    // The athlete checks out again with a working card.
    const res = await call(checkout, { token: first.athleteToken, method: "POST", params: { id: first.offerId } });
    expect(res.status).toBe(200);
    const payFrom = fake.outbox.length;
    await clickOnCheckout(res.data.url as string, "pay");
    await deliverFrom(fake, payFrom);

    const row = await membershipRow(first.athleteId);
    expect(row?.status).toBe("active");
    expect(row?.providerSubscriptionId).not.toBe(oldSub);
    expect(fake.subscriptions.get(oldSub)?.status).toBe("canceled");
    // The provider's "deleted" event about the old subscription does not touch the new membership.
    await deliverFrom(fake, payFrom);
    expect(await membershipRow(first.athleteId)).toEqual(row);
  });
});
