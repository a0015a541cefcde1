// A log judges its positions from the context read with its locks plus the entries it writes
// (contextWithEntries), not from a second read after its inserts. These pin that the two agree:
// the JS rule against PostgreSQL's own read of the same rows, over random histories (fast-check),
// and the verdicts POST /api/v1/logs answers against a fresh read after each post.
// The read takes as many dates as the rung's standard looks back over (lookbackSessions), so the
// first property also pins that the verdict on it is the verdict on the whole history. Standards
// are the default hold standard (3 × ≥ 20 s at RPE ≤ 7, 2 of the last 3 sessions, ≥ 7 days on the
// rung, pain-free: common practice, no source) or, in the first property, generated windows.
import { eq } from "drizzle-orm";
import fc from "fast-check";
import { beforeAll, describe, expect, it } from "vitest";
import { db } from "@/db/client";
import { athletePositions, standards } from "@/db/schema";
import { defaultStandard, MAX_LOOKBACK_SESSIONS, type StepDownRule } from "@/lib/engine";
import type { VerdictDto } from "@/lib/validation/verdicts";
import { getPositionVerdict } from "@/lib/server/promotions/get-position-verdict";
import { contextWithEntries } from "@/lib/server/promotions/context-with-entries";
import { standardRow } from "@/lib/server/ladders/rung-rows";
import { judgePosition } from "@/lib/server/promotions/judge-position";
import { loadPositionContext, PAST_TODAY } from "@/lib/server/promotions/load-position-context";
import { bearerFor, createAthleteRecord, createMember, createTeam } from "../support/factories";
import { createTestLadder, daysAgo, GOOD_SETS, insertSession, placeAthlete, WEAK_SETS, type TestLadder } from "../support/log-factories";
import { postLogAs } from "../support/logging-factories";

// Dates from past the horizon (the UTC date plus one) to before the position's date; a date
// logged twice now and then. Half the histories are short, half hold more dates than the longest
// window a standard may have. Most sessions are weak and pain-free, so runs of drops happen.
const LONGEST = MAX_LOOKBACK_SESSIONS + PAST_TODAY;
const OLDEST = LONGEST + 14;
const mostlyNot = fc.oneof(fc.constant(false), fc.boolean());
const historyOf = (minLength: number, maxLength: number) =>
  fc.uniqueArray(
    fc.record({ daysAgo: fc.integer({ min: -3, max: OLDEST }), pain: mostlyNot, good: mostlyNot, twice: fc.boolean() }),
    { selector: (s) => s.daysAgo, minLength, maxLength },
  );
const history = fc.oneof(historyOf(0, 8), historyOf(LONGEST, LONGEST + 12));

// The rung's standard: none (the measure's default), or a coach's own sessions window with the
// step-down rule switched off or looking back over its own pain window and run of drops. Windows
// are often short, so each of the three look-backs is the longest in some runs.
const windowArb = fc.oneof(fc.integer({ min: 1, max: 3 }), fc.integer({ min: 1, max: MAX_LOOKBACK_SESSIONS }));
const stepDownArb: fc.Arbitrary<StepDownRule | null> = fc.oneof(
  fc.constant(null),
  fc
    .record({ painWindow: windowArb, painSessions: fc.integer({ min: 1, max: 3 }), dropSessions: fc.integer({ min: 1, max: 10 }) })
    .map((r) => ({ ...r, painSessions: Math.min(r.painSessions, r.painWindow), dropBelowPct: 70 })),
);
const standardArb = fc.option(fc.record({ sessionsWindow: windowArb, stepDown: stepDownArb }), { nil: null });

async function setStandard(teamId: string, rungId: string, own: { sessionsWindow: number; stepDown: StepDownRule | null } | null) {
  await db.delete(standards).where(eq(standards.rungId, rungId));
  if (!own) return;
  const standard = {
    ...defaultStandard("hold_seconds"),
    sessionsRequired: Math.min(2, own.sessionsWindow),
    sessionsWindow: own.sessionsWindow,
    // fast-check builds records without a prototype; Drizzle wants a plain object.
    stepDown: own.stepDown && { ...own.stepDown },
  };
  await db.insert(standards).values({ rungId, teamId, ...standardRow(standard) });
}

