import "server-only";
import { and, eq } from "drizzle-orm";
import type { Queryable } from "@/db/client";
import { athletes } from "@/db/schema";
import { NotFound, invalidField } from "@/lib/errors";
import { isStaff } from "@/lib/permissions";
import type { Actor } from "@/lib/server/actor";

/**
 * Whose log this is: an athlete logs for themselves (athleteId omitted or their own; anyone else is
 * simply not found); staff must name an athlete of their team.
 */
export async function logAthleteOf(q: Queryable, actor: Actor, athleteId: string | undefined): Promise<string> {
  if (!isStaff(actor.role)) {
    if (!actor.athleteId || (athleteId !== undefined && athleteId !== actor.athleteId)) throw new NotFound("athlete");
    return actor.athleteId;
  }
  if (!athleteId) throw invalidField("athleteId", "Choose the athlete this log is for.");
  const [row] = await q
    .select({ id: athletes.id })
    .from(athletes)
    .where(and(eq(athletes.id, athleteId), eq(athletes.teamId, actor.teamId)));
  if (!row) throw new NotFound("athlete");
  return row.id;
}
