import { describe, expect, it } from "vitest";
import { GET as positionsRoute } from "@/app/api/v1/athletes/[id]/positions/route";
import { PUT as placeRoute } from "@/app/api/v1/athletes/[id]/positions/[ladderId]/route";
import { DELETE as deleteLadderRoute, GET as getLadderRoute, PATCH as patchLadderRoute } from "@/app/api/v1/ladders/[id]/route";
import { POST as duplicateRoute } from "@/app/api/v1/ladders/[id]/duplicate/route";
import { GET as exportRoute } from "@/app/api/v1/ladders/[id]/export/route";
import { PUT as orderRoute } from "@/app/api/v1/ladders/[id]/rungs/order/route";
import { POST as addRungRoute } from "@/app/api/v1/ladders/[id]/rungs/route";
import { DELETE as deleteRungRoute, PATCH as patchRungRoute } from "@/app/api/v1/rungs/[id]/route";
import { getLadder } from "@/lib/server/ladders/get-ladder";
import { bearerFor, createAthleteRecord, createMember, createTeam } from "../support/factories";
import { call } from "../support/http";
import { makeLadder, rungBody } from "../support/ladder-factories";

describe("another team's ladders, rungs and athletes", () => {
  it("answer 404 on every route and stay unchanged", async () => {
    const mine = await createTeam();
    const theirs = await createTeam();
    const token = await bearerFor(mine.owner);
    const myLadder = await makeLadder(mine.owner, ["Mine"]);
    const myAthlete = await createAthleteRecord(mine.teamId, "My Athlete");
    const ladder = await makeLadder(theirs.owner, ["One", "Two"], { name: "Theirs" });
    const rung = ladder.rungs[0]!;
    const athlete = await createAthleteRecord(theirs.teamId, "Their Athlete");
    const id = ladder.id;

    const attempts: [string, Promise<{ status: number }>][] = [
      ["GET ladder", call(getLadderRoute, { token, params: { id } })],
      ["PATCH ladder", call(patchLadderRoute, { token, method: "PATCH", params: { id }, json: { name: "Mine now" } })],
      ["DELETE ladder", call(deleteLadderRoute, { token, method: "DELETE", params: { id } })],
      ["duplicate", call(duplicateRoute, { token, params: { id }, json: {} })],
      ["export", call(exportRoute, { token, params: { id } })],
      ["add rung", call(addRungRoute, { token, params: { id }, json: rungBody("Sneaky") })],
      ["order", call(orderRoute, { token, method: "PUT", params: { id }, json: { rungIds: ladder.rungs.map((r) => r.id).reverse() } })],
      ["PATCH rung", call(patchRungRoute, { token, method: "PATCH", params: { id: rung.id }, json: { name: "Renamed" } })],
      ["DELETE rung", call(deleteRungRoute, { token, method: "DELETE", params: { id: rung.id } })],
      ["their athlete's positions", call(positionsRoute, { token, params: { id: athlete } })],
      ["place their athlete", call(placeRoute, { token, method: "PUT", params: { id: athlete, ladderId: myLadder.id }, json: { rungId: myLadder.rungs[0]!.id } })],
      ["place on their ladder", call(placeRoute, { token, method: "PUT", params: { id: myAthlete, ladderId: id }, json: { rungId: rung.id } })],
      ["non-UUID id", call(getLadderRoute, { token, params: { id: "import" } })],
    ];
    for (const [label, attempt] of attempts) expect((await attempt).status, label).toBe(404);

    const after = await getLadder(theirs.owner, id);
    expect(after.name).toBe("Theirs");
    expect(after.archived).toBe(false);
    expect(after.rungs.map((r) => [r.id, r.name, r.position])).toEqual(ladder.rungs.map((r) => [r.id, r.name, r.position]));
  });

  it("refuses a rung of another ladder in a placement (422), and lets athletes read only their own positions", async () => {
    const { owner, teamId } = await createTeam();
    const token = await bearerFor(owner);
    const a = await makeLadder(owner, ["A1"]);
    const b = await makeLadder(owner, ["B1"]);
    const { actor } = await createMember(teamId, "athlete", "Self");
    const wrong = await call(placeRoute, { token, method: "PUT", params: { id: actor.athleteId!, ladderId: a.id }, json: { rungId: b.rungs[0]!.id } });
    expect(wrong.status).toBe(422);
    expect(wrong.data.error!.issues!.map((i) => i.path)).toEqual(["rungId"]);
    const future = await call(placeRoute, { token, method: "PUT", params: { id: actor.athleteId!, ladderId: a.id }, json: { rungId: a.rungs[0]!.id, since: "2999-01-01" } });
    expect(future.status).toBe(422);
    const placed = await call(placeRoute, { token, method: "PUT", params: { id: actor.athleteId!, ladderId: a.id }, json: { rungId: a.rungs[0]!.id } });
    expect(placed.status).toBe(200);
    expect(placed.data).toMatchObject({ ladderId: a.id, rungId: a.rungs[0]!.id, rungPosition: 1, readiness: 0, status: "not_yet" });
    expect(placed.data.since).toMatch(/^\d{4}-\d{2}-\d{2}$/);

    const athleteToken = await bearerFor(actor);
    const own = await call(positionsRoute, { token: athleteToken, params: { id: actor.athleteId! } });
    expect(own.status).toBe(200);
    expect(own.data.items).toHaveLength(1);
    const teammate = await createAthleteRecord(teamId, "Teammate");
    expect((await call(positionsRoute, { token: athleteToken, params: { id: teammate } })).status).toBe(404);
    expect((await call(placeRoute, { token: athleteToken, method: "PUT", params: { id: actor.athleteId!, ladderId: a.id }, json: { rungId: a.rungs[0]!.id } })).status).toBe(403);
  });
});
