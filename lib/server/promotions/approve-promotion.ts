import "server-only";
import { and, eq, isNull } from "drizzle-orm";
import { db } from "@/db/client";
import { promotions, rungs } from "@/db/schema";
import { Conflict } from "@/lib/errors";
import type { Actor } from "@/lib/server/actor";
import { enqueueNotice } from "@/lib/server/notifications/enqueue-notice";
import { evaluatePosition } from "./evaluate-position";
import { getPromotion } from "./get-promotion";
import { lockPendingPromotion } from "./lock-pending-promotion";
import { movePosition } from "./move-position";

/**
 * A coach approves a pending proposal in one click: the athlete moves (since = the proposal's
 * effective date) only if they still stand on the rung it was made for; the last rung's proposal
 * achieves the skill. Writes the audit row, then re-evaluates the position on its new rung.
 */
export async function approvePromotion(actor: Actor, promotionId: string, asOf: Date = new Date()) {
  await db.transaction(async (tx) => {
    const { promotion, ctx } = await lockPendingPromotion(tx, actor, promotionId);
    if (ctx.position.rungId !== promotion.fromRungId) {
      throw new Conflict(
        `${ctx.position.athleteName} is no longer on the rung this proposal was made for (now on ${ctx.rung.name}). Decline it instead.`,
      );
    }
    if (promotion.toRungId) {
      const [target] = await tx
        .select({ id: rungs.id })
        .from(rungs)
        .where(and(eq(rungs.id, promotion.toRungId), isNull(rungs.archivedAt)));
      if (!target) throw new Conflict("The rung this proposal moves to has been archived. Decline it instead.");
    }
    const decidedAt = new Date();
    await tx.update(promotions).set({ status: "approved", decidedById: actor.userId, decidedAt }).where(eq(promotions.id, promotion.id));
    await movePosition(tx, {
      positionId: ctx.position.id,
      teamId: ctx.position.teamId,
      athleteId: ctx.position.athleteId,
      ladderId: ctx.ladder.id,
      fromRungId: promotion.fromRungId,
      toRungId: promotion.toRungId,
      effectiveOn: promotion.effectiveOn,
      cause: promotion.direction === "down" ? "step_down" : "approved",
      actorUserId: actor.userId,
      promotionId: promotion.id,
      verdict: promotion.verdict,
      at: decidedAt,
    });
    await enqueueNotice(tx, { kind: "promotion", promotionId: promotion.id });
    await evaluatePosition(tx, { positionId: ctx.position.id, asOf, actor });
  });
  return getPromotion(actor, promotionId);
}
