import "server-only";
import { and, eq, gte, sql } from "drizzle-orm";
import type { Queryable, Tx } from "@/db/client";
import { promotions } from "@/db/schema";
import type { PositionContext } from "./load-position-context";
import type { StoredVerdict } from "./verdict-dto";

export interface PromotionDraft {
  toRungId: string | null;
  direction: "up" | "down";
  effectiveOn: string;
  verdict: StoredVerdict;
  logId: string | null;
}

function rowOf(ctx: PositionContext, draft: PromotionDraft) {
  return {
    teamId: ctx.position.teamId,
    athleteId: ctx.position.athleteId,
    ladderId: ctx.ladder.id,
    positionId: ctx.position.id,
    fromRungId: ctx.rung.id,
    toRungId: draft.toRungId,
    direction: draft.direction,
    verdict: draft.verdict,
    logId: draft.logId,
    effectiveOn: draft.effectiveOn,
  };
}

/** A promotion the engine applied at once (auto ladders). */
export async function recordAutoPromotion(tx: Tx, ctx: PositionContext, draft: PromotionDraft, at: Date): Promise<string> {
  const [row] = await tx
    .insert(promotions)
    .values({ ...rowOf(ctx, draft), status: "auto", decidedAt: at })
    .returning({ id: promotions.id });
  return row!.id;
}

/**
 * A proposal waiting for a coach. The partial unique index allows one pending row per position;
 * the caller holds the position lock, so a conflict only means another proposal is already there,
 * and that one is returned instead (never a second).
 */
export async function recordPendingPromotion(
  tx: Tx,
  ctx: PositionContext,
  draft: PromotionDraft,
): Promise<{ id: string; created: boolean }> {
  const [row] = await tx
    .insert(promotions)
    .values({ ...rowOf(ctx, draft), status: "pending" })
    .onConflictDoNothing({ target: promotions.positionId, where: sql`${promotions.status} = 'pending'` })
    .returning({ id: promotions.id });
  if (row) return { id: row.id, created: true };
  const existing = await pendingPromotionOf(tx, ctx.position.id);
  return { id: existing!.id, created: false };
}

export async function pendingPromotionOf(q: Queryable, positionId: string) {
  const [row] = await q
    .select({ id: promotions.id, direction: promotions.direction })
    .from(promotions)
    .where(and(eq(promotions.positionId, positionId), eq(promotions.status, "pending")));
  return row ?? null;
}

/**
 * A coach declined the same move and no session has been logged since the evidence it was
 * based on: proposing it again would only nag, so the engine waits for a new session.
 */
export async function declinedWithoutNewEvidence(
  tx: Tx,
  ctx: PositionContext,
  direction: "up" | "down",
  lastSessionDate: string,
): Promise<boolean> {
  const [row] = await tx
    .select({ id: promotions.id })
    .from(promotions)
    .where(
      and(
        eq(promotions.positionId, ctx.position.id),
        eq(promotions.fromRungId, ctx.rung.id),
        eq(promotions.direction, direction),
        eq(promotions.status, "declined"),
        gte(promotions.effectiveOn, lastSessionDate),
      ),
    )
    .limit(1);
  return row !== undefined;
}
