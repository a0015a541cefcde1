import "server-only";
import { and, eq } from "drizzle-orm";
import { db } from "@/db/client";
import { athletePositions, positionMoves, promotions } from "@/db/schema";
import { localDateOf } from "@/lib/engine";
import { Conflict } from "@/lib/errors";
import type { Actor } from "@/lib/server/actor";
import { enqueueNotice } from "@/lib/server/notifications/enqueue-notice";

/**
 * The one place the approve link reaches the promotions domain. Interim body until the promotions
 * integration lands its decide operation: then this becomes a one-line call to it (same contract:
 * approve a pending promotion of the actor's team, Conflict when it is no longer pending).
 */
export async function approvePromotion(actor: Actor, promotionId: string): Promise<void> {
  await db.transaction(async (tx) => {
    const [promotion] = await tx
      .update(promotions)
      .set({ status: "approved", decidedById: actor.userId, decidedAt: new Date() })
      .where(and(eq(promotions.id, promotionId), eq(promotions.teamId, actor.teamId), eq(promotions.status, "pending")))
      .returning();
    if (!promotion) throw new Conflict("This promotion was already decided.");
    const today = localDateOf(new Date(), actor.timeZone);
    await tx
      .update(athletePositions)
      .set(
        promotion.toRungId
          ? { rungId: promotion.toRungId, since: today, status: "not_yet", readiness: 0, sessionsMet: 0 }
          : { status: "achieved", achievedAt: new Date() },
      )
      .where(and(eq(athletePositions.id, promotion.positionId), eq(athletePositions.teamId, actor.teamId)));
    await tx.insert(positionMoves).values({
      teamId: actor.teamId,
      athleteId: promotion.athleteId,
      ladderId: promotion.ladderId,
      fromRungId: promotion.fromRungId,
      toRungId: promotion.toRungId,
      cause: promotion.direction === "down" ? "step_down" : "approved",
      actorUserId: actor.userId,
      promotionId: promotion.id,
      verdict: promotion.verdict,
      effectiveOn: today,
    });
    if (promotion.direction === "up") await enqueueNotice(tx, { kind: "promotion", promotionId: promotion.id });
  });
}
