import "server-only";
import { and, asc, eq, isNull } from "drizzle-orm";
import { db } from "@/db/client";
import { athletePositions, athletes, dailyEvaluations, teams } from "@/db/schema";
import { localDateOf } from "@/lib/engine";
import { evaluatePosition } from "@/lib/server/promotions/evaluate-position";

export interface DailyResult {
  teamId: string;
  localDate: string;
  evaluated: number;
  promoted: number;
  pending: number;
}

/**
 * Once per team and local date: re-evaluates positions still "not yet" (the clause that can turn true
 * with no new log is days on the rung) through the same operation as a log, so promotions, pending
 * approvals and their notices follow the same rules. The (team, date) row is claimed in the same
 * transaction as the evaluation, so a second tick or a restart after a crash does the day once.
 */
export async function runDailyEvaluation(teamId: string, now: Date): Promise<DailyResult | null> {
  return db.transaction(async (tx) => {
    const [team] = await tx.select({ timeZone: teams.timeZone }).from(teams).where(eq(teams.id, teamId));
    if (!team) return null;
    const localDate = localDateOf(now, team.timeZone);
    const claimed = await tx
      .insert(dailyEvaluations)
      .values({ teamId, localDate })
      .onConflictDoNothing()
      .returning({ teamId: dailyEvaluations.teamId });
    if (claimed.length === 0) return null;
    const positions = await tx
      .select({ id: athletePositions.id })
      .from(athletePositions)
      .innerJoin(athletes, eq(athletes.id, athletePositions.athleteId))
      .where(and(eq(athletePositions.teamId, teamId), eq(athletePositions.status, "not_yet"), isNull(athletes.archivedAt)))
      .orderBy(asc(athletePositions.ladderId), asc(athletePositions.id));
    const result: DailyResult = { teamId, localDate, evaluated: 0, promoted: 0, pending: 0 };
    for (const position of positions) {
      const verdict = await evaluatePosition(tx, { positionId: position.id, asOf: now, actor: "system" });
      result.evaluated += 1;
      if (verdict.promotedTo || verdict.achieved) result.promoted += 1;
      else if (verdict.pendingPromotionId) result.pending += 1;
    }
    await tx
      .update(dailyEvaluations)
      .set({ result: { ...result } })
      .where(and(eq(dailyEvaluations.teamId, teamId), eq(dailyEvaluations.localDate, localDate)));
    return result;
  });
}

/**
 * The scheduler tick: every team whose local date has no evaluation yet. `shouldStop` is asked
 * between teams, so a worker shutting down finishes the team at hand and leaves the rest to the
 * next tick (each team's day is claimed in its own transaction, so nothing is done twice).
 */
export async function runDailyEvaluations(now: Date, shouldStop: () => boolean = () => false): Promise<DailyResult[]> {
  const all = await db.select({ id: teams.id }).from(teams);
  const results: DailyResult[] = [];
  for (const team of all) {
    if (shouldStop()) break;
    const result = await runDailyEvaluation(team.id, now);
    if (result) results.push(result);
  }
  return results;
}
