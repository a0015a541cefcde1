import "server-only";
import { and, eq, inArray } from "drizzle-orm";
import type { Queryable } from "@/db/client";
import { users } from "@/db/schema";
import { invalidField } from "@/lib/errors";

/** A primary coach must be an owner or coach of the same team. */
export async function assertCoachInTeam(q: Queryable, teamId: string, coachId: string): Promise<void> {
  const [coach] = await q
    .select({ id: users.id })
    .from(users)
    .where(and(eq(users.id, coachId), eq(users.teamId, teamId), inArray(users.role, ["owner", "coach"])));
  if (!coach) throw invalidField("primaryCoachId", "Choose a coach of this team.");
}
