import "server-only";
import type { Tx } from "@/db/client";

export interface PositionEvaluation {
  /** "promoted" (auto ladder), "pending" (approval created), or anything else: nothing changed. */
  outcome: "promoted" | "pending" | "unchanged" | "unavailable";
}

/**
 * The one place the daily re-evaluation reaches the promotions domain: it must go through the same
 * code path as a log (lib/server/promotions/evaluate-position.ts → evaluatePosition(tx, { positionId,
 * asOf })), which applies or proposes the promotion and enqueues its notice in the transaction.
 * Until that operation lands on main this reports "unavailable" and changes nothing.
 */
export async function evaluatePositionAdapter(_tx: Tx, _input: { positionId: string; asOf: string }): Promise<PositionEvaluation> {
  return { outcome: "unavailable" };
}
