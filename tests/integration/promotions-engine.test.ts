// The readiness engine in the database: promotions exactly once, proposals, step-downs,
// prerequisites and the end of a ladder. Standards are the design brief's hold default
// (3 × ≥ 20 s at RPE ≤ 7, 2 of the last 3 sessions, ≥ 7 days on the rung, pain-free):
// common practice, no source.
import { and, eq } from "drizzle-orm";
import { describe, expect, it } from "vitest";
import { db } from "@/db/client";
import { athletePositions, positionMoves, promotions } from "@/db/schema";
import { evaluatePosition } from "@/lib/server/promotions/evaluate-position";
import { forecastPosition } from "@/lib/server/promotions/forecast-position";
import { createAthleteRecord, createTeam } from "../support/factories";
import {
  addPrerequisite,
  createTestLadder,
  daysAgo,
  GOOD_SETS,
  insertSession,
  logAndEvaluate,
  placeAthlete,
  WEAK_SETS,
} from "../support/log-factories";

async function positionRow(positionId: string) {
  const [row] = await db.select().from(athletePositions).where(eq(athletePositions.id, positionId));
  return row!;
}

async function movesOf(athleteId: string, ladderId: string) {
  return db
    .select()
    .from(positionMoves)
    .where(and(eq(positionMoves.athleteId, athleteId), eq(positionMoves.ladderId, ladderId)))
    .orderBy(positionMoves.createdAt);
}

async function promotionsOf(positionId: string) {
  return db.select().from(promotions).where(eq(promotions.positionId, positionId));
}

describe("position figures", () => {
  it("stamps updated_at with every evaluation, not with the time its statement was built", async () => {
    const { teamId, owner } = await createTeam();
    const athleteId = await createAthleteRecord(teamId, "Ida");
    const ladder = await createTestLadder(teamId, { mode: "auto" });
    const positionId = await placeAthlete(teamId, athleteId, ladder, ladder.rungIds[0]!, daysAgo(10));
    const session = { teamId, athleteId, ladderId: ladder.ladderId, rungId: ladder.rungIds[0]!, sets: WEAK_SETS };

    await logAndEvaluate(owner, { ...session, date: daysAgo(3) });
    const first = (await positionRow(positionId)).updatedAt;
    await new Promise((resolve) => setTimeout(resolve, 20));
    await logAndEvaluate(owner, { ...session, date: daysAgo(2) });
    const second = await positionRow(positionId);
    expect(second.lastSessionOn).toBe(daysAgo(2));
    expect(second.updatedAt.getTime()).toBeGreaterThan(first.getTime());
  });
});

describe("a long history on one rung", () => {
  // A verdict reads only the latest session dates a standard can look at (its windows are at most
  // 20 sessions), so a log costs the same after years on a rung; these pin what must not change.
  it("still judges a 20-session window in full, with a session logged for tomorrow", async () => {
    const { teamId, owner } = await createTeam();
    const athleteId = await createAthleteRecord(teamId, "Hal");
    const standard = { sessionsWindow: 20, sessionsRequired: 20, minDaysOnRung: 0, stepDown: null };
    const ladder = await createTestLadder(teamId, { mode: "approve", standard });
    const positionId = await placeAthlete(teamId, athleteId, ladder, ladder.rungIds[0]!, daysAgo(60));
    const session = { teamId, athleteId, ladderId: ladder.ladderId, rungId: ladder.rungIds[0]! };
    for (let n = 59; n >= 50; n -= 1) await insertSession(db, { ...session, date: daysAgo(n), sets: WEAK_SETS });
    for (let n = 19; n >= 1; n -= 1) await insertSession(db, { ...session, date: daysAgo(n), sets: GOOD_SETS });
    // Tomorrow counts toward nothing today, and must not push a session out of the window.
    await insertSession(db, { ...session, date: daysAgo(-1), sets: GOOD_SETS });

    const [verdict] = await logAndEvaluate(owner, { ...session, date: daysAgo(0), sets: GOOD_SETS });
    expect(verdict).toMatchObject({ status: "met" });
    expect(await positionRow(positionId)).toMatchObject({ sessionsMet: 20, lastSessionOn: daysAgo(0), status: "pending_approval" });
  });

  it("keeps the last pain however many sessions ago it was", async () => {
    const { teamId, owner } = await createTeam();
    const athleteId = await createAthleteRecord(teamId, "Ines");
    const ladder = await createTestLadder(teamId, { mode: "auto", standard: { minDaysOnRung: 365 } });
    const positionId = await placeAthlete(teamId, athleteId, ladder, ladder.rungIds[0]!, daysAgo(60));
    const session = { teamId, athleteId, ladderId: ladder.ladderId, rungId: ladder.rungIds[0]!, sets: GOOD_SETS };
    await insertSession(db, { ...session, date: daysAgo(45), pain: true });
    await insertSession(db, { ...session, date: daysAgo(40), pain: true });
    for (let n = 30; n >= 1; n -= 1) await insertSession(db, { ...session, date: daysAgo(n) });

    await logAndEvaluate(owner, { ...session, date: daysAgo(0) });
    expect(await positionRow(positionId)).toMatchObject({ lastPainOn: daysAgo(40), status: "not_yet" });
  });

  it("forecasts from every session on the rung, not only the recent ones", async () => {
    const { teamId, owner } = await createTeam();
    const athleteId = await createAthleteRecord(teamId, "Jon");
    const ladder = await createTestLadder(teamId, { mode: "auto" });
    await placeAthlete(teamId, athleteId, ladder, ladder.rungIds[0]!, daysAgo(40));
    const session = { teamId, athleteId, ladderId: ladder.ladderId, rungId: ladder.rungIds[0]! };
    for (let n = 30; n >= 1; n -= 1) await insertSession(db, { ...session, date: daysAgo(n), sets: [{ value: 5 + (30 - n) * 0.25, rpe: 8 }] });

    const result = await forecastPosition(owner, athleteId, ladder.ladderId);
    expect(result.points).toHaveLength(30);
    expect(result.points[0]).toEqual({ date: daysAgo(30), best: 5 });
  });
});

