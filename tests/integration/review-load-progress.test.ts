import { describe, expect, it } from "vitest";
import { GET as loadRoute } from "@/app/api/v1/athletes/[id]/load/route";
import { GET as progressRoute } from "@/app/api/v1/athletes/[id]/progress/route";
import { addDays } from "@/lib/engine/calendar-date";
import { localDateOf } from "@/lib/engine/local-date";
import { bearerFor, createAthleteRecord, createMember, createTeam } from "../support/factories";
import { call } from "../support/http";
import { appliedPromotion, createLadder, logSession, placeAthlete } from "../support/review-factories";

interface LoadBody {
  days: { date: string; load: number }[];
  weeks: { week: string; start: string; load: number; monotony: number | null; strain: number | null }[];
  acwr: {
    rolling: { acute: number; coupled: number | null; uncoupled: number | null } | null;
    ewma: { acute: number; chronic: number; ratio: number | null } | null;
    minDaysOfHistory: number;
    daysOfHistory: number;
  };
  sdKind: string;
}

async function freshAthlete() {
  const { teamId, owner } = await createTeam();
  const athleteId = await createAthleteRecord(teamId, "Load Athlete");
  return { teamId, athleteId, token: await bearerFor(owner) };
}

async function load(token: string, athleteId: string, from: string, to: string) {
  const res = await call(loadRoute, { token, params: { id: athleteId }, path: `/api/v1/athletes/${athleteId}/load?from=${from}&to=${to}` });
  expect(res.status).toBe(200);
  return res.data as unknown as LoadBody;
}

/** Logs sessions whose RPE × minutes give the wanted loads, one log per listed day (0 = no log). */
async function logLoads(teamId: string, athleteId: string, start: string, loads: number[]) {
  for (const [i, value] of loads.entries()) {
    if (value === 0) continue;
    // 5 × (value / 5) minutes, or split in two logs when the minutes would pass 600.
    const minutes = value / 5;
    if (minutes <= 300) await logSession(teamId, athleteId, addDays(start, i), { sessionRpe: 5, durationMinutes: minutes });
    else {
      await logSession(teamId, athleteId, addDays(start, i), { sessionRpe: 10, durationMinutes: minutes / 4 });
      await logSession(teamId, athleteId, addDays(start, i), { sessionRpe: 10, durationMinutes: minutes / 4 });
    }
  }
}

// ISO week 2026-W10 runs Monday 2026-03-02 … Sunday 2026-03-08.
const MONDAY = "2026-03-02";
const SUNDAY = "2026-03-08";

describe("GET /api/v1/athletes/{id}/load", () => {
  it("session load = session RPE × minutes: RPE 7 × 60 min = 420 AU (Foster et al. 2001)", async () => {
    const { teamId, athleteId, token } = await freshAthlete();
    await logSession(teamId, athleteId, "2026-03-04", { sessionRpe: 7, durationMinutes: 60 });
    const body = await load(token, athleteId, MONDAY, SUNDAY);
    expect(body.days.find((d) => d.date === "2026-03-04")?.load).toBe(420);
    expect(body.days).toHaveLength(7);
    expect(body.weeks).toEqual([expect.objectContaining({ week: "2026-W10", start: MONDAY, load: 420 })]);
  });

  it("weekly load, monotony and strain of the worked week with the population SD (Foster 1998)", async () => {
    const { teamId, athleteId, token } = await freshAthlete();
    await logLoads(teamId, athleteId, MONDAY, [300, 0, 450, 250, 0, 600, 200]);
    const body = await load(token, athleteId, MONDAY, SUNDAY);
    expect(body.days.map((d) => d.load)).toEqual([300, 0, 450, 250, 0, 600, 200]);
    const [week] = body.weeks;
    expect(week!.load).toBe(1800);
    expect(week!.monotony).toBeCloseTo(1.2587, 4);
    expect(week!.strain).toBeCloseTo(2265.68, 2);
    expect(body.sdKind).toBe("population");
  });

  it("answers monotony null, not infinity or NaN, when every day has the same load (Foster 1998: SD 0 leaves it undefined)", async () => {
    const { teamId, athleteId, token } = await freshAthlete();
    await logLoads(teamId, athleteId, MONDAY, [300, 300, 300, 300, 300, 300, 300]);
    const res = await call(loadRoute, { token, params: { id: athleteId }, path: `/api/v1/athletes/${athleteId}/load?from=${MONDAY}&to=${SUNDAY}` });
    expect(res.status).toBe(200);
    const body = res.data as unknown as LoadBody;
    expect(body.weeks[0]).toMatchObject({ load: 2100, monotony: null, strain: null });
  });

  it("rolling acute:chronic from weeks of 1500, 1600, 1700, 2400: coupled 1.3333, uncoupled 1.5 (Hulin et al. 2014)", async () => {
    const { teamId, athleteId, token } = await freshAthlete();
    const weeks = [1500, 1600, 1700, 2400];
    // Two sessions per week whose loads sum to the week's load.
    for (const [w, total] of weeks.entries()) {
      await logSession(teamId, athleteId, addDays(MONDAY, 7 * w), { sessionRpe: 5, durationMinutes: total / 10 });
      await logSession(teamId, athleteId, addDays(MONDAY, 7 * w + 3), { sessionRpe: 5, durationMinutes: total / 10 });
    }
    const to = addDays(MONDAY, 27);
    const body = await load(token, athleteId, MONDAY, to);
    expect(body.weeks.map((w) => w.load)).toEqual(weeks);
    expect(body.acwr.daysOfHistory).toBe(28);
    expect(body.acwr.rolling!.acute).toBe(2400);
    expect(body.acwr.rolling!.coupled).toBeCloseTo(1.3333, 4);
    expect(body.acwr.rolling!.uncoupled).toBeCloseTo(1.5, 4);
    // With 28 days of history the EWMA ratio is shown too, and it is acute / chronic (Williams et al. 2017).
    expect(body.acwr.ewma!.ratio).toBeCloseTo(body.acwr.ewma!.acute / body.acwr.ewma!.chronic, 9);
  });

  it("EWMA of loads 100, 200, 0, 300, 150: day 5 acute 146.484375, chronic 115.877848 (Williams et al. 2017); no ratio before 28 days", async () => {
    const { teamId, athleteId, token } = await freshAthlete();
    await logLoads(teamId, athleteId, MONDAY, [100, 200, 0, 300, 150]);
    const body = await load(token, athleteId, MONDAY, addDays(MONDAY, 4));
    expect(body.acwr.ewma!.acute).toBeCloseTo(146.484375, 6);
    expect(body.acwr.ewma!.chronic).toBeCloseTo(115.877848, 6);
    // Williams et al. 2017: ratio = acute / chronic = 1.264128 on day 5; held back until minDaysOfHistory days exist.
    expect(body.acwr.ewma!.acute / body.acwr.ewma!.chronic).toBeCloseTo(1.264128, 6);
    expect(body.acwr.ewma!.ratio).toBeNull();
    expect(body.acwr.rolling).toBeNull();
    expect(body.acwr.minDaysOfHistory).toBe(28);
    expect(body.acwr.daysOfHistory).toBe(5);
  });

  it("rejects a window with from after to, and answers 404 for another team's athlete", async () => {
    const { athleteId, token } = await freshAthlete();
    const bad = await call(loadRoute, { token, params: { id: athleteId }, path: `/api/v1/athletes/${athleteId}/load?from=${SUNDAY}&to=${MONDAY}` });
    expect(bad.status).toBe(422);
    const other = await createTeam();
    const foreign = await call(loadRoute, { token: await bearerFor(other.owner), params: { id: athleteId }, path: `/api/v1/athletes/${athleteId}/load` });
    expect(foreign.status).toBe(404);
  });
});

