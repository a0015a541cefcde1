import { describe, expect, it } from "vitest";
import { PUT as putMembers } from "@/app/api/v1/squads/[id]/members/route";
import { DELETE as deleteSquad, GET as getSquad, PATCH as patchSquad } from "@/app/api/v1/squads/[id]/route";
import { GET as listSquads, POST as createSquad } from "@/app/api/v1/squads/route";
import { bearerFor, createAthleteRecord, createMember, createTeam } from "../support/factories";
import { call } from "../support/http";

type Squad = { id: string; name: string; memberCount: number; members: { id: string; name: string }[] };

describe("squads API", () => {
  it("creates, lists, renames, replaces members and deletes a squad", async () => {
    const { owner, teamId } = await createTeam();
    const token = await bearerFor(owner);
    const ada = await createAthleteRecord(teamId, "Ada Brink");
    const ben = await createAthleteRecord(teamId, "Ben Aalto");
    const cy = await createAthleteRecord(teamId, "Cy Dorn");

    const created = await call(createSquad, { token, json: { name: "Tuesday rings", athleteIds: [ada, ben] } });
    expect(created.status).toBe(201);
    const squad = created.data as unknown as Squad;
    expect(squad.memberCount).toBe(2);
    expect(squad.members.map((m) => m.name)).toEqual(["Ada Brink", "Ben Aalto"].sort());

    const params = { id: squad.id };
    const renamed = await call(patchSquad, { token, method: "PATCH", params, json: { name: "Thursday rings" } });
    expect(renamed.status).toBe(200);
    expect(renamed.data.name).toBe("Thursday rings");

    const replaced = await call(putMembers, { token, method: "PUT", params, json: { athleteIds: [cy] } });
    expect(replaced.status).toBe(200);
    expect((replaced.data as unknown as Squad).members).toEqual([{ id: cy, name: "Cy Dorn" }]);

    // An athlete may be in several squads.
    const second = await call(createSquad, { token, json: { name: "All levels", athleteIds: [cy, ada] } });
    expect((second.data as unknown as Squad).memberCount).toBe(2);

    const list = await call(listSquads, { token, path: "/api/v1/squads" });
    expect((list.data.items as Squad[]).map((s) => [s.name, s.memberCount])).toEqual([
      ["All levels", 2],
      ["Thursday rings", 1],
    ]);

    expect((await call(deleteSquad, { token, method: "DELETE", params })).status).toBe(204);
    expect((await call(getSquad, { token, params })).status).toBe(404);
  });

  it("rejects a member of another team with 422 naming the index, and changes nothing", async () => {
    const a = await createTeam();
    const b = await createTeam();
    const token = await bearerFor(a.owner);
    const mine = await createAthleteRecord(a.teamId, "Mine");
    const theirs = await createAthleteRecord(b.teamId, "Theirs");
    const created = await call(createSquad, { token, json: { name: "Mixed", athleteIds: [mine] } });
    const params = { id: created.data.id as string };

    const res = await call(putMembers, { token, method: "PUT", params, json: { athleteIds: [mine, theirs] } });
    expect(res.status).toBe(422);
    expect(res.data.error?.issues?.[0]?.path).toBe("athleteIds.1");
    expect(((await call(getSquad, { token, params })).data as unknown as Squad).members.map((m) => m.id)).toEqual([mine]);

    const onCreate = await call(createSquad, { token, json: { name: "Nope", athleteIds: [theirs] } });
    expect(onCreate.status).toBe(422);
    expect(onCreate.data.error?.issues?.[0]?.path).toBe("athleteIds.0");
    const list = await call(listSquads, { token, path: "/api/v1/squads" });
    expect((list.data.items as Squad[]).map((s) => s.name)).toEqual(["Mixed"]);

    const dup = await call(putMembers, { token, method: "PUT", params, json: { athleteIds: [mine, mine] } });
    expect(dup.status).toBe(422);
    expect(dup.data.error?.issues?.[0]?.path).toBe("athleteIds.1");
  });

  it("answers 404 for another team's squad and 403 to athletes", async () => {
    const a = await createTeam();
    const b = await createTeam();
    const theirs = await call(createSquad, { token: await bearerFor(b.owner), json: { name: "Theirs" } });
    const params = { id: theirs.data.id as string };
    const token = await bearerFor(a.owner);
    expect((await call(getSquad, { token, params })).status).toBe(404);
    expect((await call(patchSquad, { token, method: "PATCH", params, json: { name: "Mine now" } })).status).toBe(404);
    expect((await call(putMembers, { token, method: "PUT", params, json: { athleteIds: [] } })).status).toBe(404);
    expect((await call(deleteSquad, { token, method: "DELETE", params })).status).toBe(404);
    const list = await call(listSquads, { token, path: "/api/v1/squads" });
    expect(list.data.items).toEqual([]);

    const { actor } = await createMember(a.teamId, "athlete");
    const athleteToken = await bearerFor(actor);
    expect((await call(listSquads, { token: athleteToken, path: "/api/v1/squads" })).status).toBe(403);
    expect((await call(createSquad, { token: athleteToken, json: { name: "X" } })).status).toBe(403);
  });

  it("rejects unknown fields and empty names with 422", async () => {
    const { owner } = await createTeam();
    const token = await bearerFor(owner);
    const extra = await call(createSquad, { token, json: { name: "Ok", colour: "red" } });
    expect(extra.status).toBe(422);
    const blank = await call(createSquad, { token, json: { name: "  " } });
    expect(blank.status).toBe(422);
    expect(blank.data.error?.issues?.[0]?.path).toBe("name");
  });
});
