import "server-only";
import { and, eq } from "drizzle-orm";
import { db } from "@/db/client";
import { assignments, plans } from "@/db/schema";
import { NotFound } from "@/lib/errors";
import type { Actor } from "@/lib/server/actor";

/**
 * Removes a plan from the team's list. A plan that was ever assigned is archived instead (its
 * assignments keep running and keep their history; it can no longer be assigned); an unassigned
 * plan is deleted with its week. Either way the answer is 204.
 */
export async function deletePlan(actor: Actor, planId: string): Promise<void> {
  await db.transaction(async (tx) => {
    const [plan] = await tx
      .select({ id: plans.id })
      .from(plans)
      .where(and(eq(plans.id, planId), eq(plans.teamId, actor.teamId)))
      .for("update");
    if (!plan) throw new NotFound("plan");
    const [used] = await tx
      .select({ id: assignments.id })
      .from(assignments)
      .where(and(eq(assignments.planId, planId), eq(assignments.teamId, actor.teamId)))
      .limit(1);
    if (used) await tx.update(plans).set({ archivedAt: new Date() }).where(eq(plans.id, planId));
    else await tx.delete(plans).where(eq(plans.id, planId));
  });
}
