// The what-if replay and the readiness forecast over stored history.
import { describe, expect, it } from "vitest";
import { GET as forecastRoute } from "@/app/api/v1/athletes/[id]/positions/[ladderId]/forecast/route";
import { POST as backtestRoute } from "@/app/api/v1/ladders/[id]/backtest/route";
import { addDays, defaultStandard } from "@/lib/engine";
import { bearerFor, createAthleteRecord, createMember, createTeam } from "../support/factories";
import { call } from "../support/http";
import { createTestLadder, daysAgo, logAndEvaluate, placeAthlete, WEAK_SETS } from "../support/log-factories";

/** Noon UTC of a date is the same date in Europe/Amsterdam: the log is evaluated on its own day. */
const noonOf = (date: string) => new Date(`${date}T12:00:00Z`);

const DEFAULT = defaultStandard("hold_seconds");

describe("what-if backtest", () => {
  // Hand-worked history on rung 1 of an auto ladder with the default hold standard
  // (3 × ≥ 20 s at RPE ≤ 7, 2 of the last 3 sessions, ≥ 7 days; common practice, no source).
  // Ada: placed on D0 = 30 days ago; good sessions (3 × 25 s at RPE 6) on D0+2, D0+4, D0+6, D0+9,
  //   each evaluated on its own day. D0+4 and D0+6 meet 2 of 3 but have 4 and 6 days on the rung;
  //   D0+9 has 9 days → promoted on D0+9 (actualPromotedOn). Her stint on rung 1 is D0 … D0+9.
  // Bea: placed 10 days ago; good sessions 8 and 5 days ago; at 5 days ago she had 5 days on the
  //   rung, so she was not promoted and is still on rung 1 (actualPromotedOn null).
  // Cy: placed straight on rung 2, never on rung 1 → not in the replay.
  //
  // Proposal A, 2 of 3 sessions and ≥ 3 days: Ada met on D0+4 (2 sessions, 4 days ≥ 3);
  //   Bea met 5 days ago (2 sessions, 5 days).
  // Proposal B, ≥ 26 s per set (and ≥ 3 days): no 25 s set reaches it → null for both.
  // Proposal C, 3 of 3 sessions, no minimum days: Ada on D0+6 (her third good session); Bea has
  //   only two sessions → null.
  async function history() {
    const team = await createTeam();
    const ladder = await createTestLadder(team.teamId, { mode: "auto" });
    const [r1, r2] = ladder.rungIds as [string, string];
    const d0 = daysAgo(30);
    const ada = await createAthleteRecord(team.teamId, "Ada");
    await placeAthlete(team.teamId, ada, ladder, r1, d0);
    for (const n of [2, 4, 6, 9]) {
      const date = addDays(d0, n);
      await logAndEvaluate(team.owner, { teamId: team.teamId, athleteId: ada, ladderId: ladder.ladderId, rungId: r1, date }, noonOf(date));
    }
    const bea = await createAthleteRecord(team.teamId, "Bea");
    await placeAthlete(team.teamId, bea, ladder, r1, daysAgo(10));
    for (const n of [8, 5]) {
      await logAndEvaluate(team.owner, { teamId: team.teamId, athleteId: bea, ladderId: ladder.ladderId, rungId: r1, date: daysAgo(n) }, noonOf(daysAgo(n)));
    }
    const cy = await createAthleteRecord(team.teamId, "Cy");
    await placeAthlete(team.teamId, cy, ladder, r2, daysAgo(10));
    return { team, ladder, r1, d0, ada, bea, token: await bearerFor(team.owner) };
  }

  it("replays each stint on the rung under a proposed standard", async () => {
    const h = await history();
    const run = (standard: object) =>
      call(backtestRoute, { token: h.token, params: { id: h.ladder.ladderId }, json: { rungId: h.r1, standard } });

    const a = await run({ ...DEFAULT, minDaysOnRung: 3 });
    expect(a.status).toBe(200);
    expect(a.data.items).toEqual([
      { athleteId: h.ada, athleteName: "Ada", reachedOn: h.d0, actualPromotedOn: addDays(h.d0, 9), wouldPromoteOn: addDays(h.d0, 4), sessions: 4 },
      { athleteId: h.bea, athleteName: "Bea", reachedOn: daysAgo(10), actualPromotedOn: null, wouldPromoteOn: daysAgo(5), sessions: 2 },
    ]);

    const b = await run({ ...DEFAULT, minValue: 26, minDaysOnRung: 3 });
    expect((b.data.items as { wouldPromoteOn: string | null }[]).map((i) => i.wouldPromoteOn)).toEqual([null, null]);

    const c = await run({ ...DEFAULT, sessionsRequired: 3, sessionsWindow: 3, minDaysOnRung: 0 });
    expect((c.data.items as { wouldPromoteOn: string | null }[]).map((i) => i.wouldPromoteOn)).toEqual([addDays(h.d0, 6), null]);
  });

  it("validates the proposed standard (422 with the field), hides other teams' ladders (404) and is staff only (403)", async () => {
    const h = await history();
    const bad = await call(backtestRoute, {
      token: h.token,
      params: { id: h.ladder.ladderId },
      json: { rungId: h.r1, standard: { ...DEFAULT, sessionsRequired: 4, sessionsWindow: 3 } },
    });
    expect(bad.status).toBe(422);
    expect(bad.data.error?.issues?.map((i) => i.path)).toContain("standard.sessionsRequired");
    const unknownField = await call(backtestRoute, { token: h.token, params: { id: h.ladder.ladderId }, json: { rungId: h.r1, standard: DEFAULT, extra: 1 } });
    expect(unknownField.status).toBe(422);

    const outsider = await createTeam();
    const theirs = await call(backtestRoute, { token: await bearerFor(outsider.owner), params: { id: h.ladder.ladderId }, json: { rungId: h.r1, standard: DEFAULT } });
    expect(theirs.status).toBe(404);
    const { actor } = await createMember(h.team.teamId, "athlete");
    const athlete = await call(backtestRoute, { token: await bearerFor(actor), params: { id: h.ladder.ladderId }, json: { rungId: h.r1, standard: DEFAULT } });
    expect(athlete.status).toBe(403);
  });
});

