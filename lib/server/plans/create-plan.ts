import "server-only";
import { db } from "@/db/client";
import { plans } from "@/db/schema";
import type { Actor } from "@/lib/server/actor";
import type { CreatePlanInput } from "@/lib/validation/plans";
import { getPlan } from "./get-plan";
import { writeDays } from "./write-days";

/** A new plan with its week of blocks, in one transaction. */
export async function createPlan(actor: Actor, input: CreatePlanInput) {
  return db.transaction(async (tx) => {
    const [row] = await tx
      .insert(plans)
      .values({ teamId: actor.teamId, name: input.name, weeks: input.weeks, warmUp: input.warmUp || null, coolDown: input.coolDown || null })
      .returning({ id: plans.id });
    await writeDays(tx, actor.teamId, row!.id, input.days);
    return getPlan(actor, row!.id, tx);
  });
}
