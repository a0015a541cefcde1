import { and, eq } from "drizzle-orm";
import { describe, expect, it } from "vitest";
import { GET as listAssignments, POST as assignAthlete } from "@/app/api/v1/athletes/[id]/assignments/route";
import { POST as createBlock } from "@/app/api/v1/blocks/route";
import { POST as createPlan } from "@/app/api/v1/plans/route";
import { POST as assignSquad } from "@/app/api/v1/squads/[id]/assignments/route";
import { POST as createSquad } from "@/app/api/v1/squads/route";
import { db } from "@/db/client";
import { athletePositions, positionMoves } from "@/db/schema";
import { addDays, localDateOf } from "@/lib/engine";
import { writePlacement } from "@/lib/server/positions/write-placement";
import { bearerFor, createAthleteRecord, createMember, createTeam } from "../support/factories";
import { call } from "../support/http";
import { blockBody, createLadder } from "../support/training-factories";

type Assignment = { id: string; athleteId: string; squadId: string | null; startsOn: string; endsOn: string | null; lastDay: string; placed?: { ladderId: string; rungId: string }[] };

async function setUp() {
  const team = await createTeam({ timeZone: "Europe/Amsterdam" });
  const token = await bearerFor(team.owner);
  const l1 = await createLadder(team.teamId, [{ measure: "hold_seconds", target: 20 }, { measure: "hold_seconds", target: 30 }]);
  const l2 = await createLadder(team.teamId, [{ measure: "reps", target: 8 }, { measure: "reps", target: 12 }]);
  const block = await call(createBlock, { token, json: blockBody([l1.ladderId, l2.ladderId]) });
  const plan = await call(createPlan, { token, json: { name: "Two ladders", weeks: 3, days: [{ weekday: 2, blockIds: [block.data.id] }] } });
  return { ...team, token, l1, l2, planId: plan.data.id as string };
}

async function positionsOf(athleteId: string) {
  return db.select({ ladderId: athletePositions.ladderId, rungId: athletePositions.rungId, since: athletePositions.since }).from(athletePositions).where(eq(athletePositions.athleteId, athleteId));
}

