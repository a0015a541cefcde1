import "server-only";
import { and, eq, type SQL } from "drizzle-orm";
import { formChecks } from "@/db/schema";
import { isStaff } from "@/lib/permissions";
import type { Actor } from "@/lib/server/actor";

const NO_ATHLETE = "00000000-0000-0000-0000-000000000000";

/** Form checks an actor may see: the team's for owner and coaches, only their own for an athlete. */
export function visibleFormChecks(actor: Actor): SQL {
  const team = eq(formChecks.teamId, actor.teamId);
  if (isStaff(actor.role)) return team;
  return and(team, eq(formChecks.athleteId, actor.athleteId ?? NO_ATHLETE))!;
}
