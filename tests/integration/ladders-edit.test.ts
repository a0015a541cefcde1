import { eq } from "drizzle-orm";
import { describe, expect, it } from "vitest";
import { DELETE as deleteLadderRoute, GET as getLadderRoute, PATCH as patchLadderRoute } from "@/app/api/v1/ladders/[id]/route";
import { POST as duplicateRoute } from "@/app/api/v1/ladders/[id]/duplicate/route";
import { PUT as orderRoute } from "@/app/api/v1/ladders/[id]/rungs/order/route";
import { GET as listRoute } from "@/app/api/v1/ladders/route";
import { GET as positionsRoute, } from "@/app/api/v1/athletes/[id]/positions/route";
import { PUT as placeRoute } from "@/app/api/v1/athletes/[id]/positions/[ladderId]/route";
import { DELETE as deleteRungRoute, PATCH as patchRungRoute } from "@/app/api/v1/rungs/[id]/route";
import { db } from "@/db/client";
import { athletePositions, rungs, standards } from "@/db/schema";
import { bearerFor, createAthleteRecord, createTeam } from "../support/factories";
import { call } from "../support/http";
import { makeLadder } from "../support/ladder-factories";

type RungView = { id: string; name: string; position: number; archived: boolean; athleteCount: number };
const rungsOf = (data: unknown) => (data as { rungs: RungView[] }).rungs;

