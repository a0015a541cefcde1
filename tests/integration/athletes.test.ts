import { describe, expect, it } from "vitest";
import { GET as getAthleteRoute, PATCH as patchAthlete } from "@/app/api/v1/athletes/[id]/route";
import { GET as listAthletesRoute, POST as createAthleteRoute } from "@/app/api/v1/athletes/route";
import { GET as me } from "@/app/api/v1/me/route";
import { bearerFor, createAthleteRecord, createMember, createTeam } from "../support/factories";
import { call } from "../support/http";

describe("athletes API", () => {
  it("creates an athlete without an account, and the coach can read and change it", async () => {
    const { owner } = await createTeam();
    const token = await bearerFor(owner);
    const created = await call(createAthleteRoute, { token, json: { name: "Nia Holm" } });
    expect(created.status).toBe(201);
    expect(created.data).toMatchObject({ name: "Nia Holm", email: null, hasAccount: false, primaryCoachId: owner.userId });

    const id = created.data.id as string;
    const read = await call(getAthleteRoute, { token, params: { id } });
    expect(read.status).toBe(200);
    const patched = await call(patchAthlete, { token, method: "PATCH", params: { id }, json: { name: "Nia Holm-Berg" } });
    expect(patched.status).toBe(200);
    expect(patched.data.name).toBe("Nia Holm-Berg");
  });

  it("answers 404 to a coach of team A asking for team B's athlete, and changes nothing", async () => {
    const a = await createTeam();
    const b = await createTeam();
    const theirs = await createAthleteRecord(b.teamId, "Other Team Athlete");
    const token = await bearerFor(a.owner);
    expect((await call(getAthleteRoute, { token, params: { id: theirs } })).status).toBe(404);
    const patch = await call(patchAthlete, { token, method: "PATCH", params: { id: theirs }, json: { name: "Stolen" } });
    expect(patch.status).toBe(404);
    const list = await call(listAthletesRoute, { token, path: "/api/v1/athletes" });
    expect((list.data.items as { id: string }[]).map((x) => x.id)).not.toContain(theirs);
    const bToken = await bearerFor(b.owner);
    expect((await call(getAthleteRoute, { token: bToken, params: { id: theirs } })).data.name).toBe("Other Team Athlete");
  });

  it("shows an athlete only their own record and forbids them to create athletes", async () => {
    const { teamId } = await createTeam();
    const other = await createAthleteRecord(teamId, "Teammate");
    const { actor } = await createMember(teamId, "athlete", "Self Athlete");
    const token = await bearerFor(actor);
    const list = await call(listAthletesRoute, { token, path: "/api/v1/athletes" });
    expect((list.data.items as { name: string }[]).map((x) => x.name)).toEqual(["Self Athlete"]);
    expect((await call(getAthleteRoute, { token, params: { id: other } })).status).toBe(404);
    expect((await call(createAthleteRoute, { token, json: { name: "X" } })).status).toBe(403);
    const who = await call(me, { token });
    expect(who.data).toMatchObject({ role: "athlete", athleteId: actor.athleteId, teamId });
  });

  it("pages through athletes by name with a cursor", async () => {
    const { owner, teamId } = await createTeam();
    for (const name of ["Cara", "Abe", "Dov", "Bea", "Eli"]) await createAthleteRecord(teamId, name);
    const token = await bearerFor(owner);
    const first = await call(listAthletesRoute, { token, path: "/api/v1/athletes?limit=2" });
    expect((first.data.items as { name: string }[]).map((x) => x.name)).toEqual(["Abe", "Bea"]);
    const second = await call(listAthletesRoute, {
      token,
      path: `/api/v1/athletes?limit=2&cursor=${first.data.nextCursor as string}`,
    });
    expect((second.data.items as { name: string }[]).map((x) => x.name)).toEqual(["Cara", "Dov"]);
    const bad = await call(listAthletesRoute, { token, path: "/api/v1/athletes?cursor=garbage" });
    expect(bad.status).toBe(422);
  });

  it("rejects a primary coach from another team with 422", async () => {
    const a = await createTeam();
    const b = await createTeam();
    const res = await call(createAthleteRoute, {
      token: await bearerFor(a.owner),
      json: { name: "Kim", primaryCoachId: b.owner.userId },
    });
    expect(res.status).toBe(422);
    expect(res.data.error?.issues?.[0]?.path).toBe("primaryCoachId");
  });
});
