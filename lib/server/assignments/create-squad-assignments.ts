import "server-only";
import { and, asc, eq, isNull } from "drizzle-orm";
import { db } from "@/db/client";
import { athletes, squadMembers, squads } from "@/db/schema";
import { NotFound, Unprocessable } from "@/lib/errors";
import type { Actor } from "@/lib/server/actor";
import type { CreateAssignmentInput } from "@/lib/validation/plans";
import { assignPlan } from "./assign-plan";

/**
 * Gives a plan to every current member of a squad: one assignment per athlete (archived athletes
 * skipped), all or nothing. Later members do not inherit it; assign again to include them.
 */
export async function createSquadAssignments(actor: Actor, squadId: string, input: CreateAssignmentInput) {
  return db.transaction(async (tx) => {
    const [squad] = await tx
      .select({ id: squads.id })
      .from(squads)
      .where(and(eq(squads.id, squadId), eq(squads.teamId, actor.teamId), isNull(squads.archivedAt)));
    if (!squad) throw new NotFound("squad");
    const members = await tx
      .select({ id: athletes.id })
      .from(squadMembers)
      .innerJoin(athletes, eq(athletes.id, squadMembers.athleteId))
      .where(and(eq(squadMembers.squadId, squad.id), eq(athletes.teamId, actor.teamId), isNull(athletes.archivedAt)))
      .orderBy(asc(athletes.name), asc(athletes.id));
    if (members.length === 0) throw new Unprocessable("This squad has no members yet. Add athletes to it first.");
    const items = await assignPlan(tx, actor, members.map((m) => m.id), input, squad.id);
    return { items };
  });
}
