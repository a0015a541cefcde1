import "server-only";
import { and, eq } from "drizzle-orm";
import type { Tx } from "@/db/client";
import { promotions } from "@/db/schema";
import { Conflict, NotFound } from "@/lib/errors";
import type { Actor } from "@/lib/server/actor";
import { loadPositionContext, type PositionContext } from "./load-position-context";

/**
 * Locks a promotion for a coach's decision: its position first, then the promotion row (the order
 * the engine uses too), and checks it still waits. A second decision answers 409.
 */
export async function lockPendingPromotion(tx: Tx, actor: Actor, promotionId: string) {
  const scope = and(eq(promotions.id, promotionId), eq(promotions.teamId, actor.teamId));
  const [found] = await tx.select({ positionId: promotions.positionId }).from(promotions).where(scope);
  if (!found) throw new NotFound("promotion");
  const ctx = await loadPositionContext(tx, { positionId: found.positionId, teamId: actor.teamId, lock: true });
  if (!ctx) throw new NotFound("promotion");
  const [promotion] = await tx
    .select({
      id: promotions.id,
      status: promotions.status,
      direction: promotions.direction,
      fromRungId: promotions.fromRungId,
      toRungId: promotions.toRungId,
      effectiveOn: promotions.effectiveOn,
      verdict: promotions.verdict,
    })
    .from(promotions)
    .where(scope)
    .for("update");
  if (!promotion) throw new NotFound("promotion");
  if (promotion.status !== "pending") {
    throw new Conflict(`This proposal was already ${promotion.status === "auto" ? "applied by the engine" : promotion.status}.`);
  }
  return { promotion, ctx: ctx satisfies PositionContext };
}
