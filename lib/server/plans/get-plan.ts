import "server-only";
import { and, eq } from "drizzle-orm";
import { db, type Queryable } from "@/db/client";
import { plans } from "@/db/schema";
import { NotFound } from "@/lib/errors";
import type { Actor } from "@/lib/server/actor";
import { planColumns, toPlanDtos } from "./plan-dto";

/** One plan of the actor's team; 404 for another team's. */
export async function getPlan(actor: Actor, planId: string, q: Queryable = db) {
  const rows = await q.select(planColumns).from(plans).where(and(eq(plans.id, planId), eq(plans.teamId, actor.teamId)));
  const [plan] = await toPlanDtos(q, actor.teamId, rows);
  if (!plan) throw new NotFound("plan");
  return plan;
}
