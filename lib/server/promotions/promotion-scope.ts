import "server-only";
import { and, eq, type SQL } from "drizzle-orm";
import { promotions } from "@/db/schema";
import { isStaff } from "@/lib/permissions";
import type { Actor } from "@/lib/server/actor";

const NO_ATHLETE = "00000000-0000-0000-0000-000000000000";

/** The promotions an actor may see: the team's for staff, only their own for an athlete. */
export function visiblePromotions(actor: Actor): SQL {
  const team = eq(promotions.teamId, actor.teamId);
  if (isStaff(actor.role)) return team;
  return and(team, eq(promotions.athleteId, actor.athleteId ?? NO_ATHLETE))!;
}
