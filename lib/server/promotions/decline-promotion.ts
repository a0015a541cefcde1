import "server-only";
import { eq } from "drizzle-orm";
import { db } from "@/db/client";
import { promotions } from "@/db/schema";
import type { Actor } from "@/lib/server/actor";
import { evaluatePosition } from "./evaluate-position";
import { getPromotion } from "./get-promotion";
import { lockPendingPromotion } from "./lock-pending-promotion";

/**
 * A coach declines a pending proposal: the athlete stays where they are. The engine proposes the
 * same move again only after a new session (see evaluatePosition).
 */
export async function declinePromotion(actor: Actor, promotionId: string, asOf: Date = new Date()) {
  await db.transaction(async (tx) => {
    const { promotion, ctx } = await lockPendingPromotion(tx, actor, promotionId);
    await tx
      .update(promotions)
      .set({ status: "declined", decidedById: actor.userId, decidedAt: new Date() })
      .where(eq(promotions.id, promotion.id));
    await evaluatePosition(tx, { positionId: ctx.position.id, asOf, actor });
  });
  return getPromotion(actor, promotionId);
}
