import { count, eq } from "drizzle-orm";
import { describe, expect, it } from "vitest";
import { GET as getLadderRoute } from "@/app/api/v1/ladders/[id]/route";
import { GET as listRoute, POST as createRoute } from "@/app/api/v1/ladders/route";
import { POST as addRungRoute } from "@/app/api/v1/ladders/[id]/rungs/route";
import { PATCH as patchRungRoute } from "@/app/api/v1/rungs/[id]/route";
import { db } from "@/db/client";
import { ladders, rungPrerequisites, rungs, standards } from "@/db/schema";
import { bearerFor, createMember, createTeam } from "../support/factories";
import { call } from "../support/http";
import { writePlacement } from "@/lib/server/positions/write-placement";
import { ladderBody, makeLadder, rungBody } from "../support/ladder-factories";

type Issue = { path: string; message: string };
const issuesOf = (data: unknown) => ((data as { error: { issues?: Issue[] } }).error.issues ?? []);

async function teamCounts(teamId: string) {
  const [l] = await db.select({ n: count() }).from(ladders).where(eq(ladders.teamId, teamId));
  const [r] = await db.select({ n: count() }).from(rungs).where(eq(rungs.teamId, teamId));
  const [s] = await db.select({ n: count() }).from(standards).where(eq(standards.teamId, teamId));
  const [p] = await db.select({ n: count() }).from(rungPrerequisites).where(eq(rungPrerequisites.teamId, teamId));
  return { ladders: l!.n, rungs: r!.n, standards: s!.n, prerequisites: p!.n };
}

