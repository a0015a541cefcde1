import { describe, expect, it } from "vitest";
import { DELETE as deleteBlock, GET as getBlock, PATCH as patchBlock } from "@/app/api/v1/blocks/[id]/route";
import { GET as listBlocks, POST as createBlock } from "@/app/api/v1/blocks/route";
import { POST as createPlan } from "@/app/api/v1/plans/route";
import { bearerFor, createMember, createTeam } from "../support/factories";
import { call } from "../support/http";
import { blockBody, createLadder } from "../support/training-factories";

type Block = {
  id: string;
  durationSec: number;
  archived: boolean;
  warnings: { rule: string; slotIndexes: number[]; message: string }[];
  slots: { ladderId: string; ladderName: string; sets: number | null; target: string | null; note: string | null; estimateRung: { name: string } | null }[];
};

describe("blocks API", () => {
  it("estimates a block's duration from each ladder's first live rung", async () => {
    const { owner, teamId } = await createTeam();
    const token = await bearerFor(owner);
    // Only the FIRST rung counts for the block estimate; the second rungs would change the answer.
    const hold = await createLadder(teamId, [{ measure: "hold_seconds", target: 20, tags: ["core"] }, { measure: "hold_seconds", target: 60 }]);
    const reps = await createLadder(teamId, [{ measure: "reps", target: 8, tags: ["pulling"] }, { measure: "reps", target: 15 }]);
    const res = await call(createBlock, {
      token,
      json: blockBody([hold.ladderId, reps.ladderId], { rounds: 3, restBetweenSlotsSec: 60, restBetweenRoundsSec: 120 }),
    });
    expect(res.status).toBe(201);
    // Worked by hand (pace of 3 s per rep is common practice, no source — lib/engine/duration.ts):
    //   one round = hold 20 s + 60 s rest + 8 reps × 3 s = 24 s  → 20 + 60 + 24 = 104 s
    //   3 rounds = 312 s; 2 rests between rounds × 120 s = 240 s; nothing after the last round
    //   total = 312 + 240 = 552 s
    expect(res.data.durationSec).toBe(552);
    expect(res.data.warnings).toEqual([]);

    // An explicit 2 sets of the hold over 3 rounds: rounds do (hold, reps), (hold, reps), (reps).
    //   rounds 1–2: 104 s each; round 3: 24 s alone (no slot rest); 2 × 120 s between rounds
    //   total = 104 + 104 + 24 + 240 = 472 s
    const patched = await call(patchBlock, {
      token,
      method: "PATCH",
      params: { id: res.data.id as string },
      json: { slots: [{ ladderId: hold.ladderId, sets: 2, target: "easy holds" }, { ladderId: reps.ladderId, note: "slow lowering" }] },
    });
    expect(patched.status).toBe(200);
    expect(patched.data.durationSec).toBe(472);
    const block = patched.data as unknown as Block;
    expect(block.slots.map((s) => [s.sets, s.target, s.note])).toEqual([
      [2, "easy holds", null],
      [null, null, "slow lowering"],
    ]);
  });

  it("warns about grip-heavy rings after long hand support", async () => {
    const { owner, teamId } = await createTeam();
    const token = await bearerFor(owner);
    const handstand = await createLadder(teamId, [{ name: "Wall handstand", measure: "hold_seconds", target: 45, tags: ["hand_support", "inversion"] }]);
    const rings = await createLadder(teamId, [{ name: "False-grip hang", measure: "hold_seconds", target: 20, tags: ["rings", "grip", "pulling"] }]);
    const res = await call(createBlock, { token, json: blockBody([handstand.ladderId, rings.ladderId], { rounds: 1 }) });
    expect(res.status).toBe(201);
    // common practice, no source (lib/engine/pairing.ts rule table)
    expect(res.data.warnings).toEqual([
      expect.objectContaining({ rule: "grip_after_hand_support", slotIndexes: [0, 1], message: expect.stringContaining("False-grip hang") }),
    ]);
    // Reversed, the rings come first: no grip-after-support warning for that pair.
    const reversed = await call(patchBlock, {
      token,
      method: "PATCH",
      params: { id: res.data.id as string },
      json: { slots: [{ ladderId: rings.ladderId }, { ladderId: handstand.ladderId }] },
    });
    expect(reversed.data.warnings).toEqual([]);
  });

  it("warns about two max-effort slots back to back and the same joint twice in a row", async () => {
    const { owner, teamId } = await createTeam();
    const token = await bearerFor(owner);
    const maxA = await createLadder(teamId, [{ measure: "reps", target: 1, tags: ["max_effort", "pulling"] }]);
    const maxB = await createLadder(teamId, [{ measure: "reps", target: 2, tags: ["max_effort", "core"] }]);
    const wristA = await createLadder(teamId, [{ measure: "reps", target: 8, tags: ["wrist", "pushing"] }]);
    const wristB = await createLadder(teamId, [{ measure: "hold_seconds", target: 10, tags: ["wrist"] }]);

    // common practice, no source (lib/engine/pairing.ts rule table)
    const max = await call(createBlock, { token, json: blockBody([maxA.ladderId, maxB.ladderId], { rounds: 2 }) });
    expect((max.data as unknown as Block).warnings.map((w) => [w.rule, w.slotIndexes])).toEqual([["max_effort_back_to_back", [0, 1]]]);

    const wrist = await call(createBlock, { token, json: blockBody([wristA.ladderId, wristB.ladderId], { rounds: 2 }) });
    expect((wrist.data as unknown as Block).warnings.map((w) => [w.rule, w.slotIndexes])).toEqual([["same_joint_wrist", [0, 1]]]);

    // Three slots over rounds: the last slot is followed by the first again (wrist → … → wrist).
    const wrap = await call(createBlock, { token, json: blockBody([wristA.ladderId, maxA.ladderId, wristB.ladderId], { rounds: 3 }) });
    expect((wrap.data as unknown as Block).warnings.map((w) => [w.rule, w.slotIndexes])).toEqual([["same_joint_wrist", [2, 0]]]);
  });

  it("gives no warning for a benign pairing", async () => {
    const { owner, teamId } = await createTeam();
    const token = await bearerFor(owner);
    const core = await createLadder(teamId, [{ measure: "hold_seconds", target: 20, tags: ["core", "compression"] }]);
    const pull = await createLadder(teamId, [{ measure: "reps", target: 8, tags: ["pulling", "scapula"] }]);
    const res = await call(createBlock, { token, json: blockBody([core.ladderId, pull.ladderId]) });
    expect(res.status).toBe(201);
    expect(res.data.warnings).toEqual([]);
    const read = await call(getBlock, { token, params: { id: res.data.id as string } });
    expect(read.data.warnings).toEqual([]);
    expect(read.data.durationSec).toBe(552);
  });

  it("rejects bad input with 422 and writes nothing", async () => {
    const a = await createTeam();
    const b = await createTeam();
    const token = await bearerFor(a.owner);
    const one = await createLadder(a.teamId, [{ measure: "reps", target: 5 }]);
    const two = await createLadder(a.teamId, [{ measure: "reps", target: 5 }]);
    const foreign = await createLadder(b.teamId, [{ measure: "reps", target: 5 }]);
    const ok = [one.ladderId, two.ladderId];
    const cases: [unknown, string][] = [
      [blockBody([one.ladderId]), "slots"],
      [blockBody([...ok, ...ok, ...ok, one.ladderId]), "slots"],
      [blockBody(ok, { rounds: 0 }), "rounds"],
      [blockBody(ok, { rounds: 100 }), "rounds"],
      [blockBody(ok, { restBetweenSlotsSec: -1 }), "restBetweenSlotsSec"],
      [blockBody(ok, { restBetweenRoundsSec: -30 }), "restBetweenRoundsSec"],
      [blockBody(ok, { rounds: 2.5 }), "rounds"],
      [blockBody(ok, { colour: "red" }), "(root)"],
      [{ ...blockBody(ok), slots: [{ ladderId: one.ladderId, rung: 1 }, { ladderId: two.ladderId }] }, "slots.0"],
      [blockBody([one.ladderId, foreign.ladderId]), "slots.1.ladderId"],
      [blockBody([one.ladderId, "not-a-uuid"]), "slots.1.ladderId"],
    ];
    for (const [json, path] of cases) {
      const res = await call(createBlock, { token, json });
      expect(res.status, JSON.stringify(json)).toBe(422);
      expect(res.data.error?.issues?.map((i) => i.path), JSON.stringify(json)).toContain(path);
    }
    const list = await call(listBlocks, { token, path: "/api/v1/blocks" });
    expect(list.data.items).toEqual([]);
  });

  it("answers 404 for another team's block and 403 to athletes writing", async () => {
    const a = await createTeam();
    const b = await createTeam();
    const bToken = await bearerFor(b.owner);
    const x = await createLadder(b.teamId, [{ measure: "reps", target: 5 }]);
    const y = await createLadder(b.teamId, [{ measure: "reps", target: 5 }]);
    const theirs = await call(createBlock, { token: bToken, json: blockBody([x.ladderId, y.ladderId]) });
    const params = { id: theirs.data.id as string };
    const token = await bearerFor(a.owner);
    expect((await call(getBlock, { token, params })).status).toBe(404);
    expect((await call(patchBlock, { token, method: "PATCH", params, json: { name: "Mine" } })).status).toBe(404);
    expect((await call(deleteBlock, { token, method: "DELETE", params })).status).toBe(404);
    expect((await call(getBlock, { token: bToken, params })).status).toBe(200);

    const { actor } = await createMember(a.teamId, "athlete");
    expect((await call(createBlock, { token: await bearerFor(actor), json: blockBody([x.ladderId, y.ladderId]) })).status).toBe(403);
  });

  it("deletes an unused block and archives one a plan uses", async () => {
    const { owner, teamId } = await createTeam();
    const token = await bearerFor(owner);
    const one = await createLadder(teamId, [{ measure: "reps", target: 5 }]);
    const two = await createLadder(teamId, [{ measure: "reps", target: 5 }]);
    const unused = await call(createBlock, { token, json: blockBody([one.ladderId, two.ladderId], { name: "Unused" }) });
    const used = await call(createBlock, { token, json: blockBody([one.ladderId, two.ladderId], { name: "Used" }) });
    await call(createPlan, { token, json: { name: "P", weeks: 4, days: [{ weekday: 1, blockIds: [used.data.id] }] } });

    expect((await call(deleteBlock, { token, method: "DELETE", params: { id: unused.data.id as string } })).status).toBe(204);
    expect((await call(getBlock, { token, params: { id: unused.data.id as string } })).status).toBe(404);

    expect((await call(deleteBlock, { token, method: "DELETE", params: { id: used.data.id as string } })).status).toBe(204);
    const archived = await call(getBlock, { token, params: { id: used.data.id as string } });
    expect(archived.status).toBe(200);
    expect(archived.data.archived).toBe(true);
    const live = await call(listBlocks, { token, path: "/api/v1/blocks" });
    expect(live.data.items).toEqual([]);
    const listed = await call(listBlocks, { token, path: "/api/v1/blocks?archived=true" });
    expect((listed.data.items as Block[]).map((x) => x.id)).toEqual([used.data.id]);
  });
});
