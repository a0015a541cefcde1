import "server-only";
import { and, eq, type SQL } from "drizzle-orm";
import { uploads } from "@/db/schema";
import { isStaff } from "@/lib/permissions";
import type { Actor } from "@/lib/server/actor";

const NO_ATHLETE = "00000000-0000-0000-0000-000000000000";

/** Uploads an actor may touch: the team's for staff, their own athlete record's for an athlete. */
export function visibleUploads(actor: Actor): SQL {
  const team = eq(uploads.teamId, actor.teamId);
  if (isStaff(actor.role)) return team;
  return and(team, eq(uploads.athleteId, actor.athleteId ?? NO_ATHLETE))!;
}
