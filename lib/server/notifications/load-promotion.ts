import "server-only";
import { and, eq } from "drizzle-orm";
import { alias } from "drizzle-orm/pg-core";
import type { Queryable } from "@/db/client";
import { athletes, ladders, promotions, rungs, users } from "@/db/schema";
import { explainVerdict, type Verdict } from "@/lib/engine";

const fromRung = alias(rungs, "from_rung");
const toRung = alias(rungs, "to_rung");
const athleteUser = alias(users, "athlete_user");
const coach = alias(users, "coach");

function explanationOf(verdict: unknown): string | null {
  const v = verdict as Partial<Verdict> | null;
  if (!v || typeof v.status !== "string" || !Array.isArray(v.clauses)) return null;
  try {
    return explainVerdict(v as Verdict);
  } catch {
    return null;
  }
}

/** A promotion with the names and addresses its notices need. */
export async function loadPromotion(q: Queryable, promotionId: string, teamId: string) {
  const [row] = await q
    .select({
      id: promotions.id,
      teamId: promotions.teamId,
      status: promotions.status,
      direction: promotions.direction,
      athleteId: athletes.id,
      athleteName: athletes.name,
      athleteEmail: athletes.email,
      athleteUserEmail: athleteUser.email,
      coachId: coach.id,
      coachName: coach.name,
      coachEmail: coach.email,
      ladderName: ladders.name,
      fromRungName: fromRung.name,
      toRungName: toRung.name,
      cues: toRung.cues,
      caution: toRung.caution,
      verdict: promotions.verdict,
    })
    .from(promotions)
    .innerJoin(athletes, eq(athletes.id, promotions.athleteId))
    .leftJoin(athleteUser, eq(athleteUser.id, athletes.userId))
    .leftJoin(coach, eq(coach.id, athletes.primaryCoachId))
    .innerJoin(ladders, eq(ladders.id, promotions.ladderId))
    .innerJoin(fromRung, eq(fromRung.id, promotions.fromRungId))
    .leftJoin(toRung, eq(toRung.id, promotions.toRungId))
    .where(and(eq(promotions.id, promotionId), eq(promotions.teamId, teamId)));
  if (!row) return null;
  const { athleteUserEmail, verdict, ...rest } = row;
  return { ...rest, athleteEmail: athleteUserEmail ?? row.athleteEmail, explanation: explanationOf(verdict) };
}

export type LoadedPromotion = NonNullable<Awaited<ReturnType<typeof loadPromotion>>>;
