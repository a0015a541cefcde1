import { describe, expect, it } from "vitest";
import { DELETE as deleteBlock } from "@/app/api/v1/blocks/[id]/route";
import { POST as createBlock } from "@/app/api/v1/blocks/route";
import { DELETE as deletePlan, GET as getPlan, PATCH as patchPlan } from "@/app/api/v1/plans/[id]/route";
import { GET as listPlans, POST as createPlan } from "@/app/api/v1/plans/route";
import { POST as assignAthlete } from "@/app/api/v1/athletes/[id]/assignments/route";
import { bearerFor, createAthleteRecord, createMember, createTeam } from "../support/factories";
import { call } from "../support/http";
import { blockBody, createLadder } from "../support/training-factories";

type Plan = {
  id: string;
  name: string;
  weeks: number;
  archived: boolean;
  warmUp: string | null;
  days: { weekday: number; blockIds: string[]; blocks: { id: string; durationSec: number }[]; durationSec: number }[];
};

async function teamWithBlocks() {
  const team = await createTeam();
  const token = await bearerFor(team.owner);
  const hold = await createLadder(team.teamId, [{ measure: "hold_seconds", target: 20 }]);
  const reps = await createLadder(team.teamId, [{ measure: "reps", target: 8 }]);
  // 552 s each (worked by hand in blocks-api.test.ts: 3 rounds of 20 s + 60 s + 24 s, 2 × 120 s)
  const a = await call(createBlock, { token, json: blockBody([hold.ladderId, reps.ladderId], { name: "A" }) });
  // 1 round: 20 s hold + 30 s rest + 24 s reps = 74 s
  const b = await call(createBlock, { token, json: blockBody([hold.ladderId, reps.ladderId], { name: "B", rounds: 1, restBetweenSlotsSec: 30 }) });
  return { ...team, token, blockA: a.data.id as string, blockB: b.data.id as string };
}

