import "server-only";
import { NotFound, invalidField } from "@/lib/errors";
import { isStaff } from "@/lib/permissions";
import type { Actor } from "@/lib/server/actor";

/**
 * Whose log this is: an athlete logs for themselves (athleteId omitted or their own; anyone else is
 * simply not found); staff must name an athlete. That the named athlete is of the staff member's
 * team is proved by logRungsOf, which only finds positions of this team (and answers 404 otherwise).
 */
export function logAthleteOf(actor: Actor, athleteId: string | undefined): string {
  if (!isStaff(actor.role)) {
    if (!actor.athleteId || (athleteId !== undefined && athleteId !== actor.athleteId)) throw new NotFound("athlete");
    return actor.athleteId;
  }
  if (!athleteId) throw invalidField("athleteId", "Choose the athlete this log is for.");
  return athleteId;
}
