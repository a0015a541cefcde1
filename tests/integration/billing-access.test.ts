import { eq } from "drizzle-orm";
import { afterAll, beforeAll, describe, expect, it } from "vitest";
import { POST as assignAthlete } from "@/app/api/v1/athletes/[id]/assignments/route";
import { PATCH as patchSettings } from "@/app/api/v1/billing/settings/route";
import { GET as listSubscribers } from "@/app/api/v1/billing/subscribers/route";
import { POST as createBlock } from "@/app/api/v1/blocks/route";
import { POST as checkout } from "@/app/api/v1/offers/[id]/checkout/route";
import { PATCH as patchOffer } from "@/app/api/v1/offers/[id]/route";
import { POST as createPlan } from "@/app/api/v1/plans/route";
import { db } from "@/db/client";
import { assignments } from "@/db/schema";
import type { PaymentsFake } from "@/scripts/dev-fakes/payments-fake.mjs";
import { clickOnCheckout, createOffer, deliverFrom, lapseDaysAgo, membershipRow, startFakeForTests } from "../support/billing-factories";
import { bearerFor, createMember, createTeam } from "../support/factories";
import { call } from "../support/http";
import { blockBody, createLadder } from "../support/training-factories";

let fake: PaymentsFake;
beforeAll(async () => {
  fake = await startFakeForTests();
});
afterAll(async () => {
  await fake.close();
});

async function setUp() {
  const team = await createTeam();
  const token = await bearerFor(team.owner);
  const l1 = await createLadder(team.teamId, [{ measure: "hold_seconds", target: 20 }]);
  const l2 = await createLadder(team.teamId, [{ measure: "reps", target: 8 }]);
  const block = await call(createBlock, { token, json: blockBody([l1.ladderId, l2.ladderId]) });
  const plan = await call(createPlan, { token, json: { name: "Base", weeks: 2, days: [{ weekday: 2, blockIds: [block.data.id] }] } });
  const athlete = await createMember(team.teamId, "athlete", "Teo Lindqvist");
  return { ...team, token, planId: plan.data.id as string, athleteId: athlete.actor.athleteId!, athleteToken: await bearerFor(athlete.actor) };
}

const assign = (token: string, athleteId: string, planId: string, startsOn = "2099-01-05") =>
  call(assignAthlete, { token, params: { id: athleteId }, json: { planId, startsOn } });

describe("membership rules on plan assignments", () => {
  it("a team without offers is never gated", async () => {
    const { token, athleteId, planId } = await setUp();
    expect((await assign(token, athleteId, planId)).status).toBe(201);
  });

  it("paid → assignable; failed renewal → past due, assignable within the grace period, refused after it; history kept", async () => {
    const { token, athleteId, athleteToken, planId } = await setUp();
    const offerId = await createOffer(token);
    // Never paid: refused once the team sells offers.
    const before = await assign(token, athleteId, planId);
    expect(before.status).toBe(409);

    const from = fake.outbox.length;
    const res = await call(checkout, { token: athleteToken, method: "POST", params: { id: offerId } });
    await clickOnCheckout(res.data.url as string, "pay");
    await deliverFrom(fake, from);
    expect((await assign(token, athleteId, planId)).status).toBe(201);

    const subId = (await membershipRow(athleteId))!.providerSubscriptionId!;
    const renewalFrom = fake.outbox.length;
    await fetch(`${fake.url}/_fake/subscriptions/${subId}/renew?outcome=fail`, { method: "POST" });
    await deliverFrom(fake, renewalFrom);
    const lapsed = await membershipRow(athleteId);
    expect(lapsed?.status).toBe("past_due");
    expect(lapsed?.lapsedAt).toBeInstanceOf(Date);

    expect((await call(patchSettings, { token, method: "PATCH", json: { graceDays: 5 } })).status).toBe(200);
    await lapseDaysAgo(athleteId, 4);
    expect((await assign(token, athleteId, planId, "2099-02-02")).status).toBe(201);

    await lapseDaysAgo(athleteId, 6);
    const refused = await assign(token, athleteId, planId, "2099-03-02");
    expect(refused.status).toBe(409);
    expect(JSON.stringify(refused.data)).toContain("Teo Lindqvist");
    const subscribers = await call(listSubscribers, { token });
    expect(subscribers.data.items).toEqual([expect.objectContaining({ athleteId, status: "past_due", canReceiveAssignments: false })]);
    // Billing never deletes training data: both earlier assignments are still there.
    expect(await db.select({ id: assignments.id }).from(assignments).where(eq(assignments.athleteId, athleteId))).toHaveLength(2);

    // The provider ends the subscription: cancelled, still refused, still nothing deleted.
    const endFrom = fake.outbox.length;
    await fetch(`${fake.url}/_fake/subscriptions/${subId}/end`, { method: "POST" });
    await deliverFrom(fake, endFrom);
    expect((await membershipRow(athleteId))?.status).toBe("cancelled");
    expect((await assign(token, athleteId, planId, "2099-04-06")).status).toBe(409);

    // Archiving every offer stops gating for the team.
    await call(patchOffer, { token, method: "PATCH", params: { id: offerId }, json: { archived: true } });
    expect((await assign(token, athleteId, planId, "2099-04-06")).status).toBe(201);
  });

  it("grace days outside 0–90 are 422", async () => {
    const { token } = await setUp();
    for (const graceDays of [-1, 91, 2.5]) {
      expect((await call(patchSettings, { token, method: "PATCH", json: { graceDays } })).status).toBe(422);
    }
  });
});
