import "server-only";
import { and, eq, type SQL } from "drizzle-orm";
import { athletes } from "@/db/schema";
import { isStaff } from "@/lib/permissions";
import type { Actor } from "@/lib/server/actor";

/**
 * The athletes an actor may see, as a WHERE clause: the whole team for owners and coaches, only
 * their own record for an athlete (no record at all when the account is not linked).
 */
export function visibleAthletes(actor: Actor): SQL {
  const team = eq(athletes.teamId, actor.teamId);
  if (isStaff(actor.role)) return team;
  return and(team, eq(athletes.id, actor.athleteId ?? "00000000-0000-0000-0000-000000000000"))!;
}
