import { count, eq } from "drizzle-orm";
import { describe, expect, it } from "vitest";
import { GET as exportRoute } from "@/app/api/v1/ladders/[id]/export/route";
import { POST as importRoute } from "@/app/api/v1/ladders/import/route";
import { PATCH as patchRungRoute } from "@/app/api/v1/rungs/[id]/route";
import { db } from "@/db/client";
import { ladders, rungs } from "@/db/schema";
import type { LadderDto } from "@/lib/validation/ladders";
import { bearerFor, createTeam } from "../support/factories";
import { call } from "../support/http";
import { makeLadder } from "../support/ladder-factories";

async function teamRows(teamId: string) {
  const [l] = await db.select({ n: count() }).from(ladders).where(eq(ladders.teamId, teamId));
  const [r] = await db.select({ n: count() }).from(rungs).where(eq(rungs.teamId, teamId));
  return { ladders: l!.n, rungs: r!.n };
}

/** A ladder with prerequisites, cues, caution, tags, video and varied standards. */
async function richLadder(teamId: string, token: string, owner: Parameters<typeof makeLadder>[0]) {
  const base = await makeLadder(owner, ["Support hold"], { name: `Base ${teamId.slice(0, 4)}` });
  const ladder = await makeLadder(owner, ["Tuck", "Advanced tuck", "Straddle"], { name: "Lever line", notes: "Scapulae down.", promotionMode: "approve" });
  await call(patchRungRoute, {
    token,
    method: "PATCH",
    params: { id: ladder.rungs[1]!.id },
    json: {
      measure: "eccentric_seconds",
      setting: "Band assisted",
      cues: "Hips high\nArms locked",
      caution: "Stop on sharp elbow pain.",
      demoVideoUrl: "https://video.example.test/tuck.webm",
      tags: ["straight_arm", "pulling"],
      prerequisites: [base.rungs[0]!.id],
      standard: { sets: 4, minValue: 6, minReps: 3, maxRpe: null, minRir: 2, sessionsRequired: 3, sessionsWindow: 3, minDaysOnRung: 10, painFree: false, stepDown: null },
    },
  });
  return { base, ladder };
}

/** The fields that make a ladder the same ladder: everything but ids and time stamps. */
function comparable(ladder: LadderDto) {
  return {
    name: ladder.name,
    targetSkill: ladder.targetSkill,
    notes: ladder.notes,
    promotionMode: ladder.promotionMode,
    rungs: ladder.rungs.map((r) => ({
      position: r.position,
      name: r.name,
      measure: r.measure,
      setting: r.setting,
      cues: r.cues,
      caution: r.caution,
      demoVideoUrl: r.demoVideoUrl,
      tags: r.tags,
      standard: r.standard,
      standardText: r.standardText,
      prerequisites: r.prerequisites,
    })),
  };
}

