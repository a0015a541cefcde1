import { eq } from "drizzle-orm";
import { beforeAll, describe, expect, it } from "vitest";
import { POST as postLog } from "@/app/api/v1/logs/route";
import { db } from "@/db/client";
import { logs } from "@/db/schema";
import { addDays } from "@/lib/engine/calendar-date";
import { localDateOf } from "@/lib/engine/local-date";
import { bearerFor, createAthleteRecord, createMember, createTeam } from "../support/factories";
import { call } from "../support/http";
import { newKey, placeOn, postLogAs, starterRung } from "../support/logging-factories";

const ZONE = "Pacific/Auckland";

interface Ctx {
  token: string;
  athleteId: string;
  hold: string;
  reps: string;
  eccentric: string;
  unplaced: string;
  foreign: string;
  today: string;
}
let ctx: Ctx;

beforeAll(async () => {
  const { teamId } = await createTeam({ timeZone: ZONE });
  const me = await createMember(teamId, "athlete", "Bad Input");
  const athleteId = me.actor.athleteId!;
  const hold = await placeOn(teamId, athleteId, "freestanding-handstand", "chest-to-wall-hold");
  const reps = await placeOn(teamId, athleteId, "handstand-push-up", "pike-push-up");
  const eccentric = await placeOn(teamId, athleteId, "front-lever", "straddle-lever-lowering");
  const unplaced = await starterRung(teamId, "ring-muscle-up", "ring-support-hold");
  const other = await createTeam();
  const otherAthlete = await createAthleteRecord(other.teamId);
  const foreign = await placeOn(other.teamId, otherAthlete, "freestanding-handstand", "chest-to-wall-hold");
  ctx = {
    token: await bearerFor(me.actor),
    athleteId,
    hold: hold.rungId,
    reps: reps.rungId,
    eccentric: eccentric.rungId,
    unplaced: unplaced.rungId,
    foreign: foreign.rungId,
    today: localDateOf(new Date(), ZONE),
  };
});

type Body = Record<string, unknown>;
const entry = (rungId: string, sets: unknown[], extra: Body = {}) => ({ rungId, sets, pain: false, ...extra });

