import { describe, expect, it } from "vitest";
import { GET as getAthlete, PATCH as patchAthlete } from "@/app/api/v1/athletes/[id]/route";
import { GET as listAssignments } from "@/app/api/v1/athletes/[id]/assignments/route";
import { GET as listAthletes, POST as createAthlete } from "@/app/api/v1/athletes/route";
import { GET as listBlocks } from "@/app/api/v1/blocks/route";
import { GET as listLadders } from "@/app/api/v1/ladders/route";
import { GET as listAthleteLogs } from "@/app/api/v1/athletes/[id]/logs/route";
import { GET as listPlans } from "@/app/api/v1/plans/route";
import { GET as listReadiness } from "@/app/api/v1/readiness/route";
import { GET as listSquads } from "@/app/api/v1/squads/route";
import { POST as signup } from "@/app/api/v1/signup/route";
import { POST as createToken } from "@/app/api/v1/tokens/route";
import { bearerFor, createAthleteRecord, createTeam } from "../support/factories";
import { call } from "../support/http";

describe("bad input never becomes a 500", () => {
  it.each([
    ["{not json", 400],
    ["", 400],
    ["null", 422],
    ["[]", 422],
    ['"a string"', 422],
    ['{"name": 42}', 422],
    ['{"name": }', 400],
    [JSON.stringify({ name: "x".repeat(500) }), 422],
    [JSON.stringify({ name: "Ok", email: "nope" }), 422],
    [JSON.stringify({ name: "Ok", invite: true }), 422],
    [JSON.stringify({ name: "Ok", primaryCoachId: "not-a-uuid" }), 422],
    [JSON.stringify({ name: "Ok", extra: 1 }), 422],
  ])("POST /api/v1/athletes with %s → %i", async (rawBody, status) => {
    const { owner } = await createTeam();
    const res = await call(createAthlete, {
      method: "POST",
      token: await bearerFor(owner),
      rawBody,
      headers: { "content-type": "application/json" },
    });
    expect(res.status).toBe(status);
    expect(res.data.error?.code).toBeTruthy();
  });

  it("answers 404, not a database error, for ids that are not UUIDs", async () => {
    const { owner } = await createTeam();
    const token = await bearerFor(owner);
    expect((await call(getAthlete, { token, params: { id: "1 or 1=1" } })).status).toBe(404);
    expect((await call(patchAthlete, { token, method: "PATCH", params: { id: "abc" }, json: { name: "x" } })).status).toBe(404);
  });

  it("validates query strings with 422", async () => {
    const { owner } = await createTeam();
    const token = await bearerFor(owner);
    expect((await call(listAthletes, { token, path: "/api/v1/athletes?limit=0" })).status).toBe(422);
    expect((await call(listAthletes, { token, path: "/api/v1/athletes?limit=abc" })).status).toBe(422);
    expect((await call(listAthletes, { token, path: "/api/v1/athletes?unknown=1" })).status).toBe(422);
  });

  it("answers 422, not a database error, for a forged page cursor", async () => {
    const { owner, teamId } = await createTeam();
    const token = await bearerFor(owner);
    const forged = (value: unknown) => Buffer.from(JSON.stringify(value)).toString("base64url");
    const byName = forged({ name: "a", id: "not-a-uuid" });
    for (const [list, path] of [
      [listAthletes, "/api/v1/athletes"],
      [listSquads, "/api/v1/squads"],
      [listBlocks, "/api/v1/blocks"],
      [listPlans, "/api/v1/plans"],
      [listLadders, "/api/v1/ladders"],
    ] as const) {
      const res = await call(list, { token, path: `${path}?cursor=${byName}` });
      expect(res.status, path).toBe(422);
    }
    const athleteId = await createAthleteRecord(teamId);
    const byDate = forged({ startsOn: "soon", id: "x" });
    const res = await call(listAssignments, { token, params: { id: athleteId }, path: `/api/v1/athletes/${athleteId}/assignments?cursor=${byDate}` });
    expect(res.status).toBe(422);
  });

  it("answers 422 for cursors that look right but no database cast accepts", async () => {
    const { owner, teamId } = await createTeam();
    const token = await bearerFor(owner);
    const athleteId = await createAthleteRecord(teamId);
    const forged = (value: unknown) => Buffer.from(JSON.stringify(value)).toString("base64url");
    const id = "00000000-0000-4000-8000-000000000000";
    const cases: [string, Parameters<typeof call>[0], string, Record<string, string>?][] = [
      ["month 13 in a timestamp", listAthleteLogs, `/api/v1/athletes/${athleteId}/logs?cursor=${forged({ d: "2026-12-01", at: "2026-13-45 99:99:99+00", id })}`, { id: athleteId }],
      ["year 0", listAssignments, `/api/v1/athletes/${athleteId}/assignments?cursor=${forged({ startsOn: "0000-01-01", id })}`, { id: athleteId }],
      ["a readiness past any int", listReadiness, `/api/v1/readiness?sort=readiness&cursor=${forged({ s: "readiness", k: 3_000_000_000, n: "a", id })}`],
      ["a NUL in a name", listAthletes, `/api/v1/athletes?cursor=${forged({ name: "a\u0000b", id })}`],
    ];
    for (const [label, handler, path, params] of cases) {
      const res = await call(handler, { token, path, params });
      expect(res.status, label).toBe(422);
      expect(res.data.error?.issues?.map((i) => i.path), label).toEqual(["cursor"]);
    }
  });

  it("answers 400 for a NUL character in a body or a query string", async () => {
    const { owner } = await createTeam();
    const token = await bearerFor(owner);
    const body = await call(createAthlete, { method: "POST", token, rawBody: '{"name":"Ana\\u0000"}', headers: { "content-type": "application/json" } });
    expect(body.status).toBe(400);
    // An escaped backslash before "u0000" is plain text, not a NUL.
    const text = await call(createAthlete, { method: "POST", token, rawBody: '{"name":"Ana \\\\u0000"}', headers: { "content-type": "application/json" } });
    expect(text.status).toBe(201);
    const query = await call(listAthletes, { token, path: "/api/v1/athletes?q=a%00b" });
    expect(query.status).toBe(400);
  });

  it("refuses oversized bodies with 413", async () => {
    const res = await call(signup, { method: "POST", rawBody: JSON.stringify({ pad: "x".repeat(300 * 1024) }) });
    expect(res.status).toBe(413);
  });

  it("validates token names", async () => {
    const { owner } = await createTeam();
    const res = await call(createToken, { token: await bearerFor(owner), json: { name: "   " } });
    expect(res.status).toBe(422);
    expect(res.data.error?.issues?.[0]?.path).toBe("name");
  });
});
