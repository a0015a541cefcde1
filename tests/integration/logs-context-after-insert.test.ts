// A log judges its positions from the context read with its locks plus the entries it writes
// (contextWithEntries), not from a second read after its inserts. These pin that the two agree:
// the JS rule against PostgreSQL's own read of the same rows, over random histories (fast-check),
// and the verdicts POST /api/v1/logs answers against a fresh read after each post.
// Standards are the default hold standard (3 × ≥ 20 s at RPE ≤ 7, 2 of the last 3 sessions,
// ≥ 7 days on the rung, pain-free): common practice, no source.
import { eq } from "drizzle-orm";
import fc from "fast-check";
import { beforeAll, describe, expect, it } from "vitest";
import { db } from "@/db/client";
import { athletePositions } from "@/db/schema";
import type { VerdictDto } from "@/lib/validation/verdicts";
import { getPositionVerdict } from "@/lib/server/promotions/get-position-verdict";
import { contextWithEntries } from "@/lib/server/promotions/context-with-entries";
import { loadPositionContext, RECENT_DATES } from "@/lib/server/promotions/load-position-context";
import { bearerFor, createAthleteRecord, createMember, createTeam } from "../support/factories";
import { createTestLadder, daysAgo, GOOD_SETS, insertSession, placeAthlete, WEAK_SETS, type TestLadder } from "../support/log-factories";
import { postLogAs } from "../support/logging-factories";

// Dates from past the horizon (the UTC date plus one) to before the position's date; a date
// logged twice now and then. Half the histories are short, half hold more dates than the window.
const OLDEST = RECENT_DATES + 14;
const historyOf = (minLength: number, maxLength: number) =>
  fc.uniqueArray(
    fc.record({ daysAgo: fc.integer({ min: -3, max: OLDEST }), pain: fc.boolean(), good: fc.boolean(), twice: fc.boolean() }),
    { selector: (s) => s.daysAgo, minLength, maxLength },
  );
const history = fc.oneof(historyOf(0, 8), historyOf(RECENT_DATES, RECENT_DATES + 12));

describe("a context read before a log's inserts, plus its entries", () => {
  let teamId: string;
  let ladder: TestLadder;
  beforeAll(async () => {
    ({ teamId } = await createTeam());
    ladder = await createTestLadder(teamId, { mode: "auto" });
  });

  it("equals PostgreSQL's read of the same position after them", async () => {
    await fc.assert(
      fc.asyncProperty(
        fc.integer({ min: 0, max: OLDEST }),
        history,
        fc.record({ daysAgo: fc.integer({ min: -2, max: OLDEST }), entries: fc.array(fc.record({ pain: fc.boolean(), good: fc.boolean() }), { minLength: 1, maxLength: 3 }) }),
        async (sinceDaysAgo, sessions, log) => {
          const asOf = new Date();
          const athleteId = await createAthleteRecord(teamId, "Context Athlete");
          const rungId = ladder.rungIds[0]!;
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
        },
      ),
      { numRuns: 60 },
    );
  }, 120_000);
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
