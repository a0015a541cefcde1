import { addDays } from "date-fns";
import { eq } from "drizzle-orm";
import { describe, expect, it } from "vitest";
import { db } from "@/db/client";
import { apiTokens, logs, teams, users } from "@/db/schema";
import { localDateOf } from "@/lib/engine/local-date";
import { recentTokenActor } from "@/lib/server/auth/token-actor";
import { route } from "@/lib/server/http/route";
import { bearerFor, createMember, createTeam } from "../support/factories";
import { call } from "../support/http";
import { placeOn, postLogAs } from "../support/logging-factories";

// A Bearer token seen within the last minute skips its own read before POST /api/v1/logs and is
// confirmed inside the write's transaction instead. Each case warms that cache with one post, then
// changes the token, user or team behind it: the next post must be decided on the fresh state.

async function warmSetup(timeZone = "Europe/Amsterdam") {
  const { teamId } = await createTeam({ timeZone });
  const athlete = await createMember(teamId, "athlete", "Recent Token Athlete");
  const rung = await placeOn(teamId, athlete.actor.athleteId!, "freestanding-handstand", "chest-to-wall-hold");
  const token = await bearerFor(athlete.actor);
  const today = localDateOf(new Date(), timeZone);
  const body = (value: number, performedOn = today) => ({ performedOn, entries: [{ rungId: rung.rungId, sets: [{ value }], pain: false }] });
  expect((await postLogAs(token, body(20))).status).toBe(201);
  expect(recentTokenActor(token)).not.toBeNull();
  return { teamId, athlete, rung, token, today, body };
}

async function logCount(athleteId: string) {
  return (await db.select({ id: logs.id }).from(logs).where(eq(logs.athleteId, athleteId))).length;
}

describe("POST /api/v1/logs with a token seen lately", () => {
  it("logs as usual", async () => {
    const { athlete, token, body } = await warmSetup();
    const second = await postLogAs(token, body(25));
    expect(second.status).toBe(201);
    expect(second.data).toMatchObject({ athleteId: athlete.actor.athleteId, enteredById: athlete.actor.userId });
    expect(await logCount(athlete.actor.athleteId!)).toBe(2);
  });

  it("answers 401 and writes nothing once the token is revoked", async () => {
    const { athlete, token, body } = await warmSetup();
    await db.update(apiTokens).set({ revokedAt: new Date() }).where(eq(apiTokens.userId, athlete.actor.userId));
    const res = await postLogAs(token, body(25));
    expect(res.status).toBe(401);
    expect(await logCount(athlete.actor.athleteId!)).toBe(1);
    expect(recentTokenActor(token)).toBeNull();
  });

  it("answers 401 and writes nothing once the user is disabled", async () => {
    const { athlete, token, body } = await warmSetup();
    await db.update(users).set({ disabledAt: new Date() }).where(eq(users.id, athlete.actor.userId));
    expect((await postLogAs(token, body(25))).status).toBe(401);
    expect(await logCount(athlete.actor.athleteId!)).toBe(1);
  });

  it("decides on the user's current role, not the one seen before", async () => {
    const { teamId, athlete, body } = await warmSetup();
    const coach = await createMember(teamId, "coach", "Recent Token Coach");
    const coachToken = await bearerFor(coach.actor);
    const forAthlete = { ...body(20), athleteId: athlete.actor.athleteId };
    expect((await postLogAs(coachToken, forAthlete)).status).toBe(201);
    // No longer staff, and no athlete of their own: logging for someone else is not found.
    await db.update(users).set({ role: "athlete" }).where(eq(users.id, coach.actor.userId));
    const res = await postLogAs(coachToken, { ...body(22), athleteId: athlete.actor.athleteId });
    expect(res.status).toBe(404);
    expect(await logCount(athlete.actor.athleteId!)).toBe(2);
  });

  it("checks the date against the team's current time zone", async () => {
    // Kiritimati is UTC+14 and Pago Pago UTC−11 (IANA tz database): tomorrow in the first is at
    // least two days past today in the second, so only a fresh read refuses it.
    const { teamId, athlete, token, body } = await warmSetup("Pacific/Kiritimati");
    const kiritimatiTomorrow = localDateOf(addDays(new Date(), 1), "Pacific/Kiritimati");
    await db.update(teams).set({ timeZone: "Pacific/Pago_Pago" }).where(eq(teams.id, teamId));
    const res = await postLogAs(token, body(25, kiritimatiTomorrow));
    expect(res.status).toBe(422);
    expect(JSON.stringify(res.data)).toContain("performedOn");
    expect(await logCount(athlete.actor.athleteId!)).toBe(1);
  });

  it("still answers 401 before judging the body of a revoked token", async () => {
    const { athlete, token } = await warmSetup();
    await db.update(apiTokens).set({ revokedAt: new Date() }).where(eq(apiTokens.userId, athlete.actor.userId));
    expect((await postLogAs(token, { performedOn: "not a date", entries: [] })).status).toBe(401);
  });

  it("refuses to answer from a route that takes a recent token but never confirms it", async () => {
    const { token } = await warmSetup();
    const unconfirmed = route({ can: "logs.write", confirmsActor: true }, async ({ actor }) => ({ userId: actor.userId }));
    expect((await call(unconfirmed, { method: "POST", path: "/api/v1/unconfirmed", token })).status).toBe(500);
  });
});