describe("auto promotion", () => {
  it("moves the athlete at once when the standard is met, with since = the meeting session's date", async () => {
    const { teamId, owner } = await createTeam();
    const athleteId = await createAthleteRecord(teamId, "Ada");
    const ladder = await createTestLadder(teamId, { mode: "auto" });
    const positionId = await placeAthlete(teamId, athleteId, ladder, ladder.rungIds[0]!, daysAgo(10));

    const first = await logAndEvaluate(owner, { teamId, athleteId, ladderId: ladder.ladderId, rungId: ladder.rungIds[0]!, date: daysAgo(3) });
    expect(first[0]).toMatchObject({ status: "not_yet", promotedTo: null, pendingPromotionId: null });
    expect(first[0]!.explanation).toBe("1 of 3 sessions met — needs 1 more session meeting the standard");
    expect(await positionRow(positionId)).toMatchObject({ status: "not_yet", sessionsMet: 1, lastSessionOn: daysAgo(3) });

    const second = await logAndEvaluate(owner, { teamId, athleteId, ladderId: ladder.ladderId, rungId: ladder.rungIds[0]!, date: daysAgo(1) });
    expect(second[0]).toMatchObject({ status: "met", readiness: 100, rungId: ladder.rungIds[0], promotedTo: ladder.rungIds[1] });

    const position = await positionRow(positionId);
    expect(position).toMatchObject({ rungId: ladder.rungIds[1], since: daysAgo(1), status: "not_yet", sessionsMet: 0, lastSessionOn: null });
    const moves = await movesOf(athleteId, ladder.ladderId);
    expect(moves.map((m) => [m.cause, m.actorKind, m.fromRungId, m.toRungId, m.effectiveOn])).toEqual([
      ["placement", "system", null, ladder.rungIds[0], daysAgo(10)],
      ["auto", "system", ladder.rungIds[0], ladder.rungIds[1], daysAgo(1)],
    ]);
    expect(moves[1]!.verdict).toMatchObject({ status: "met", explanation: expect.stringContaining("Ready to move up") });
    const rows = await promotionsOf(positionId);
    expect(rows).toHaveLength(1);
    expect(rows[0]).toMatchObject({ status: "auto", direction: "up", toRungId: ladder.rungIds[1], effectiveOn: daysAgo(1) });
    expect(moves[1]!.promotionId).toBe(rows[0]!.id);
  });

  it("promotes exactly once when 20 qualifying logs of one athlete are evaluated concurrently", async () => {
    const { teamId, owner } = await createTeam();
    const athleteId = await createAthleteRecord(teamId, "Bo");
    const ladder = await createTestLadder(teamId, { mode: "auto", rungCount: 4 });
    const positionId = await placeAthlete(teamId, athleteId, ladder, ladder.rungIds[0]!, daysAgo(20));
    const rungId = ladder.rungIds[0]!;

    // 20 transactions, each writing one qualifying session on its own date and evaluating.
    const results = await Promise.all(
      Array.from({ length: 20 }, (_, i) => logAndEvaluate(owner, { teamId, athleteId, ladderId: ladder.ladderId, rungId, date: daysAgo(1 + (i % 10)) })),
    );

    const rows = await promotionsOf(positionId);
    expect(rows).toHaveLength(1);
    expect(rows[0]).toMatchObject({ status: "auto", fromRungId: rungId, toRungId: ladder.rungIds[1] });
    const autoMoves = (await movesOf(athleteId, ladder.ladderId)).filter((m) => m.cause === "auto");
    expect(autoMoves).toHaveLength(1);
    expect((await positionRow(positionId)).rungId).toBe(ladder.rungIds[1]);
    expect(results.flat().filter((v) => v.promotedTo !== null)).toHaveLength(1);
  });

  it("marks the skill achieved on the last rung of an auto ladder", async () => {
    const { teamId, owner } = await createTeam();
    const athleteId = await createAthleteRecord(teamId, "Cy");
    const ladder = await createTestLadder(teamId, { mode: "auto", rungCount: 2 });
    const positionId = await placeAthlete(teamId, athleteId, ladder, ladder.rungIds[1]!, daysAgo(9));
    await logAndEvaluate(owner, { teamId, athleteId, ladderId: ladder.ladderId, rungId: ladder.rungIds[1]!, date: daysAgo(2) });
    const [verdict] = await logAndEvaluate(owner, { teamId, athleteId, ladderId: ladder.ladderId, rungId: ladder.rungIds[1]!, date: daysAgo(0) });
    expect(verdict).toMatchObject({ status: "met", promotedTo: null, achieved: true });
    const position = await positionRow(positionId);
    expect(position).toMatchObject({ status: "achieved", readiness: 100, rungId: ladder.rungIds[1] });
    expect(position.achievedAt).toBeInstanceOf(Date);
    expect(await promotionsOf(positionId)).toMatchObject([{ status: "auto", toRungId: null }]);
    const last = (await movesOf(athleteId, ladder.ladderId)).at(-1)!;
    expect(last).toMatchObject({ cause: "auto", toRungId: null, fromRungId: ladder.rungIds[1] });

    // More logs change nothing: no second promotion, the skill stays achieved.
    await logAndEvaluate(owner, { teamId, athleteId, ladderId: ladder.ladderId, rungId: ladder.rungIds[1]!, date: daysAgo(0) });
    expect(await promotionsOf(positionId)).toHaveLength(1);
    expect((await positionRow(positionId)).status).toBe("achieved");
  });

  it("promotes from the daily evaluation once the days on the rung come true, without a new log", async () => {
    const { teamId, owner } = await createTeam();
    const athleteId = await createAthleteRecord(teamId, "Dee");
    const ladder = await createTestLadder(teamId, { mode: "auto" });
    // Placed 5 days ago: two good sessions, but 7 days on the rung are needed.
    const positionId = await placeAthlete(teamId, athleteId, ladder, ladder.rungIds[0]!, daysAgo(5));
    await logAndEvaluate(owner, { teamId, athleteId, ladderId: ladder.ladderId, rungId: ladder.rungIds[0]!, date: daysAgo(3) });
    const [waiting] = await logAndEvaluate(owner, { teamId, athleteId, ladderId: ladder.ladderId, rungId: ladder.rungIds[0]!, date: daysAgo(1) });
    expect(waiting).toMatchObject({ status: "not_yet", promotedTo: null });
    expect(waiting!.explanation).toBe("2 of 3 sessions met — needs 2 more days on this rung");

    const inThreeDays = new Date(Date.now() + 3 * 86_400_000);
    const verdict = await db.transaction((tx) => evaluatePosition(tx, { positionId, asOf: inThreeDays, actor: "system" }));
    expect(verdict).toMatchObject({ status: "met", promotedTo: ladder.rungIds[1] });
    expect(await positionRow(positionId)).toMatchObject({ rungId: ladder.rungIds[1], since: daysAgo(1) });
  });
});

