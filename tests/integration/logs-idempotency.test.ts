import { eq } from "drizzle-orm";
import { describe, expect, it } from "vitest";
import { db } from "@/db/client";
import { logEntries, logs } from "@/db/schema";
import { localDateOf } from "@/lib/engine/local-date";
import { bearerFor, createMember, createTeam } from "../support/factories";
import { newKey, placeOn, postLogAs } from "../support/logging-factories";

async function athleteSetup() {
  const { teamId } = await createTeam({ timeZone: "Europe/Amsterdam" });
  const { actor } = await createMember(teamId, "athlete", "Idem Athlete");
  const rung = await placeOn(teamId, actor.athleteId!, "freestanding-handstand", "chest-to-wall-hold");
  return { teamId, actor, token: await bearerFor(actor), rung, today: localDateOf(new Date(), "Europe/Amsterdam") };
}

async function logCount(athleteId: string) {
  return (await db.select({ id: logs.id }).from(logs).where(eq(logs.athleteId, athleteId))).length;
}

describe("POST /api/v1/logs idempotency", () => {
  it("answers a retry with the same key and body with the original response and writes one row", async () => {
    const { actor, token, rung, today } = await athleteSetup();
    const body = { performedOn: today, entries: [{ rungId: rung.rungId, sets: [{ value: 25, rpe: 7 }], pain: false }] };
    const key = newKey();
    const first = await postLogAs(token, body, key);
    expect(first.status).toBe(201);
    expect(first.data).toMatchObject({ athleteId: actor.athleteId, performedOn: today, enteredById: actor.userId });
    // One set of 25 s is one session that does not meet a 3-set standard: an explained "not yet".
    expect(first.data.verdicts).toMatchObject([{ rungId: rung.rungId, status: "not_yet", promotedTo: null }]);
    // Same body with keys in another order: the canonical hash is the same.
    const second = await postLogAs(token, { entries: body.entries, performedOn: today }, key);
    expect(second.status).toBe(201);
    expect(second.data).toEqual(first.data);
    expect(second.headers.get("idempotent-replayed")).toBe("true");
    expect(await logCount(actor.athleteId!)).toBe(1);
  });

  it("refuses the same key with a different body (409) and writes nothing more", async () => {
    const { actor, token, rung, today } = await athleteSetup();
    const key = newKey();
    const entry = (value: number) => ({ performedOn: today, entries: [{ rungId: rung.rungId, sets: [{ value }], pain: false }] });
    expect((await postLogAs(token, entry(20), key)).status).toBe(201);
    const reuse = await postLogAs(token, entry(21), key);
    expect(reuse.status).toBe(409);
    expect(reuse.data.error?.code).toBe("conflict");
    expect(await logCount(actor.athleteId!)).toBe(1);
  });

  it("keeps keys per caller: another person may use the same key", async () => {
    const { teamId, token, rung, today } = await athleteSetup();
    const other = await createMember(teamId, "athlete", "Other Athlete");
    await placeOn(teamId, other.actor.athleteId!, "freestanding-handstand", "chest-to-wall-hold");
    const key = newKey();
    const body = { performedOn: today, entries: [{ rungId: rung.rungId, sets: [{ value: 20 }], pain: false }] };
    expect((await postLogAs(token, body, key)).status).toBe(201);
    expect((await postLogAs(await bearerFor(other.actor), body, key)).status).toBe(201);
  });

  it("writes exactly one row for 8 concurrent posts with one key", async () => {
    const { actor, token, rung, today } = await athleteSetup();
    const key = newKey();
    const body = { performedOn: today, entries: [{ rungId: rung.rungId, sets: [{ value: 30 }, { value: 28 }], pain: false }] };
    const results = await Promise.all(Array.from({ length: 8 }, () => postLogAs(token, body, key)));
    const statuses = results.map((r) => r.status);
    expect(statuses.filter((s) => s === 201)).not.toHaveLength(0);
    for (const status of statuses) expect([201, 409]).toContain(status);
    const ids = new Set(results.filter((r) => r.status === 201).map((r) => r.data.id));
    expect(ids.size).toBe(1);
    expect(await logCount(actor.athleteId!)).toBe(1);
    const entries = await db.select({ id: logEntries.id }).from(logEntries).where(eq(logEntries.athleteId, actor.athleteId!));
    expect(entries).toHaveLength(1);
  });

  it("releases the key when the write fails, so a corrected retry goes through", async () => {
    const { actor, token, rung, today } = await athleteSetup();
    const key = newKey();
    const bad = await postLogAs(token, { performedOn: today, entries: [{ rungId: rung.rungId, sets: [{ left: 5, right: 5 }], pain: false }] }, key);
    expect(bad.status).toBe(422);
    const good = await postLogAs(token, { performedOn: today, entries: [{ rungId: rung.rungId, sets: [{ value: 5 }], pain: false }] }, key);
    expect(good.status).toBe(201);
    expect(await logCount(actor.athleteId!)).toBe(1);
  });

  it("requires an Idempotency-Key header (400)", async () => {
    const { token, rung, today } = await athleteSetup();
    const res = await postLogAs(token, { performedOn: today, entries: [{ rungId: rung.rungId, sets: [{ value: 5 }], pain: false }] }, null);
    expect(res.status).toBe(400);
    expect(res.data.error?.code).toBe("bad_request");
  });
});