describe("plans API", () => {
  it("creates a plan with per-day estimates, reads, changes and lists it", async () => {
    const { token, blockA, blockB } = await teamWithBlocks();
    const created = await call(createPlan, {
      token,
      json: {
        name: "Base 4 weeks",
        weeks: 4,
        warmUp: "Wrist circles, scapula shrugs",
        days: [
          { weekday: 3, blockIds: [blockB] },
          { weekday: 1, blockIds: [blockA, blockB] },
        ],
      },
    });
    expect(created.status).toBe(201);
    const plan = created.data as unknown as Plan;
    expect(plan.warmUp).toBe("Wrist circles, scapula shrugs");
    // Days in weekday order; Monday = 552 s + 60 s change-over (common practice, no source) + 74 s = 686 s.
    expect(plan.days.map((d) => [d.weekday, d.blockIds, d.durationSec])).toEqual([
      [1, [blockA, blockB], 686],
      [3, [blockB], 74],
    ]);

    const params = { id: plan.id };
    const patched = await call(patchPlan, { token, method: "PATCH", params, json: { weeks: 6, days: [{ weekday: 7, blockIds: [blockA] }] } });
    expect(patched.status).toBe(200);
    expect((patched.data as unknown as Plan).days.map((d) => [d.weekday, d.durationSec])).toEqual([[7, 552]]);
    expect(patched.data.weeks).toBe(6);
    expect((await call(getPlan, { token, params })).data.weeks).toBe(6);

    const list = await call(listPlans, { token, path: "/api/v1/plans" });
    expect((list.data.items as Plan[]).map((p) => p.name)).toEqual(["Base 4 weeks"]);
  });

  it("rejects bad input with 422 and a path, writing nothing", async () => {
    const { token, blockA } = await teamWithBlocks();
    const other = await teamWithBlocks();
    const good = { name: "P", weeks: 4, days: [{ weekday: 1, blockIds: [blockA] }] };
    const cases: [unknown, string][] = [
      [{ ...good, days: [{ weekday: 0, blockIds: [blockA] }] }, "days.0.weekday"],
      [{ ...good, days: [{ weekday: 8, blockIds: [blockA] }] }, "days.0.weekday"],
      [{ ...good, days: [{ weekday: 2, blockIds: [blockA] }, { weekday: 2, blockIds: [] }] }, "days.1.weekday"],
      [{ ...good, weeks: 0 }, "weeks"],
      [{ ...good, weeks: 105 }, "weeks"],
      [{ ...good, days: [{ weekday: 1, blockIds: [blockA, other.blockA] }] }, "days.0.blockIds.1"],
      [{ ...good, days: [{ weekday: 1, blockIds: ["00000000-0000-4000-8000-000000000000"] }] }, "days.0.blockIds.0"],
      [{ ...good, colour: "red" }, "(root)"],
      [{ ...good, days: [{ weekday: 1, blockIds: [blockA], note: "x" }] }, "days.0"],
    ];
    for (const [json, path] of cases) {
      const res = await call(createPlan, { token, json });
      expect(res.status, JSON.stringify(json)).toBe(422);
      expect(res.data.error?.issues?.map((i) => i.path), JSON.stringify(json)).toContain(path);
    }
    expect((await call(listPlans, { token, path: "/api/v1/plans" })).data.items).toEqual([]);

    // A failed PATCH leaves the plan as it was.
    const plan = await call(createPlan, { token, json: good });
    const params = { id: plan.data.id as string };
    const bad = await call(patchPlan, { token, method: "PATCH", params, json: { name: "Renamed", days: [{ weekday: 2, blockIds: [other.blockA] }] } });
    expect(bad.status).toBe(422);
    const after = (await call(getPlan, { token, params })).data as unknown as Plan;
    expect([after.name, after.days.map((d) => d.weekday)]).toEqual(["P", [1]]);
  });

  it("answers 404 for another team's plan and 403 to athletes writing", async () => {
    const a = await teamWithBlocks();
    const b = await teamWithBlocks();
    const theirs = await call(createPlan, { token: b.token, json: { name: "Theirs", weeks: 2, days: [] } });
    const params = { id: theirs.data.id as string };
    expect((await call(getPlan, { token: a.token, params })).status).toBe(404);
    expect((await call(patchPlan, { token: a.token, method: "PATCH", params, json: { name: "Mine" } })).status).toBe(404);
    expect((await call(deletePlan, { token: a.token, method: "DELETE", params })).status).toBe(404);
    const { actor } = await createMember(a.teamId, "athlete");
    expect((await call(createPlan, { token: await bearerFor(actor), json: { name: "X", weeks: 1, days: [] } })).status).toBe(403);
  });

  it("deletes an unassigned plan and archives an assigned one", async () => {
    const { token, teamId, blockA } = await teamWithBlocks();
    const unused = await call(createPlan, { token, json: { name: "Unused", weeks: 2, days: [{ weekday: 1, blockIds: [blockA] }] } });
    const used = await call(createPlan, { token, json: { name: "Used", weeks: 2, days: [{ weekday: 1, blockIds: [blockA] }] } });
    const athlete = await createAthleteRecord(teamId, "Ola");
    await call(assignAthlete, { token, params: { id: athlete }, json: { planId: used.data.id, startsOn: "2026-01-05" } });

    expect((await call(deletePlan, { token, method: "DELETE", params: { id: unused.data.id as string } })).status).toBe(204);
    expect((await call(getPlan, { token, params: { id: unused.data.id as string } })).status).toBe(404);
    expect((await call(deletePlan, { token, method: "DELETE", params: { id: used.data.id as string } })).status).toBe(204);
    expect((await call(getPlan, { token, params: { id: used.data.id as string } })).data.archived).toBe(true);
    // An archived plan can't be assigned again.
    const again = await call(assignAthlete, { token, params: { id: athlete }, json: { planId: used.data.id, startsOn: "2026-02-02" } });
    expect(again.status).toBe(422);
    expect(again.data.error?.issues?.[0]?.path).toBe("planId");
  });

  it("keeps an archived block in the plans that already use it, but never adds it anew", async () => {
    const { token, blockA, blockB } = await teamWithBlocks();
    const plan = await call(createPlan, { token, json: { name: "Keeps", weeks: 2, days: [{ weekday: 1, blockIds: [blockA] }] } });
    expect((await call(deleteBlock, { token, method: "DELETE", params: { id: blockA } })).status).toBe(204);
    const params = { id: plan.data.id as string };
    const kept = await call(patchPlan, { token, method: "PATCH", params, json: { days: [{ weekday: 1, blockIds: [blockA, blockB] }] } });
    expect(kept.status).toBe(200);
    expect((kept.data as unknown as Plan).days[0]!.blockIds).toEqual([blockA, blockB]);
    const fresh = await call(createPlan, { token, json: { name: "New", weeks: 2, days: [{ weekday: 2, blockIds: [blockB, blockA] }] } });
    expect(fresh.status).toBe(422);
    expect(fresh.data.error?.issues?.[0]?.path).toBe("days.0.blockIds.1");
  });
});
