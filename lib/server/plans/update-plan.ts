import "server-only";
import { and, eq } from "drizzle-orm";
import { db } from "@/db/client";
import { plans } from "@/db/schema";
import { NotFound } from "@/lib/errors";
import type { Actor } from "@/lib/server/actor";
import type { UpdatePlanInput } from "@/lib/validation/plans";
import { getPlan } from "./get-plan";
import { writeDays } from "./write-days";

const orNull = (text: string | null | undefined) => (text === undefined ? undefined : text || null);

/**
 * Changes a plan of the actor's team; `days`, when sent, replaces the week. Assignments follow the
 * plan, so athletes see the change from their next session on.
 */
export async function updatePlan(actor: Actor, planId: string, input: UpdatePlanInput) {
  return db.transaction(async (tx) => {
    const updated = await tx
      .update(plans)
      .set({ name: input.name, weeks: input.weeks, warmUp: orNull(input.warmUp), coolDown: orNull(input.coolDown), updatedAt: new Date() })
      .where(and(eq(plans.id, planId), eq(plans.teamId, actor.teamId)))
      .returning({ id: plans.id });
    if (updated.length === 0) throw new NotFound("plan");
    if (input.days) await writeDays(tx, actor.teamId, planId, input.days);
    return getPlan(actor, planId, tx);
  });
}