describe("ladder export and import", () => {
  it("round-trips a ladder field by field within a team, prerequisites included", async () => {
    const { owner, teamId } = await createTeam();
    const token = await bearerFor(owner);
    const { ladder } = await richLadder(teamId, token, owner);
    const exported = await call(exportRoute, { token, params: { id: ladder.id } });
    expect(exported.status).toBe(200);
    expect(exported.headers.get("content-disposition")).toContain("lever-line.rungwise.json");
    expect(exported.data).toMatchObject({ format: "rungwise.ladder", version: 1 });
    const doc = exported.data as { rungs: { key: string; prerequisites: unknown[] }[] };
    expect(doc.rungs.map((r) => r.key)).toEqual(["tuck", "advanced-tuck", "straddle"]);
    expect(doc.rungs[1]!.prerequisites).toEqual([{ ladder: `Base ${teamId.slice(0, 4)}`, rung: "Support hold" }]);

    const imported = await call(importRoute, { token, json: exported.data });
    expect(imported.status).toBe(201);
    const result = imported.data as unknown as { ladder: LadderDto; warnings: unknown[] };
    expect(result.warnings).toEqual([{ path: "ladder.name", message: expect.stringContaining("already has a ladder") }]);
    const original = (await import("@/lib/server/ladders/get-ladder")).getLadder(owner, ladder.id);
    expect(comparable(result.ladder)).toEqual(comparable(await original));
    expect(result.ladder.id).not.toBe(ladder.id);
  });

  it("drops prerequisites another team cannot resolve, with a warning naming the path", async () => {
    const a = await createTeam();
    const b = await createTeam();
    const tokenA = await bearerFor(a.owner);
    const { ladder } = await richLadder(a.teamId, tokenA, a.owner);
    const doc = (await call(exportRoute, { token: tokenA, params: { id: ladder.id } })).data;
    const tokenB = await bearerFor(b.owner);
    const imported = await call(importRoute, { token: tokenB, json: doc });
    expect(imported.status).toBe(201);
    const result = imported.data as unknown as { ladder: LadderDto; warnings: { path: string; message: string }[] };
    expect(result.warnings).toEqual([{ path: "rungs.1.prerequisites.0", message: expect.stringContaining("Dropped") }]);
    expect(result.ladder.rungs[1]!.prerequisites).toEqual([]);
    expect(result.ladder.rungs[1]!.standard).toMatchObject({ sets: 4, minReps: 3, minRir: 2 });
  });

  it("refuses malformed documents with a path for every problem, writing nothing", async () => {
    const { owner, teamId } = await createTeam();
    const token = await bearerFor(owner);
    const ladder = await makeLadder(owner, ["One", "Two"]);
    const good = (await call(exportRoute, { token, params: { id: ladder.id } })).data as unknown as {
      ladder: Record<string, unknown>;
      rungs: Record<string, unknown>[];
    };
    const before = await teamRows(teamId);
    const rung = good.rungs[0]!;
    const standard = rung.standard as Record<string, unknown>;
    const cases: [string, unknown, string[]][] = [
      ["wrong format", { ...good, format: "other.app" }, ["format"]],
      ["future version", { ...good, version: 2 }, ["version"]],
      ["unknown field", { ...good, extra: 1 }, ["(root)"]],
      ["no ladder name", { ...good, ladder: { ...good.ladder, name: "" } }, ["ladder.name"]],
      [
        "absurd standards",
        { ...good, rungs: [{ ...rung, standard: { ...standard, minValue: 10_000, sets: 0 } }, { ...rung, key: "b", measure: "jumps" }] },
        ["rungs.0.standard.minValue", "rungs.0.standard.sets", "rungs.1.measure"],
      ],
      ["duplicate keys", { ...good, rungs: [rung, { ...rung }] }, ["rungs.1.key"]],
      ["unknown key reference", { ...good, rungs: [{ ...rung, prerequisites: [{ rung: "nowhere" }] }] }, ["rungs.0.prerequisites.0.rung"]],
      ["same-ladder reference", { ...good, rungs: [rung, { ...good.rungs[1]!, prerequisites: [{ rung: rung.key }] }] }, ["rungs.1.prerequisites.0.rung"]],
      ["window", { ...good, rungs: [{ ...rung, standard: { ...standard, sessionsRequired: 5, sessionsWindow: 3 } }] }, ["rungs.0.standard.sessionsRequired"]],
      ["bad tag", { ...good, rungs: [{ ...rung, tags: ["juggling"] }] }, ["rungs.0.tags.0"]],
    ];
    for (const [label, json, paths] of cases) {
      const response = await call(importRoute, { token, json });
      expect(response.status, label).toBe(422);
      expect((response.data.error!.issues ?? []).map((i) => i.path), label).toEqual(expect.arrayContaining(paths));
    }
    expect((await call(importRoute, { token, rawBody: "{ not json", headers: { "content-type": "application/json" } })).status).toBe(400);
    expect(await teamRows(teamId)).toEqual(before);
  });
});
