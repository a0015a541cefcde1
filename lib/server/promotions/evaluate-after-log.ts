import "server-only";
import type { Tx } from "@/db/client";
import type { Actor } from "@/lib/server/actor";
import type { VerdictDto } from "@/lib/validation/verdicts";
import { evaluatePosition } from "./evaluate-position";

/**
 * Called by the log operations inside the log's transaction, after the entries are written and
 * with the positions already locked by this transaction (logRungsOf / lockPlacedRungs, in
 * ladder-id order, so two transactions locking the same athlete's ladders can never deadlock):
 * applies or proposes promotions exactly once, keeps the positions' derived figures current and
 * returns one verdict per position. The caller passes the positions whose current rung the log
 * names, as read under the lock: when a concurrent log moved the athlete up first, the rung logged
 * is no longer current and, like a warm-up on an easier rung, yields no verdict (its entries stay
 * where they were done).
 */
export async function evaluateAfterLog(
  tx: Tx,
  actor: Actor,
  input: { positionIds: string[]; logId: string },
  asOf: Date = new Date(),
): Promise<VerdictDto[]> {
  const verdicts: VerdictDto[] = [];
  for (const positionId of input.positionIds) {
    verdicts.push(await evaluatePosition(tx, { positionId, asOf, actor, logId: input.logId, locked: true }));
  }
  return verdicts;
}