// [label, body builder, status, first issue path]
const CASES: [string, (c: Ctx) => Body, number, string?][] = [
  ["zero entries", (c) => ({ performedOn: c.today, entries: [] }), 422, "entries"],
  ["no sets", (c) => ({ performedOn: c.today, entries: [entry(c.hold, [])] }), 422, "entries.0.sets"],
  ["more than 20 sets", (c) => ({ performedOn: c.today, entries: [entry(c.hold, Array.from({ length: 21 }, () => ({ value: 10 })))] }), 422, "entries.0.sets"],
  ["a negative hold", (c) => ({ performedOn: c.today, entries: [entry(c.hold, [{ value: -5 }])] }), 422, "entries.0.sets.0.value"],
  ["a two-hour hold", (c) => ({ performedOn: c.today, entries: [entry(c.hold, [{ value: 7200 }])] }), 422, "entries.0.sets.0.value"],
  ["500 reps", (c) => ({ performedOn: c.today, entries: [entry(c.reps, [{ value: 500 }])] }), 422, "entries.0.sets.0.value"],
  ["fractional reps", (c) => ({ performedOn: c.today, entries: [entry(c.reps, [{ value: 7.5 }])] }), 422, "entries.0.sets.0.value"],
  ["RPE 11", (c) => ({ performedOn: c.today, entries: [entry(c.hold, [{ value: 20, rpe: 11 }])] }), 422, "entries.0.sets.0.rpe"],
  ["RPE 0", (c) => ({ performedOn: c.today, entries: [entry(c.hold, [{ value: 20, rpe: 0 }])] }), 422, "entries.0.sets.0.rpe"],
  ["RIR 11", (c) => ({ performedOn: c.today, entries: [entry(c.hold, [{ value: 20, rir: 11 }])] }), 422, "entries.0.sets.0.rir"],
  ["RIR -1", (c) => ({ performedOn: c.today, entries: [entry(c.hold, [{ value: 20, rir: -1 }])] }), 422, "entries.0.sets.0.rir"],
  ["both RPE and RIR", (c) => ({ performedOn: c.today, entries: [entry(c.hold, [{ value: 20, rpe: 7, rir: 3 }])] }), 422, "entries.0.sets.0.rir"],
  ["a set with no value", (c) => ({ performedOn: c.today, entries: [entry(c.hold, [{ rpe: 7 }])] }), 422, "entries.0.sets.0.value"],
  ["lowerings on a hold rung", (c) => ({ performedOn: c.today, entries: [entry(c.hold, [{ value: 20, reps: 3 }])] }), 422, "entries.0.sets.0.reps"],
  ["one side only", (c) => ({ performedOn: c.today, entries: [entry(c.hold, [{ left: 20 }])] }), 422, "entries.0.sets.0.right"],
  ["sides on a one-sided rung", (c) => ({ performedOn: c.today, entries: [entry(c.hold, [{ left: 20, right: 20 }])] }), 422, "entries.0.sets.0.value"],
  ["an unknown field", (c) => ({ performedOn: c.today, entries: [entry(c.hold, [{ value: 20, weight: 5 }])] }), 422, "entries.0.sets.0"],
  ["a date after tomorrow", (c) => ({ performedOn: addDays(c.today, 2), entries: [entry(c.hold, [{ value: 20 }])] }), 422, "performedOn"],
  ["a date that does not exist", () => ({ performedOn: "2026-02-30", entries: [] }), 422, "performedOn"],
  // Year 0 is a date to JavaScript, not to PostgreSQL: it must stop at validation, not at the cast.
  ["year 0", (c) => ({ performedOn: "0000-01-01", entries: [entry(c.hold, [{ value: 20 }])] }), 422, "performedOn"],
  ["a NUL character in a note", (c) => ({ performedOn: c.today, entries: [entry(c.hold, [{ value: 20 }], { note: "sore\u0000wrist" })] }), 400],
  ["session RPE 12", (c) => ({ performedOn: c.today, sessionRpe: 12, entries: [entry(c.hold, [{ value: 20 }])] }), 422, "sessionRpe"],
  ["a 0-minute session", (c) => ({ performedOn: c.today, durationMinutes: 0, entries: [entry(c.hold, [{ value: 20 }])] }), 422, "durationMinutes"],
  ["a rung of a ladder the athlete is not on", (c) => ({ performedOn: c.today, entries: [entry(c.hold, [{ value: 20 }]), entry(c.unplaced, [{ value: 20 }])] }), 422, "entries.1.rungId"],
  ["another team's rung", (c) => ({ performedOn: c.today, entries: [entry(c.foreign, [{ value: 20 }])] }), 404],
  ["a rung id that is not a UUID", (c) => ({ performedOn: c.today, entries: [entry("abc", [{ value: 20 }])] }), 422, "entries.0.rungId"],
];

describe("POST /api/v1/logs refuses bad input clearly and writes nothing", () => {
  it.each(CASES)("%s", async (_label, build, status, path) => {
    const res = await postLogAs(ctx.token, build(ctx));
    expect(res.status).toBe(status);
    expect(res.data.error?.code).toBeTruthy();
    if (path) expect(res.data.error?.issues?.map((i) => i.path)).toContain(path);
    const rows = await db.select({ id: logs.id }).from(logs).where(eq(logs.athleteId, ctx.athleteId));
    expect(rows).toHaveLength(0);
  });

  it("accepts tomorrow (a late session in another zone) and lowerings on an eccentric rung", async () => {
    const res = await postLogAs(ctx.token, {
      performedOn: addDays(ctx.today, 1),
      entries: [entry(ctx.eccentric, [{ value: 4, reps: 3, rir: 2 }])],
    });
    expect(res.status).toBe(201);
  });

  it("refuses a body over 64 kB with 413", async () => {
    const res = await call(postLog, {
      method: "POST",
      token: ctx.token,
      rawBody: JSON.stringify({ performedOn: ctx.today, entries: [entry(ctx.hold, [{ value: 20 }], { note: "x".repeat(70 * 1024) })] }),
      headers: { "content-type": "application/json", "idempotency-key": newKey() },
    });
    expect(res.status).toBe(413);
  });

  it("refuses malformed JSON with 400 and a too-short key with 400", async () => {
    const bad = await call(postLog, { method: "POST", token: ctx.token, rawBody: "{", headers: { "content-type": "application/json", "idempotency-key": newKey() } });
    expect(bad.status).toBe(400);
    const shortKey = await postLogAs(ctx.token, { performedOn: ctx.today, entries: [entry(ctx.hold, [{ value: 20 }])] }, "abc");
    expect(shortKey.status).toBe(400);
  });
});