describe("approve ladders and step-downs", () => {
  it("creates one pending proposal, not a second one after more qualifying logs", async () => {
    const { teamId, owner } = await createTeam();
    const athleteId = await createAthleteRecord(teamId, "Eve");
    const ladder = await createTestLadder(teamId, { mode: "approve" });
    const positionId = await placeAthlete(teamId, athleteId, ladder, ladder.rungIds[0]!, daysAgo(14));
    for (const n of [5, 3]) await logAndEvaluate(owner, { teamId, athleteId, ladderId: ladder.ladderId, rungId: ladder.rungIds[0]!, date: daysAgo(n) });
    const [again] = await logAndEvaluate(owner, { teamId, athleteId, ladderId: ladder.ladderId, rungId: ladder.rungIds[0]!, date: daysAgo(1) });

    const rows = await promotionsOf(positionId);
    expect(rows).toHaveLength(1);
    expect(rows[0]).toMatchObject({ status: "pending", direction: "up", toRungId: ladder.rungIds[1], effectiveOn: daysAgo(3) });
    expect(again).toMatchObject({ status: "met", promotedTo: null, pendingPromotionId: rows[0]!.id });
    expect(await positionRow(positionId)).toMatchObject({ rungId: ladder.rungIds[0], status: "pending_approval", readiness: 100 });
    expect((await movesOf(athleteId, ladder.ladderId)).map((m) => m.cause)).toEqual(["placement"]);
  });

  it("proposes a step down after pain in 2 of the last 3 sessions, never applying it", async () => {
    const { teamId, owner } = await createTeam();
    const athleteId = await createAthleteRecord(teamId, "Fin");
    const ladder = await createTestLadder(teamId, { mode: "auto" });
    const positionId = await placeAthlete(teamId, athleteId, ladder, ladder.rungIds[1]!, daysAgo(12));
    const log = (date: string, pain: boolean) =>
      logAndEvaluate(owner, { teamId, athleteId, ladderId: ladder.ladderId, rungId: ladder.rungIds[1]!, date, pain });
    await log(daysAgo(5), true);
    await log(daysAgo(3), false);
    const [verdict] = await log(daysAgo(1), true);

    expect(verdict).toMatchObject({ status: "step_down", promotedTo: null });
    expect(verdict!.explanation).toBe("Pain flagged in 2 of the last 3 sessions — step down proposed");
    const rows = await promotionsOf(positionId);
    expect(rows).toHaveLength(1);
    expect(rows[0]).toMatchObject({ status: "pending", direction: "down", fromRungId: ladder.rungIds[1], toRungId: ladder.rungIds[0] });
    expect(verdict!.pendingPromotionId).toBe(rows[0]!.id);
    expect(await positionRow(positionId)).toMatchObject({ rungId: ladder.rungIds[1], status: "step_down", lastPainOn: daysAgo(1) });
    // Another painful session proposes nothing new while one is pending.
    await log(daysAgo(0), true);
    expect(await promotionsOf(positionId)).toHaveLength(1);
  });

  it("proposes no step down on the first rung (there is nothing below)", async () => {
    const { teamId, owner } = await createTeam();
    const athleteId = await createAthleteRecord(teamId, "Gil");
    const ladder = await createTestLadder(teamId, { mode: "auto" });
    const positionId = await placeAthlete(teamId, athleteId, ladder, ladder.rungIds[0]!, daysAgo(12));
    for (const n of [3, 1]) {
      await logAndEvaluate(owner, { teamId, athleteId, ladderId: ladder.ladderId, rungId: ladder.rungIds[0]!, date: daysAgo(n), sets: WEAK_SETS });
    }
    expect(await promotionsOf(positionId)).toHaveLength(0);
    expect((await positionRow(positionId)).status).toBe("step_down");
  });
});

