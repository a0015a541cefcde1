// Rows the mail tests need: a starter ladder's first rungs, placements, promotions and log entries.
import { and, asc, eq, gt } from "drizzle-orm";
import { db } from "@/db/client";
import { athletePositions, athletes, ladders, logEntries, logs, promotions, rungs } from "@/db/schema";

/** The team's first starter ladder (by name) and its first three rungs. */
export async function firstLadder(teamId: string) {
  const [ladder] = await db.select({ id: ladders.id, name: ladders.name }).from(ladders).where(eq(ladders.teamId, teamId)).orderBy(asc(ladders.name)).limit(1);
  if (!ladder) throw new Error("the team has no ladders");
  const steps = await db
    .select({ id: rungs.id, name: rungs.name, cues: rungs.cues, caution: rungs.caution })
    .from(rungs)
    .where(and(eq(rungs.ladderId, ladder.id), gt(rungs.position, 0)))
    .orderBy(asc(rungs.position))
    .limit(3);
  return { ladder, rungs: steps };
}

export async function setPrimaryCoach(athleteId: string, coachUserId: string) {
  await db.update(athletes).set({ primaryCoachId: coachUserId }).where(eq(athletes.id, athleteId));
}

export async function placeAthlete(input: { teamId: string; athleteId: string; ladderId: string; rungId: string; since: string }) {
  const [row] = await db.insert(athletePositions).values(input).returning({ id: athletePositions.id });
  return row!.id;
}

export async function seedPromotion(input: {
  teamId: string;
  athleteId: string;
  ladderId: string;
  positionId: string;
  fromRungId: string;
  toRungId: string | null;
  status: "pending" | "approved" | "auto" | "declined";
  effectiveOn: string;
}) {
  const [row] = await db
    .insert(promotions)
    .values({ ...input, verdict: { status: "met", clauses: [], readiness: 100, stepDown: null, waitingFor: [], daysOnRung: 9, lastSessionDate: input.effectiveOn, sessionsMet: 2 } })
    .returning({ id: promotions.id });
  return row!.id;
}

export async function logSession(input: { teamId: string; athleteId: string; ladderId: string; rungId: string; performedOn: string; pain?: boolean }) {
  const [log] = await db
    .insert(logs)
    .values({ teamId: input.teamId, athleteId: input.athleteId, performedOn: input.performedOn })
    .returning({ id: logs.id });
  await db.insert(logEntries).values({
    teamId: input.teamId,
    logId: log!.id,
    athleteId: input.athleteId,
    ladderId: input.ladderId,
    rungId: input.rungId,
    performedOn: input.performedOn,
    sets: [{ value: 20, rpe: 7 }],
    bestValue: 20,
    pain: input.pain ?? false,
  });
}
