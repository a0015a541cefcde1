import "server-only";
import { eq } from "drizzle-orm";
import type { Tx } from "@/db/client";
import { athletePositions, positionMoves } from "@/db/schema";

export interface Move {
  positionId: string;
  teamId: string;
  athleteId: string;
  ladderId: string;
  fromRungId: string;
  /** Null: the athlete finished the ladder; they stay on its last rung and the skill is achieved. */
  toRungId: string | null;
  /** The new rung's `since` (YYYY-MM-DD), also the audit row's effective date. */
  effectiveOn: string;
  cause: "auto" | "approved" | "step_down";
  /** The deciding coach; null when the engine moved the athlete. */
  actorUserId: string | null;
  promotionId: string;
  verdict: unknown;
  at: Date;
}

/**
 * Applies a move to a locked position and writes its audit row. A new rung restarts the derived
 * figures (the caller re-evaluates right after); finishing the ladder marks the skill achieved.
 */
export async function movePosition(tx: Tx, move: Move): Promise<void> {
  if (move.toRungId === null) {
    await tx
      .update(athletePositions)
      .set({ status: "achieved", achievedAt: move.at, readiness: 100 })
      .where(eq(athletePositions.id, move.positionId));
  } else {
    await tx
      .update(athletePositions)
      .set({
        rungId: move.toRungId,
        since: move.effectiveOn,
        readiness: 0,
        status: "not_yet",
        sessionsMet: 0,
        lastSessionOn: null,
        lastPainOn: null,
        achievedAt: null,
      })
      .where(eq(athletePositions.id, move.positionId));
  }
  await tx.insert(positionMoves).values({
    teamId: move.teamId,
    athleteId: move.athleteId,
    ladderId: move.ladderId,
    fromRungId: move.fromRungId,
    toRungId: move.toRungId,
    cause: move.cause,
    actorUserId: move.actorUserId,
    actorKind: move.actorUserId ? "user" : "system",
    promotionId: move.promotionId,
    verdict: move.verdict,
    effectiveOn: move.effectiveOn,
  });
}