describe("prerequisites", () => {
  it("blocks a promotion whose next rung needs a rung on another ladder, and says so", async () => {
    const { teamId, owner } = await createTeam();
    const athleteId = await createAthleteRecord(teamId, "Hal");
    const press = await createTestLadder(teamId, { mode: "auto", name: "Press" });
    const rings = await createTestLadder(teamId, { mode: "auto", name: "Rings" });
    await addPrerequisite(teamId, press.rungIds[1]!, rings.rungIds[1]!);
    const positionId = await placeAthlete(teamId, athleteId, press, press.rungIds[0]!, daysAgo(10));
    await placeAthlete(teamId, athleteId, rings, rings.rungIds[0]!, daysAgo(10));

    for (const n of [4, 2]) await logAndEvaluate(owner, { teamId, athleteId, ladderId: press.ladderId, rungId: press.rungIds[0]!, date: daysAgo(n) });
    const position = await positionRow(positionId);
    expect(position).toMatchObject({ rungId: press.rungIds[0], status: "blocked", readiness: 99 });
    expect(await promotionsOf(positionId)).toHaveLength(0);
    const [verdict] = await logAndEvaluate(owner, { teamId, athleteId, ladderId: press.ladderId, rungId: press.rungIds[0]!, date: daysAgo(1) });
    expect(verdict).toMatchObject({ status: "blocked", promotedTo: null });
    expect(verdict!.explanation).toBe("Ready: waiting for Rung 2 on the Rings line");

    // Once the athlete reaches Rings rung 2, the next evaluation promotes.
    await placeAthlete(teamId, athleteId, rings, rings.rungIds[1]!, daysAgo(0));
    const after = await db.transaction((tx) => evaluatePosition(tx, { positionId, asOf: new Date(), actor: owner }));
    expect(after).toMatchObject({ status: "met", promotedTo: press.rungIds[1] });
  });
});