describe("assignments", () => {
  it("places the athlete on the first rung only where unplaced; an existing position is untouched", async () => {
    const { token, teamId, owner, l1, l2, planId } = await setUp();
    const athlete = await createAthleteRecord(teamId, "Rui Okoro");
    await db.transaction((tx) =>
      writePlacement(tx, { teamId, athleteId: athlete, ladderId: l1.ladderId, rungId: l1.rungIds[1]!, since: "2026-01-10", actorUserId: owner.userId }),
    );
    const startsOn = "2099-03-03"; // in the future: the clock on a new rung starts on the start date
    const res = await call(assignAthlete, { token, params: { id: athlete }, json: { planId, startsOn, endsOn: "2099-03-10" } });
    expect(res.status).toBe(201);
    const assignment = res.data as unknown as Assignment;
    expect(assignment).toMatchObject({ athleteId: athlete, squadId: null, startsOn, endsOn: "2099-03-10", lastDay: "2099-03-10" });
    expect(assignment.placed).toEqual([{ ladderId: l2.ladderId, rungId: l2.rungIds[0] }]);

    const positions = await positionsOf(athlete);
    expect(positions.find((p) => p.ladderId === l1.ladderId)).toEqual({ ladderId: l1.ladderId, rungId: l1.rungIds[1], since: "2026-01-10" });
    expect(positions.find((p) => p.ladderId === l2.ladderId)).toEqual({ ladderId: l2.ladderId, rungId: l2.rungIds[0], since: startsOn });
    const moves = await db.select({ cause: positionMoves.cause }).from(positionMoves).where(and(eq(positionMoves.athleteId, athlete), eq(positionMoves.ladderId, l2.ladderId)));
    expect(moves).toEqual([{ cause: "placement" }]);

    // A second assignment of the same plan places nothing more.
    const again = await call(assignAthlete, { token, params: { id: athlete }, json: { planId, startsOn: "2099-04-07" } });
    expect((again.data as unknown as Assignment).placed).toEqual([]);
    // No end date: the plan's 3 weeks end on day 21.
    expect(again.data.lastDay).toBe("2099-04-27");
  });

  it("starts the clock today (team zone) when the start date is in the past", async () => {
    const { token, teamId, l2, planId } = await setUp();
    const athlete = await createAthleteRecord(teamId, "Past Start");
    const today = localDateOf(new Date(), "Europe/Amsterdam");
    await call(assignAthlete, { token, params: { id: athlete }, json: { planId, startsOn: addDays(today, -14) } });
    expect((await positionsOf(athlete)).find((p) => p.ladderId === l2.ladderId)?.since).toBe(today);
  });

  it("assigns a squad: one assignment per member, all in one answer", async () => {
    const { token, teamId, planId } = await setUp();
    const ids = [await createAthleteRecord(teamId, "Sam"), await createAthleteRecord(teamId, "Ana"), await createAthleteRecord(teamId, "Lu")];
    const squad = await call(createSquad, { token, json: { name: "Evening", athleteIds: ids } });
    const res = await call(assignSquad, { token, params: { id: squad.data.id as string }, json: { planId, startsOn: "2099-05-05" } });
    expect(res.status).toBe(201);
    const items = res.data.items as Assignment[];
    expect(items).toHaveLength(3);
    expect(new Set(items.map((i) => i.athleteId))).toEqual(new Set(ids));
    expect(items.every((i) => i.squadId === squad.data.id && i.placed?.length === 2)).toBe(true);

    const listed = await call(listAssignments, { token, params: { id: ids[0]! }, path: `/api/v1/athletes/${ids[0]}/assignments` });
    expect((listed.data.items as Assignment[]).map((a) => a.squadId)).toEqual([squad.data.id]);

    const empty = await call(createSquad, { token, json: { name: "Nobody" } });
    const none = await call(assignSquad, { token, params: { id: empty.data.id as string }, json: { planId, startsOn: "2099-05-05" } });
    expect(none.status).toBe(422);
  });

  it("rejects bad input and other teams' objects without writing anything", async () => {
    const a = await setUp();
    const b = await setUp();
    const athlete = await createAthleteRecord(a.teamId, "Kit");
    const theirAthlete = await createAthleteRecord(b.teamId, "Theirs");
    const theirSquad = await call(createSquad, { token: b.token, json: { name: "Theirs", athleteIds: [theirAthlete] } });

    const backwards = await call(assignAthlete, { token: a.token, params: { id: athlete }, json: { planId: a.planId, startsOn: "2099-03-10", endsOn: "2099-03-01" } });
    expect(backwards.status).toBe(422);
    expect(backwards.data.error?.issues?.[0]?.path).toBe("endsOn");
    const badDate = await call(assignAthlete, { token: a.token, params: { id: athlete }, json: { planId: a.planId, startsOn: "2099-02-30" } });
    expect(badDate.data.error?.issues?.[0]?.path).toBe("startsOn");
    const foreignPlan = await call(assignAthlete, { token: a.token, params: { id: athlete }, json: { planId: b.planId, startsOn: "2099-03-10" } });
    expect(foreignPlan.status).toBe(422);
    expect(foreignPlan.data.error?.issues?.[0]?.path).toBe("planId");
    const extra = await call(assignAthlete, { token: a.token, params: { id: athlete }, json: { planId: a.planId, startsOn: "2099-03-10", squad: true } });
    expect(extra.status).toBe(422);
    expect(await positionsOf(athlete)).toEqual([]);

    expect((await call(assignAthlete, { token: a.token, params: { id: theirAthlete }, json: { planId: a.planId, startsOn: "2099-03-10" } })).status).toBe(404);
    expect((await call(assignSquad, { token: a.token, params: { id: theirSquad.data.id as string }, json: { planId: a.planId, startsOn: "2099-03-10" } })).status).toBe(404);
    expect((await call(listAssignments, { token: a.token, params: { id: theirAthlete } })).status).toBe(404);
    expect(await positionsOf(theirAthlete)).toEqual([]);
  });

  it("lets an athlete read their own assignments but not assign or read others'", async () => {
    const { token, teamId, planId } = await setUp();
    const { actor } = await createMember(teamId, "athlete", "Self");
    const other = await createAthleteRecord(teamId, "Other");
    await call(assignAthlete, { token, params: { id: actor.athleteId! }, json: { planId, startsOn: "2099-06-02" } });
    const athleteToken = await bearerFor(actor);
    const own = await call(listAssignments, { token: athleteToken, params: { id: actor.athleteId! } });
    expect(own.status).toBe(200);
    expect((own.data.items as Assignment[]).map((a) => a.startsOn)).toEqual(["2099-06-02"]);
    expect((await call(listAssignments, { token: athleteToken, params: { id: other } })).status).toBe(404);
    expect((await call(assignAthlete, { token: athleteToken, params: { id: actor.athleteId! }, json: { planId, startsOn: "2099-06-02" } })).status).toBe(403);
  });
});
