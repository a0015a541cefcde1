import "server-only";
import type { Tx } from "@/db/client";
import type { Actor } from "@/lib/server/actor";
import type { VerdictDto } from "@/lib/validation/verdicts";

export interface LoggedRung {
  ladderId: string;
  rungId: string;
}

/**
 * Called by the log operations inside the log's transaction, after the entries are written:
 * evaluates every position the log touched (locking the positions in ladder-id order), applies or
 * proposes promotions exactly once, keeps the positions' derived figures current and returns one
 * verdict per current rung logged.
 *
 * Contract stub: the readiness engine integration replaces this body.
 */
export async function evaluateAfterLog(
  _tx: Tx,
  _actor: Actor,
  _input: { athleteId: string; logId: string; rungs: LoggedRung[] },
): Promise<VerdictDto[]> {
  return [];
}
