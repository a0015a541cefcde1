import { createServer, type AddressInfo } from "node:net";
import { afterAll, beforeAll, describe, expect, it } from "vitest";
import { GET as getMembership, PATCH as patchMembership } from "@/app/api/v1/billing/membership/route";
import { GET as getRevenue } from "@/app/api/v1/billing/revenue/route";
import { GET as listSubscribers } from "@/app/api/v1/billing/subscribers/route";
import { POST as checkout } from "@/app/api/v1/offers/[id]/checkout/route";
import { PATCH as patchOffer } from "@/app/api/v1/offers/[id]/route";
import { GET as listOffers, POST as createOfferRoute } from "@/app/api/v1/offers/route";
import { db } from "@/db/client";
import { billingSubscriptions } from "@/db/schema";
import type { PaymentsFake } from "@/scripts/dev-fakes/payments-fake.mjs";
import { clickOnCheckout, createOffer, deliverFrom, membershipRow, startFakeForTests } from "../support/billing-factories";
import { bearerFor, createAthleteRecord, createMember, createTeam } from "../support/factories";
import { call } from "../support/http";

let fake: PaymentsFake;
beforeAll(async () => {
  fake = await startFakeForTests();
});
afterAll(async () => {
  await fake.close();
});

async function teamWithAthlete() {
  const team = await createTeam();
  const ownerToken = await bearerFor(team.owner);
  const athlete = await createMember(team.teamId, "athlete", "Noor Vidal");
  return { ...team, ownerToken, athlete: athlete.actor, athleteToken: await bearerFor(athlete.actor) };
}

describe("coaching offers", () => {
  it("the owner creates, lists and edits offers; athletes see live ones only", async () => {
    const { ownerToken, athleteToken } = await teamWithAthlete();
    const created = await call(createOfferRoute, { token: ownerToken, json: { name: "Rings monthly", priceMinor: 5900, currency: "eur", includes: "Two plan reviews" } });
    expect(created.status).toBe(201);
    expect(created.data).toMatchObject({ name: "Rings monthly", priceMinor: 5900, currency: "EUR", archived: false });
    const id = created.data.id as string;
    const other = await createOffer(ownerToken, { name: "Handstand monthly", priceMinor: 1200, currency: "JPY" });

    const patched = await call(patchOffer, { token: ownerToken, method: "PATCH", params: { id: other }, json: { archived: true } });
    expect(patched.data.archived).toBe(true);

    const forOwner = await call(listOffers, { token: ownerToken });
    expect((forOwner.data.items as { id: string }[]).map((o) => o.id).sort()).toEqual([id, other].sort());
    const forAthlete = await call(listOffers, { token: athleteToken });
    expect((forAthlete.data.items as { id: string }[]).map((o) => o.id)).toEqual([id]);
  });

  it.each([
    [{ priceMinor: -100 }, "priceMinor"],
    [{ priceMinor: 0 }, "priceMinor"],
    [{ priceMinor: 1_000_001 }, "priceMinor"],
    [{ priceMinor: 12.5 }, "priceMinor"],
    [{ currency: "XYZ" }, "currency"],
    [{ currency: "EURO" }, "currency"],
    [{ name: "" }, "name"],
    [{ surprise: true }, ""],
  ])("refuses %j with 422 naming the field", async (override, path) => {
    const { ownerToken } = await teamWithAthlete();
    const res = await call(createOfferRoute, { token: ownerToken, json: { name: "Offer", priceMinor: 100, currency: "EUR", ...override } });
    expect(res.status).toBe(422);
    if (path) expect(res.data.error?.issues?.map((i) => i.path)).toContain(path);
  });

  it("only the owner manages offers; another team's offer is 404", async () => {
    const a = await teamWithAthlete();
    const b = await teamWithAthlete();
    const coach = await createMember(a.teamId, "coach");
    const offerOfB = await createOffer(b.ownerToken);
    expect((await call(createOfferRoute, { token: await bearerFor(coach.actor), json: { name: "x", priceMinor: 1, currency: "EUR" } })).status).toBe(403);
    expect((await call(patchOffer, { token: a.ownerToken, method: "PATCH", params: { id: offerOfB }, json: { name: "Mine now" } })).status).toBe(404);
  });
});