describe("GET /api/v1/athletes/{id}/progress", () => {
  it("shows the path with the date each rung was reached, session bests, pain notes, the standard and a forecast", async () => {
    const { teamId, owner } = await createTeam();
    const token = await bearerFor(owner);
    const athleteId = await createAthleteRecord(teamId, "Path Athlete");
    const ladder = await createLadder(teamId, "Path ladder");
    // Dated relative to today: the progress charts show the last year.
    const start = addDays(localDateOf(new Date(), "Europe/Amsterdam"), -60);
    const positionId = await placeAthlete(teamId, athleteId, ladder.ladderId, ladder.rungIds[1]!, { since: start, readiness: 40 });
    // The placement was on rung 1 first; then an automatic move up to rung 2.
    await appliedPromotion({ teamId, athleteId, ladderId: ladder.ladderId, positionId, fromRungId: ladder.rungIds[0]!, toRungId: ladder.rungIds[1]!, effectiveOn: start });
    for (const [day, best, pain, note] of [
      [2, 8, false, null],
      [5, 10, false, null],
      [8, 9, true, "sharp wrist"],
      [11, 12, false, null],
    ] as const) {
      await logSession(teamId, athleteId, addDays(start, day), { entries: [{ ladderId: ladder.ladderId, rungId: ladder.rungIds[1]!, best, pain, note }] });
    }
    const res = await call(progressRoute, { token, params: { id: athleteId } });
    expect(res.status).toBe(200);
    const [progress] = res.data.ladders as {
      current: { rungId: string; position: number; rungCount: number };
      path: { rungId: string; reachedOn: string; cause: string }[];
      sessions: { date: string; best: number; pain: boolean; note: string | null }[];
      standard: { minValue: number; text: string };
      forecast: { reason: string; estimate: string | null };
      moves: { cause: string; toRungName: string }[];
    }[];
    expect(progress!.current).toMatchObject({ rungId: ladder.rungIds[1], position: 2, rungCount: 3 });
    expect(progress!.path.map((p) => p.cause)).toEqual(["placement", "auto"]);
    expect(progress!.path[1]).toMatchObject({ rungId: ladder.rungIds[1], reachedOn: start });
    expect(progress!.sessions.map((s) => s.best)).toEqual([8, 10, 9, 12]);
    expect(progress!.sessions[2]).toMatchObject({ pain: true, note: "sharp wrist" });
    expect(progress!.standard.minValue).toBe(20);
    expect(progress!.standard.text).toContain("3 sets");
    // Rising bests (pain session left out): the engine's straight line gives a date, an estimate only.
    expect(progress!.forecast.reason).toBe("trending_up");
    expect(progress!.moves).toHaveLength(2);
  });

  it("lets an athlete read their own progress, and answers 404 for a teammate's or another team's athlete", async () => {
    const { teamId, owner } = await createTeam();
    const { actor } = await createMember(teamId, "athlete", "Self Viewer");
    const mate = await createAthleteRecord(teamId, "Teammate");
    const athleteToken = await bearerFor(actor);
    expect((await call(progressRoute, { token: athleteToken, params: { id: actor.athleteId! } })).status).toBe(200);
    expect((await call(progressRoute, { token: athleteToken, params: { id: mate } })).status).toBe(404);
    expect((await call(loadRoute, { token: athleteToken, params: { id: mate }, path: `/api/v1/athletes/${mate}/load` })).status).toBe(404);
    const other = await createTeam();
    expect((await call(progressRoute, { token: await bearerFor(other.owner), params: { id: mate } })).status).toBe(404);
    expect((await call(progressRoute, { token: await bearerFor(owner), params: { id: mate } })).status).toBe(200);
  });
});
