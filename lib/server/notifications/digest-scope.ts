import "server-only";
import { and, eq, isNull, or } from "drizzle-orm";
import type { Queryable } from "@/db/client";
import { athletes, teams, users } from "@/db/schema";

/**
 * The athletes a coach's digest covers: those whose primary coach they are; the owner also gets the
 * athletes without a primary coach, so nobody falls through.
 */
export async function digestAthletes(q: Queryable, teamId: string, userId: string) {
  const [person] = await q
    .select({ name: users.name, role: users.role, teamName: teams.name, timeZone: teams.timeZone })
    .from(users)
    .innerJoin(teams, eq(teams.id, users.teamId))
    .where(and(eq(users.id, userId), eq(users.teamId, teamId)));
  if (!person) return null;
  const mine = eq(athletes.primaryCoachId, userId);
  const rows = await q
    .select({ id: athletes.id, name: athletes.name })
    .from(athletes)
    .where(
      and(
        eq(athletes.teamId, teamId),
        isNull(athletes.archivedAt),
        person.role === "owner" ? or(mine, isNull(athletes.primaryCoachId)) : mine,
      ),
    )
    .orderBy(athletes.name);
  return { person, athletes: rows };
}