describe("editing ladders athletes are on", () => {
  it("reorders rungs and leaves an athlete on the same rung row", async () => {
    const { owner, teamId } = await createTeam();
    const token = await bearerFor(owner);
    const ladder = await makeLadder(owner, ["One", "Two", "Three"]);
    const athleteId = await createAthleteRecord(teamId, "Placed Athlete");
    const two = ladder.rungs[1]!;
    expect((await call(placeRoute, { token, method: "PUT", params: { id: athleteId, ladderId: ladder.id }, json: { rungId: two.id } })).status).toBe(200);

    const order = [ladder.rungs[2]!.id, ladder.rungs[0]!.id, two.id];
    const reordered = await call(orderRoute, { token, method: "PUT", params: { id: ladder.id }, json: { rungIds: order } });
    expect(reordered.status).toBe(200);
    expect(rungsOf(reordered.data).map((r) => [r.name, r.position])).toEqual([["Three", 1], ["One", 2], ["Two", 3]]);

    const [position] = await db.select({ rungId: athletePositions.rungId }).from(athletePositions).where(eq(athletePositions.athleteId, athleteId));
    expect(position!.rungId).toBe(two.id);
    const listed = await call(positionsRoute, { token, params: { id: athleteId } });
    expect(listed.data.items).toEqual([expect.objectContaining({ rungId: two.id, rungName: "Two", rungPosition: 3 })]);
  });

  it("refuses an order list that is not exactly the ladder's live rungs", async () => {
    const { owner } = await createTeam();
    const token = await bearerFor(owner);
    const ladder = await makeLadder(owner, ["One", "Two", "Three"]);
    const other = await makeLadder(owner, ["Elsewhere"]);
    const ids = ladder.rungs.map((r) => r.id);
    const cases: [unknown, string][] = [
      [{ rungIds: ids.slice(0, 2) }, "rungIds"],
      [{ rungIds: [...ids.slice(0, 2), other.rungs[0]!.id] }, "rungIds.2"],
      [{ rungIds: [ids[0], ids[0], ids[1]] }, "rungIds"],
      [{ rungIds: [...ids, "not-a-uuid"] }, "rungIds.3"],
      [{ rungIds: ids, extra: true }, "(root)"],
    ];
    for (const [json, path] of cases) {
      const response = await call(orderRoute, { token, method: "PUT", params: { id: ladder.id }, json });
      expect(response.status).toBe(422);
      expect((response.data.error!.issues ?? []).map((i) => i.path)).toContain(path);
    }
    const read = await call(getLadderRoute, { token, params: { id: ladder.id } });
    expect(rungsOf(read.data).map((r) => r.name)).toEqual(["One", "Two", "Three"]);
  });

  it("archives a rung an athlete stands on instead of deleting it; the athlete keeps the position", async () => {
    const { owner, teamId } = await createTeam();
    const token = await bearerFor(owner);
    const ladder = await makeLadder(owner, ["One", "Two", "Three"]);
    const athleteId = await createAthleteRecord(teamId, "Kept Athlete");
    const two = ladder.rungs[1]!;
    await call(placeRoute, { token, method: "PUT", params: { id: athleteId, ladderId: ladder.id }, json: { rungId: two.id, since: "2026-01-05" } });

    const removed = await call(deleteRungRoute, { token, method: "DELETE", params: { id: two.id } });
    expect(removed.status).toBe(204);
    const [row] = await db.select({ position: rungs.position, archivedAt: rungs.archivedAt }).from(rungs).where(eq(rungs.id, two.id));
    expect(row!.archivedAt).not.toBeNull();
    expect(row!.position).toBeLessThan(0);
    const [standard] = await db.select({ sets: standards.sets }).from(standards).where(eq(standards.rungId, two.id));
    expect(standard!.sets).toBe(3);

    const read = await call(getLadderRoute, { token, params: { id: ladder.id } });
    expect(rungsOf(read.data).map((r) => [r.name, r.position])).toEqual([["One", 1], ["Three", 2]]);
    expect((read.data.archivedRungs as RungView[]).map((r) => [r.name, r.athleteCount])).toEqual([["Two", 1]]);
    const listed = await call(positionsRoute, { token, params: { id: athleteId } });
    expect(listed.data.items).toEqual([expect.objectContaining({ rungId: two.id, rungArchived: true, since: "2026-01-05" })]);

    // an archived rung can't be edited, and can't take a new placement
    expect((await call(patchRungRoute, { token, method: "PATCH", params: { id: two.id }, json: { name: "Renamed" } })).status).toBe(409);
    const place = await call(placeRoute, { token, method: "PUT", params: { id: athleteId, ladderId: ladder.id }, json: { rungId: two.id } });
    expect(place.status).toBe(422);
  });

  it("deletes a rung nobody used, and closes the gap", async () => {
    const { owner } = await createTeam();
    const token = await bearerFor(owner);
    const ladder = await makeLadder(owner, ["One", "Two", "Three"]);
    expect((await call(deleteRungRoute, { token, method: "DELETE", params: { id: ladder.rungs[0]!.id } })).status).toBe(204);
    expect(await db.select().from(rungs).where(eq(rungs.id, ladder.rungs[0]!.id))).toHaveLength(0);
    const read = await call(getLadderRoute, { token, params: { id: ladder.id } });
    expect(rungsOf(read.data).map((r) => [r.name, r.position])).toEqual([["Two", 1], ["Three", 2]]);
    expect(read.data.archivedRungs).toEqual([]);
  });

  it("archives a ladder on DELETE, still answers GET, hides it from the live list, and restores it", async () => {
    const { owner, teamId } = await createTeam();
    const token = await bearerFor(owner);
    const ladder = await makeLadder(owner, ["One"], { name: "Archive me" });
    const athleteId = await createAthleteRecord(teamId, "Still Placed");
    await call(placeRoute, { token, method: "PUT", params: { id: athleteId, ladderId: ladder.id }, json: { rungId: ladder.rungs[0]!.id } });
    expect((await call(deleteLadderRoute, { token, method: "DELETE", params: { id: ladder.id } })).status).toBe(204);
    expect((await call(getLadderRoute, { token, params: { id: ladder.id } })).data).toMatchObject({ archived: true, name: "Archive me" });
    const live = await call(listRoute, { token, path: "/api/v1/ladders?q=archive%20me" });
    expect(live.data.items).toEqual([]);
    const archived = await call(listRoute, { token, path: "/api/v1/ladders?q=archive%20me&archived=true" });
    expect((archived.data.items as { id: string }[]).map((l) => l.id)).toEqual([ladder.id]);
    expect((await call(positionsRoute, { token, params: { id: athleteId } })).data.items).toHaveLength(1);
    const restored = await call(patchLadderRoute, { token, method: "PATCH", params: { id: ladder.id }, json: { archived: false } });
    expect(restored.data.archived).toBe(false);
  });

  it("duplicates a ladder with rungs, standards and prerequisites, leaving athletes on the original", async () => {
    const { owner } = await createTeam();
    const token = await bearerFor(owner);
    const base = await makeLadder(owner, ["Base"]);
    const ladder = await makeLadder(owner, ["One", "Two"], { name: "Original" });
    await call(patchRungRoute, { token, method: "PATCH", params: { id: ladder.rungs[1]!.id }, json: { prerequisites: [base.rungs[0]!.id], caution: "Use a wall." } });
    const copy = await call(duplicateRoute, { token, params: { id: ladder.id }, json: {} });
    expect(copy.status).toBe(201);
    expect(copy.data).toMatchObject({ name: "Original (copy)" });
    const copied = rungsOf(copy.data) as (RungView & { caution: string; prerequisites: { rungId: string }[] })[];
    expect(copied.map((r) => r.name)).toEqual(["One", "Two"]);
    expect(copied[1]!.caution).toBe("Use a wall.");
    expect(copied[1]!.prerequisites.map((p) => p.rungId)).toEqual([base.rungs[0]!.id]);
    expect(copied[0]!.id).not.toBe(ladder.rungs[0]!.id);
  });
});
