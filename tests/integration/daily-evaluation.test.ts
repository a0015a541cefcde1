// The daily job (issue: daily re-evaluation) promotes, through the same code path as a log, an
// athlete whose only missing clause was days on the rung — once per team and local date.
import { and, eq } from "drizzle-orm";
import { describe, expect, it } from "vitest";
import { db } from "@/db/client";
import { athletePositions, positionMoves, promotions } from "@/db/schema";
import { runDailyEvaluation } from "@/lib/server/jobs/run-daily-evaluations";
import { createAthleteRecord, createTeam } from "../support/factories";
import { createTestLadder, daysAgo, logAndEvaluate, placeAthlete } from "../support/log-factories";
import { drainQueue } from "../support/queue";

describe("daily re-evaluation", () => {
  it("promotes once the days on the rung come true, exactly once per team and day", async () => {
    // Default hold standard (common practice, no source): 2 of the last 3 sessions, ≥ 7 days on the rung.
    const { teamId, owner } = await createTeam();
    const athleteId = await createAthleteRecord(teamId, "Dara Penn");
    const ladder = await createTestLadder(teamId, { mode: "auto" });
    const positionId = await placeAthlete(teamId, athleteId, ladder, ladder.rungIds[0]!, daysAgo(5));
    for (const n of [3, 1]) {
      await logAndEvaluate(owner, { teamId, athleteId, ladderId: ladder.ladderId, rungId: ladder.rungIds[0]!, date: daysAgo(n) });
    }
    const [before] = await db.select().from(athletePositions).where(eq(athletePositions.id, positionId));
    expect(before).toMatchObject({ rungId: ladder.rungIds[0], status: "not_yet" }); // 5 days on the rung, 7 needed

    // Today the days clause is still short: the job evaluates and changes nothing.
    const today = await runDailyEvaluation(teamId, new Date());
    expect(today).toMatchObject({ promoted: 0 });

    // Three days later it is true: one promotion, one audit row, since = the last session's date.
    const later = new Date(Date.now() + 3 * 86_400_000);
    const first = await runDailyEvaluation(teamId, later);
    expect(first).toMatchObject({ promoted: 1 });
    const again = await runDailyEvaluation(teamId, later);
    expect(again).toBeNull(); // the (team, local date) run is claimed once

    const [after] = await db.select().from(athletePositions).where(eq(athletePositions.id, positionId));
    expect(after).toMatchObject({ rungId: ladder.rungIds[1], since: daysAgo(1) });
    const applied = await db
      .select()
      .from(promotions)
      .where(and(eq(promotions.positionId, positionId), eq(promotions.status, "auto")));
    expect(applied).toHaveLength(1);
    const moves = await db.select().from(positionMoves).where(and(eq(positionMoves.athleteId, athleteId), eq(positionMoves.cause, "auto")));
    expect(moves).toHaveLength(1);
    expect(moves[0]!.actorKind).toBe("system");
    await drainQueue(); // the notice goes through the queue like a log's (no address here: nothing to send)
  });
});