describe("checkout through the SDK and the fake", () => {
  it("checkout → pay on the hosted page → webhooks → active membership, subscriber list and revenue", async () => {
    const { ownerToken, athleteToken, athlete } = await teamWithAthlete();
    const offerId = await createOffer(ownerToken, { priceMinor: 4900, currency: "EUR" });
    const from = fake.outbox.length;

    const res = await call(checkout, { token: athleteToken, method: "POST", params: { id: offerId } });
    expect(res.status).toBe(200);
    const url = res.data.url as string;
    expect(url).toMatch(new RegExp(`^http://127\\.0\\.0\\.1:${fake.port}/checkout/cs_test_`));
    expect((await membershipRow(athlete.athleteId!))?.status).toBe("pending");

    const page = await fetch(url);
    expect(await page.text()).toContain("Test mode");
    const paid = await clickOnCheckout(url, "pay");
    expect(paid.status).toBe(303);
    const sessionId = url.split("/").pop()!;
    // The fake fills in the session id the way the provider does.
    expect(paid.location).toBe(`${process.env.APP_URL!.replace(/\/$/, "")}/billing?checkout=${sessionId}`);

    const statuses = await deliverFrom(fake, from);
    expect(statuses.every((s) => s === 200)).toBe(true);
    const row = await membershipRow(athlete.athleteId!);
    expect(row).toMatchObject({ status: "active", offerId, cancelAtPeriodEnd: false, lapsedAt: null });
    expect(row!.providerSubscriptionId).toMatch(/^sub_test_/);
    const fakeSub = fake.subscriptions.get(row!.providerSubscriptionId!)!;
    expect(row!.currentPeriodEnd?.getTime()).toBe(fakeSub.items.data[0]!.current_period_end * 1000);

    const subscribers = await call(listSubscribers, { token: ownerToken });
    expect(subscribers.data.items).toEqual([
      expect.objectContaining({ athleteId: athlete.athleteId, athleteName: "Noor Vidal", status: "active", priceMinor: 4900, currency: "EUR", canReceiveAssignments: true }),
    ]);
    const revenue = await call(getRevenue, { token: ownerToken });
    expect(revenue.data.totals).toEqual([{ currency: "EUR", amountMinor: 4900, payments: 1 }]);

    const membership = await call(getMembership, { token: athleteToken });
    expect(membership.data).toMatchObject({ billingEnabled: true, testMode: true });
    expect((membership.data.subscription as { nextChargeAt: string }).nextChargeAt).toBe(row!.currentPeriodEnd!.toISOString());

    // Paying twice is refused while active.
    expect((await call(checkout, { token: athleteToken, method: "POST", params: { id: offerId } })).status).toBe(409);

    // Cancel at period end: no next charge, still active until the period ends.
    const cancelled = await call(patchMembership, { token: athleteToken, method: "PATCH", json: { cancelAtPeriodEnd: true } });
    expect(cancelled.status).toBe(200);
    expect(cancelled.data.subscription).toMatchObject({ status: "active", cancelAtPeriodEnd: true, nextChargeAt: null });
    expect(fakeSub.cancel_at_period_end).toBe(true);
  });

  it("a checkout for another team's offer is 404 and creates nothing; staff cannot check out", async () => {
    const a = await teamWithAthlete();
    const b = await teamWithAthlete();
    const offerOfB = await createOffer(b.ownerToken);
    const res = await call(checkout, { token: a.athleteToken, method: "POST", params: { id: offerOfB } });
    expect(res.status).toBe(404);
    expect(await membershipRow(a.athlete.athleteId!)).toBeUndefined();
    expect((await call(checkout, { token: b.ownerToken, method: "POST", params: { id: offerOfB } })).status).toBe(403);
  });

  it("a failed card on the hosted page leaves the membership pending and sends nothing", async () => {
    const { ownerToken, athleteToken, athlete } = await teamWithAthlete();
    const offerId = await createOffer(ownerToken);
    const from = fake.outbox.length;
    const res = await call(checkout, { token: athleteToken, method: "POST", params: { id: offerId } });
    const failed = await clickOnCheckout(res.data.url as string, "fail");
    expect(failed.location).toMatch(/\/billing\?checkout=cancelled$/);
    expect(fake.outbox.length).toBe(from);
    expect((await membershipRow(athlete.athleteId!))?.status).toBe("pending");
  });

  it("pages the team's memberships by athlete name", async () => {
    const { teamId, ownerToken } = await teamWithAthlete();
    const offerId = await createOffer(ownerToken);
    const names = ["Cleo Marsh", "Abel Frost", "Bea Lund"];
    for (const name of names) {
      const athleteId = await createAthleteRecord(teamId, name);
      await db.insert(billingSubscriptions).values({ teamId, athleteId, offerId, status: "active" });
    }
    const first = await call(listSubscribers, { token: ownerToken, path: "/api/v1/billing/subscribers?limit=2" });
    expect(first.status).toBe(200);
    expect((first.data.items as { athleteName: string }[]).map((s) => s.athleteName)).toEqual(["Abel Frost", "Bea Lund"]);
    const cursor = first.data.nextCursor as string;
    expect(cursor).toEqual(expect.any(String));
    const second = await call(listSubscribers, { token: ownerToken, path: `/api/v1/billing/subscribers?limit=2&cursor=${encodeURIComponent(cursor)}` });
    expect((second.data.items as { athleteName: string }[]).map((s) => s.athleteName)).toEqual(["Cleo Marsh"]);
    expect(second.data.nextCursor).toBeNull();
    expect((await call(listSubscribers, { token: ownerToken, path: "/api/v1/billing/subscribers?limit=0" })).status).toBe(422);
  });

  it("answers 503 and stores nothing when the provider does not answer", async () => {
    const { ownerToken, athleteToken, athlete } = await teamWithAthlete();
    const offerId = await createOffer(ownerToken);
    const port = process.env.PAYMENTS_API_PORT;
    // A port nobody listens on: the SDK's connection is refused, as in a provider outage.
    process.env.PAYMENTS_API_PORT = String(await closedPort());
    try {
      const res = await call(checkout, { token: athleteToken, method: "POST", params: { id: offerId } });
      expect(res.status).toBe(503);
      expect(res.data.error?.code).toBe("service_unavailable");
    } finally {
      process.env.PAYMENTS_API_PORT = port;
    }
    expect(await membershipRow(athlete.athleteId!)).toBeUndefined();
  });
});

function closedPort(): Promise<number> {
  return new Promise((resolve, reject) => {
    const server = createServer();
    server.on("error", reject);
    server.listen(0, "127.0.0.1", () => {
      const { port } = server.address() as AddressInfo;
      server.close(() => resolve(port));
    });
  });
}