describe("creating ladders", () => {
  it("creates a ladder with its rungs and standards in order, with the standard in plain words", async () => {
    const { owner } = await createTeam();
    const token = await bearerFor(owner);
    const body = ladderBody(["Tuck hold", "Adv tuck hold", "Straddle hold"], { notes: "Lean forward slowly." });
    const created = await call(createRoute, { token, json: body });
    expect(created.status).toBe(201);
    const ladder = created.data as unknown as { id: string; rungs: { id: string; name: string; position: number; standardText: string; standard: { sets: number } }[] };
    expect(ladder.rungs.map((r) => [r.name, r.position])).toEqual([["Tuck hold", 1], ["Adv tuck hold", 2], ["Straddle hold", 3]]);
    expect(ladder.rungs.every((r) => typeof r.id === "string")).toBe(true);
    // common practice, no source: the default hold standard (design brief §4) in words
    expect(ladder.rungs[0]!.standardText).toBe("3 sets of at least 20 s at RPE 7 or easier, in 2 of the last 3 sessions, at least 7 days on this rung, pain-free");
    const read = await call(getLadderRoute, { token, params: { id: ladder.id } });
    expect(read.data).toMatchObject({ name: body.name, notes: "Lean forward slowly.", archived: false, starter: false });
  });

  it("gives a standard sent without a step-down rule the usual one, and keeps an explicit null (off)", async () => {
    const { owner } = await createTeam();
    const token = await bearerFor(owner);
    const body = ladderBody(["Tuck hold", "Adv tuck hold"]);
    const [usual, off] = body.rungs;
    const created = await call(createRoute, { token, json: { ...body, rungs: [usual, { ...off, standard: { ...off!.standard, stepDown: null } }] } });
    expect(created.status).toBe(201);
    const [first, second] = (created.data as unknown as { rungs: { standard: { stepDown: unknown } }[] }).rungs;
    // The design brief's defaults (§4): pain in 2 of the last 3 sessions, or best value below 70 %
    // of the target in 2 consecutive sessions.
    expect(first!.standard.stepDown).toEqual({ painSessions: 2, painWindow: 3, dropBelowPct: 70, dropSessions: 2 });
    expect(second!.standard.stepDown).toBeNull();
  });

  it("writes nothing when one rung of the body is bad, and names the path of every problem", async () => {
    const { owner, teamId } = await createTeam();
    const token = await bearerFor(owner);
    const before = await teamCounts(teamId);
    const body = ladderBody(["Good rung"]);
    body.rungs.push(
      rungBody("Absurd hold", "hold_seconds", { standard: { ...rungBody("x").standard, minValue: 10_000 } }),
      rungBody("No sets", "reps", { standard: { ...rungBody("x", "reps").standard, sets: 0 } }),
      rungBody("Window", "hold_seconds", { standard: { ...rungBody("x").standard, sessionsRequired: 4, sessionsWindow: 3 } }),
      rungBody("  "),
    );
    const response = await call(createRoute, { token, json: { ...body, colour: "red" } });
    expect(response.status).toBe(422);
    const paths = issuesOf(response.data).map((i) => i.path);
    expect(paths).toEqual(
      expect.arrayContaining(["(root)", "rungs.1.standard.minValue", "rungs.2.standard.sets", "rungs.3.standard.sessionsRequired", "rungs.4.name"]),
    );
    expect(await teamCounts(teamId)).toEqual(before);
  });

  it("rolls the whole ladder back when a prerequisite points at a rung that is not the team's", async () => {
    const { owner, teamId } = await createTeam();
    const other = await createTeam();
    const theirs = await makeLadder(other.owner, ["Their rung"]);
    const token = await bearerFor(owner);
    const before = await teamCounts(teamId);
    const body = ladderBody(["One", "Two"]);
    body.rungs[1] = rungBody("Two", "hold_seconds", { prerequisites: [theirs.rungs[0]!.id] });
    const response = await call(createRoute, { token, json: body });
    expect(response.status).toBe(422);
    expect(issuesOf(response.data)[0]!.path).toBe("rungs.1.prerequisites.0");
    expect(await teamCounts(teamId)).toEqual(before);
  });

  it("refuses a prerequisite on the same ladder and one that closes a cycle, saying which", async () => {
    const { owner } = await createTeam();
    const token = await bearerFor(owner);
    const a = await makeLadder(owner, ["A1", "A2", "A3"]);
    const b = await makeLadder(owner, ["B1", "B2"]);
    const same = await call(patchRungRoute, { token, method: "PATCH", params: { id: a.rungs[2]!.id }, json: { prerequisites: [a.rungs[0]!.id] } });
    expect(same.status).toBe(422);
    expect(issuesOf(same.data)[0]).toMatchObject({ path: "prerequisites.0" });
    expect(issuesOf(same.data)[0]!.message).toContain("same ladder");

    // A2 needs B2; then B1 needing A3 closes A3 → A2 → B2 → B1 → A3.
    const ok = await call(patchRungRoute, { token, method: "PATCH", params: { id: a.rungs[1]!.id }, json: { prerequisites: [b.rungs[1]!.id] } });
    expect(ok.status).toBe(200);
    expect((ok.data.prerequisites as { rungName: string }[]).map((p) => p.rungName)).toEqual(["B2"]);
    const cycle = await call(patchRungRoute, { token, method: "PATCH", params: { id: b.rungs[0]!.id }, json: { prerequisites: [a.rungs[2]!.id] } });
    expect(cycle.status).toBe(422);
    const issue = issuesOf(cycle.data)[0]!;
    expect(issue.path).toBe("prerequisites");
    expect(issue.message).toContain("cycle");
    expect(issue.message).toContain(`${a.name} › A3`);
    const [edges] = await db.select({ n: count() }).from(rungPrerequisites).where(eq(rungPrerequisites.rungId, b.rungs[0]!.id));
    expect(edges!.n).toBe(0);
  });

  it("adds a rung at the hard end and validates its standard against its measure", async () => {
    const { owner } = await createTeam();
    const token = await bearerFor(owner);
    const ladder = await makeLadder(owner, ["One"]);
    const added = await call(addRungRoute, { token, params: { id: ladder.id }, json: rungBody("Two", "reps") });
    expect(added.status).toBe(201);
    expect(added.data).toMatchObject({ name: "Two", position: 2, measure: "reps" });
    const tooMany = await call(addRungRoute, {
      token,
      params: { id: ladder.id },
      json: rungBody("Three", "reps", { standard: { ...rungBody("x", "reps").standard, minValue: 500 } }),
    });
    expect(tooMany.status).toBe(422);
    expect(issuesOf(tooMany.data).map((i) => i.path)).toEqual(["standard.minValue"]);
    const patched = await call(patchRungRoute, { token, method: "PATCH", params: { id: ladder.rungs[0]!.id }, json: { standard: { ...rungBody("x").standard, sets: 0 } } });
    expect(patched.status).toBe(422);
  });

  it("lets athletes read ladders but not write them, and filters the list", async () => {
    const { owner, teamId } = await createTeam();
    const { actor } = await createMember(teamId, "athlete");
    const athleteToken = await bearerFor(actor);
    expect((await call(createRoute, { token: athleteToken, json: ladderBody() })).status).toBe(403);
    const list = await call(listRoute, { token: athleteToken, path: "/api/v1/ladders?limit=100" });
    expect(list.status).toBe(200);
    // new teams get the six starter ladders
    expect((list.data.items as { starter: boolean }[]).filter((l) => l.starter)).toHaveLength(6);
    const token = await bearerFor(owner);
    const zeta = await makeLadder(owner, ["X", "Y", "Z"], { name: "Zeta approvals", promotionMode: "approve" });
    await db.transaction((tx) =>
      writePlacement(tx, { teamId, athleteId: actor.athleteId!, ladderId: zeta.id, rungId: zeta.rungs[1]!.id, since: "2026-01-05", actorUserId: null }),
    );
    const approve = await call(listRoute, { token, path: "/api/v1/ladders?mode=approve&q=zeta" });
    // The list counts live rungs and placed athletes per ladder (not zero for every ladder).
    expect((approve.data.items as { name: string; rungCount: number; athleteCount: number }[]).map((l) => [l.name, l.rungCount, l.athleteCount])).toEqual([
      ["Zeta approvals", 3, 1],
    ]);
    expect((await call(listRoute, { token, path: "/api/v1/ladders?mode=sometimes" })).status).toBe(422);
  });
});