describe("a context read before a log's inserts, plus its entries", () => {
  let teamId: string;
  let ladder: TestLadder;
  beforeAll(async () => {
    ({ teamId } = await createTeam());
    ladder = await createTestLadder(teamId, { mode: "auto" });
  });

  it("equals PostgreSQL's read of the same position after them, whose verdict is the whole history's", async () => {
    await fc.assert(
      fc.asyncProperty(
        standardArb,
        fc.integer({ min: 0, max: OLDEST }),
        history,
        fc.record({ daysAgo: fc.integer({ min: -2, max: OLDEST }), entries: fc.array(fc.record({ pain: fc.boolean(), good: fc.boolean() }), { minLength: 1, maxLength: 3 }) }),
        async (standard, sinceDaysAgo, sessions, log) => {
          const asOf = new Date();
          const athleteId = await createAthleteRecord(teamId, "Context Athlete");
          const rungId = ladder.rungIds[0]!;
          await setStandard(teamId, rungId, standard);
          const positionId = await placeAthlete(teamId, athleteId, ladder, rungId, daysAgo(sinceDaysAgo, asOf));
          const where = { teamId, athleteId, ladderId: ladder.ladderId, rungId };
          for (const s of sessions) {
            const entry = { ...where, date: daysAgo(s.daysAgo, asOf), pain: s.pain, sets: s.good ? GOOD_SETS : WEAK_SETS };
            await insertSession(db, entry);
            if (s.twice) await insertSession(db, { ...entry, pain: false });
          }

          const before = await loadPositionContext(db, { positionId, teamId, asOf });
          const date = daysAgo(log.daysAgo, asOf);
          const added = log.entries.map((e) => ({ date, pain: e.pain, sets: e.good ? GOOD_SETS : WEAK_SETS }));
          for (const e of added) await insertSession(db, { ...where, ...e });
          const after = await loadPositionContext(db, { positionId, teamId, asOf });

          expect(contextWithEntries(before!, added, asOf)).toEqual(after);
          const all = await loadPositionContext(db, { positionId, teamId, asOf, history: "all" });
          expect(judgePosition(after!, asOf).verdict).toEqual(judgePosition(all!, asOf).verdict);
        },
      ),
      { numRuns: 150 },
    );
  }, 240_000);
});

describe("POST /api/v1/logs verdicts", () => {
  /** The parts of a verdict a fresh read after the post must agree on. */
  const judged = (v: VerdictDto) => ({ rungId: v.rungId, status: v.status, readiness: v.readiness, clauses: v.clauses, explanation: v.explanation });

  it("match a fresh read after each post, log by log, up to and past a promotion", async () => {
    const { teamId, owner } = await createTeam();
    const { actor } = await createMember(teamId, "athlete", "Verdict Athlete");
    const athleteId = actor.athleteId!;
    const token = await bearerFor(actor);
    const ladder = await createTestLadder(teamId, { mode: "auto" });
    await placeAthlete(teamId, athleteId, ladder, ladder.rungIds[0]!, daysAgo(30));
    // Weak, then painful, then good sessions: readiness rises until the standard is met.
    const plan = [
      { daysAgo: 12, sets: WEAK_SETS, pain: false },
      { daysAgo: 10, sets: GOOD_SETS, pain: true },
      { daysAgo: 8, sets: GOOD_SETS, pain: false },
      { daysAgo: 8, sets: WEAK_SETS, pain: false },
      { daysAgo: 5, sets: GOOD_SETS, pain: false },
    ];
    for (const step of plan) {
      const rungId = (await db.select({ rungId: athletePositions.rungId }).from(athletePositions).where(eq(athletePositions.athleteId, athleteId)))[0]!.rungId;
      const response = await postLogAs(token, { performedOn: daysAgo(step.daysAgo), entries: [{ rungId, sets: step.sets, pain: step.pain }] });
      expect(response.status).toBe(201);
      const answered = (response.data.verdicts as VerdictDto[])[0]!;
      const fresh = await getPositionVerdict(owner, { athleteId, ladderId: ladder.ladderId });
      if (answered.promotedTo) {
        // The move happened: the fresh read is of the next rung, and the answer names it.
        expect(answered.status).toBe("met");
        expect(fresh.rungId).toBe(answered.promotedTo);
      } else {
        expect(judged(answered)).toEqual(judged(fresh));
      }
    }
    // The last good session met the standard (two of the last three good, pain-free): promoted once.
    const [position] = await db.select().from(athletePositions).where(eq(athletePositions.athleteId, athleteId));
    expect(position!.rungId).toBe(ladder.rungIds[1]);

    // A warm-up on the rung below in the same post counts for nothing on the new rung.
    const [easier, current] = [ladder.rungIds[0]!, ladder.rungIds[1]!];
    const warmUp = await postLogAs(token, {
      performedOn: daysAgo(3),
      entries: [
        { rungId: easier, sets: GOOD_SETS, pain: false },
        { rungId: current, sets: WEAK_SETS, pain: false },
      ],
    });
    expect(warmUp.status).toBe(201);
    const [verdict] = warmUp.data.verdicts as VerdictDto[];
    expect(verdict!.rungId).toBe(current);
    expect(judged(verdict!)).toEqual(judged(await getPositionVerdict(owner, { athleteId, ladderId: ladder.ladderId })));
  });
});