describe("readiness forecast", () => {
  it("estimates the date the trend of best values reaches the standard", async () => {
    const team = await createTeam();
    const ladder = await createTestLadder(team.teamId, { mode: "auto" });
    const athleteId = await createAthleteRecord(team.teamId, "Trend");
    await placeAthlete(team.teamId, athleteId, ladder, ladder.rungIds[0]!, daysAgo(20));
    // Best values 12, 14, 16, 18 s on days 0, 4, 8, 12 of the series (14, 10, 6, 2 days ago).
    // Ordinary least squares by hand: mean x 6, mean y 15, Sxy = 40, Sxx = 80 → slope 0.5 s/day,
    // intercept 12 s; 20 s is reached at x = 16, i.e. 14 days ago + 16 = 2 days from now.
    for (const [n, best] of [[14, 12], [10, 14], [6, 16], [2, 18]] as const) {
      const sets = [{ value: best, rpe: 7 }, { value: best - 1, rpe: 7 }, { value: best - 2, rpe: 7 }];
      await logAndEvaluate(team.owner, { teamId: team.teamId, athleteId, ladderId: ladder.ladderId, rungId: ladder.rungIds[0]!, date: daysAgo(n), sets });
    }
    const token = await bearerFor(team.owner);
    const res = await call(forecastRoute, { token, params: { id: athleteId, ladderId: ladder.ladderId } });
    expect(res.status).toBe(200);
    expect(res.data).toMatchObject({ reason: "trending_up", estimate: daysAgo(-2), target: 20, measure: "hold_seconds" });
    expect(res.data.slopePerDay).toBeCloseTo(0.5, 10);
    expect(res.data.points).toEqual([
      { date: daysAgo(14), best: 12 },
      { date: daysAgo(10), best: 14 },
      { date: daysAgo(6), best: 16 },
      { date: daysAgo(2), best: 18 },
    ]);

    const outsider = await createTeam();
    expect((await call(forecastRoute, { token: await bearerFor(outsider.owner), params: { id: athleteId, ladderId: ladder.ladderId } })).status).toBe(404);
  });

  it("says 'not trending up' when the best values do not rise, and lets athletes see only their own", async () => {
    const team = await createTeam();
    const ladder = await createTestLadder(team.teamId, { mode: "auto", standard: { stepDown: null } });
    const { actor } = await createMember(team.teamId, "athlete", "Flat");
    const athleteId = actor.athleteId!;
    await placeAthlete(team.teamId, athleteId, ladder, ladder.rungIds[0]!, daysAgo(20));
    for (const n of [9, 6, 3]) {
      await logAndEvaluate(team.owner, { teamId: team.teamId, athleteId, ladderId: ladder.ladderId, rungId: ladder.rungIds[0]!, date: daysAgo(n), sets: WEAK_SETS });
    }
    const res = await call(forecastRoute, { token: await bearerFor(actor), params: { id: athleteId, ladderId: ladder.ladderId } });
    expect(res.status).toBe(200);
    expect(res.data).toMatchObject({ reason: "not_trending_up", estimate: null, slopePerDay: 0 });
    const teammate = await createAthleteRecord(team.teamId, "Teammate");
    await placeAthlete(team.teamId, teammate, ladder, ladder.rungIds[0]!, daysAgo(5));
    expect((await call(forecastRoute, { token: await bearerFor(actor), params: { id: teammate, ladderId: ladder.ladderId } })).status).toBe(404);
  });
});
