import { getISODay } from "date-fns";
import { eq } from "drizzle-orm";
import { describe, expect, it } from "vitest";
import { POST as assignAthlete } from "@/app/api/v1/athletes/[id]/assignments/route";
import { POST as createBlock } from "@/app/api/v1/blocks/route";
import { POST as createPlan } from "@/app/api/v1/plans/route";
import { db } from "@/db/client";
import { assignments } from "@/db/schema";
import { NotFound } from "@/lib/errors";
import { planForDay } from "@/lib/server/plans/plan-for-day";
import { writePlacement } from "@/lib/server/positions/write-placement";
import { bearerFor, createAthleteRecord, createMember, createTeam } from "../support/factories";
import { call } from "../support/http";
import { blockBody, createLadder } from "../support/training-factories";

// 2026-03-02 is a Monday (ISO 8601 weekday 1; date-fns getISODay as the reference, checked below).
const MONDAY = "2026-03-02";

async function setUp() {
  // Auckland is UTC+13 (NZ daylight time) until 5 April 2026 (IANA tz database).
  const team = await createTeam({ timeZone: "Pacific/Auckland" });
  const token = await bearerFor(team.owner);
  const hold = await createLadder(team.teamId, [
    { name: "Tuck hold", measure: "hold_seconds", target: 20 },
    { name: "Straddle hold", measure: "hold_seconds", target: 40 },
  ], "Lever line");
  const reps = await createLadder(team.teamId, [{ name: "Pike push-up", measure: "reps", target: 8 }], "Press line");
  const monday = await call(createBlock, {
    token,
    json: { ...blockBody([hold.ladderId, reps.ladderId], { name: "Monday block" }), slots: [{ ladderId: hold.ladderId, target: "3 calm holds", note: "Hollow body" }, { ladderId: reps.ladderId, sets: 2 }] },
  });
  const wednesday = await call(createBlock, { token, json: blockBody([reps.ladderId, hold.ladderId], { name: "Wednesday block", rounds: 1 }) });
  const plan = await call(createPlan, {
    token,
    json: { name: "Two days", weeks: 2, warmUp: "Joint circles", coolDown: "Easy stretch", days: [{ weekday: 1, blockIds: [monday.data.id] }, { weekday: 3, blockIds: [wednesday.data.id] }] },
  });
  const athlete = await createAthleteRecord(team.teamId, "Mia Tane");
  const assigned = await call(assignAthlete, { token, params: { id: athlete }, json: { planId: plan.data.id, startsOn: MONDAY } });
  return { ...team, token, hold, reps, athlete, planId: plan.data.id as string, assignmentId: assigned.data.id as string };
}

