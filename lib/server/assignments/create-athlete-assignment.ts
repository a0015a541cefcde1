import "server-only";
import { and, eq, isNull } from "drizzle-orm";
import { db } from "@/db/client";
import { athletes } from "@/db/schema";
import { NotFound } from "@/lib/errors";
import type { Actor } from "@/lib/server/actor";
import type { CreateAssignmentInput } from "@/lib/validation/plans";
import { assignPlan } from "./assign-plan";

/** Gives a plan to one athlete of the team (placements and assignment in one transaction). */
export async function createAthleteAssignment(actor: Actor, athleteId: string, input: CreateAssignmentInput) {
  return db.transaction(async (tx) => {
    const [athlete] = await tx
      .select({ id: athletes.id })
      .from(athletes)
      .where(and(eq(athletes.id, athleteId), eq(athletes.teamId, actor.teamId), isNull(athletes.archivedAt)));
    if (!athlete) throw new NotFound("athlete");
    const [assignment] = await assignPlan(tx, actor, [athlete.id], input, null);
    return assignment!;
  });
}