describe("planForDay", () => {
  it("returns the weekday's blocks in order with slots, plan name, warm-up and cool-down", async () => {
    const { owner, athlete, hold, reps, planId, assignmentId } = await setUp();
    const result = await planForDay(owner, athlete, MONDAY);
    expect(getISODay(new Date(2026, 2, 2))).toBe(1);
    expect(result.weekday).toBe(1);
    expect(result.items).toHaveLength(1);
    const [session] = result.items;
    expect(session).toMatchObject({ assignmentId, planId, planName: "Two days", week: 1, weeks: 2, warmUp: "Joint circles", coolDown: "Easy stretch" });
    expect(session!.blocks.map((b) => b.name)).toEqual(["Monday block"]);
    expect(session!.blocks[0]!.slots).toEqual([
      { position: 1, ladderId: hold.ladderId, ladderName: "Lever line", sets: null, target: "3 calm holds", note: "Hollow body", rung: { id: hold.rungIds[0], name: "Tuck hold", measure: "hold_seconds" } },
      { position: 2, ladderId: reps.ladderId, ladderName: "Press line", sets: 2, target: null, note: null, rung: { id: reps.rungIds[0], name: "Pike push-up", measure: "reps" } },
    ]);
    // Worked by hand: 3 rounds; the push-ups' 2 sets go to rounds 1 and 2 (lib/engine/duration.ts).
    //   round 1 and 2: 20 s hold + 60 s rest + 8 × 3 s = 24 s → 104 s each; round 3: the hold alone, 20 s
    //   + 2 × 120 s between rounds → 104 + 104 + 20 + 240 = 468 s
    expect(session!.blocks[0]!.durationSec).toBe(468);
    expect(session!.durationSec).toBe(468);
  });

  it("reads the athlete's current rung for the estimate", async () => {
    const { owner, teamId, athlete, hold } = await setUp();
    await db.transaction((tx) =>
      writePlacement(tx, { teamId, athleteId: athlete, ladderId: hold.ladderId, rungId: hold.rungIds[1]!, since: MONDAY, actorUserId: owner.userId }),
    );
    const [session] = (await planForDay(owner, athlete, MONDAY)).items;
    expect(session!.blocks[0]!.slots[0]!.rung?.name).toBe("Straddle hold");
    // The hold is now 40 s instead of 20 s in each of 3 rounds: 468 + 3 × 20 = 528 s.
    expect(session!.durationSec).toBe(528);
  });

  it("picks the weekday in the team's time zone when given an instant", async () => {
    const { owner, athlete } = await setUp();
    // Sunday 8 March 2026, 20:00 UTC is Monday 9 March, 09:00 in Auckland (UTC+13).
    const result = await planForDay(owner, athlete, new Date("2026-03-08T20:00:00Z"));
    expect(result.date).toBe("2026-03-09");
    expect(result.weekday).toBe(1);
    expect(result.items[0]?.blocks.map((b) => b.name)).toEqual(["Monday block"]);
    expect(result.items[0]?.week).toBe(2);
    // Wednesday 4 March, 11:00 UTC is Thursday 00:00 in Auckland: nothing on Thursdays.
    expect((await planForDay(owner, athlete, new Date("2026-03-04T11:00:00Z"))).items).toEqual([]);
    expect((await planForDay(owner, athlete, new Date("2026-03-04T10:59:00Z"))).items[0]?.blocks.map((b) => b.name)).toEqual(["Wednesday block"]);
  });

  it("is empty on rest days, before the start, after the plan's weeks, after the end date and when cancelled", async () => {
    const { owner, athlete, assignmentId } = await setUp();
    expect((await planForDay(owner, athlete, "2026-03-03")).items).toEqual([]); // Tuesday: rest day
    expect((await planForDay(owner, athlete, "2026-02-23")).items).toEqual([]); // a Monday before the start
    expect((await planForDay(owner, athlete, "2026-03-11")).items).toHaveLength(1); // Wednesday of week 2
    expect((await planForDay(owner, athlete, "2026-03-16")).items).toEqual([]); // Monday of week 3: the plan has 2 weeks
    await db.update(assignments).set({ endsOn: "2026-03-08" }).where(eq(assignments.id, assignmentId));
    expect((await planForDay(owner, athlete, "2026-03-09")).items).toEqual([]);
    expect((await planForDay(owner, athlete, MONDAY)).items).toHaveLength(1);
    await db.update(assignments).set({ cancelledAt: new Date() }).where(eq(assignments.id, assignmentId));
    expect((await planForDay(owner, athlete, MONDAY)).items).toEqual([]);
  });

  it("lets athletes read only their own day and hides other teams' athletes", async () => {
    const { owner, teamId, token, planId } = await setUp();
    const { actor } = await createMember(teamId, "athlete", "Self");
    await call(assignAthlete, { token, params: { id: actor.athleteId! }, json: { planId, startsOn: MONDAY } });
    expect((await planForDay(actor, actor.athleteId!, MONDAY)).items).toHaveLength(1);
    const other = await createAthleteRecord(teamId, "Other");
    await expect(planForDay(actor, other, MONDAY)).rejects.toBeInstanceOf(NotFound);
    const elsewhere = await createTeam();
    await expect(planForDay(elsewhere.owner, actor.athleteId!, MONDAY)).rejects.toBeInstanceOf(NotFound);
    expect((await planForDay(owner, other, MONDAY)).items).toEqual([]);
  });
});
