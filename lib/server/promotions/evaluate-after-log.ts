import "server-only";
import { and, asc, eq, inArray } from "drizzle-orm";
import type { Tx } from "@/db/client";
import { athletePositions } from "@/db/schema";
import type { Actor } from "@/lib/server/actor";
import type { VerdictDto } from "@/lib/validation/verdicts";
import { evaluatePosition } from "./evaluate-position";

export interface LoggedRung {
  ladderId: string;
  rungId: string;
}

/**
 * Evaluates every position a log touched, locking the positions first in ladder-id order (so two
 * transactions locking the same athlete's ladders can never deadlock), then as
 * evaluateLockedPositions. For callers that have not locked them yet (tests, tools).
 */
export async function evaluateAfterLog(
  tx: Tx,
  actor: Actor,
  input: { athleteId: string; logId: string; rungs: LoggedRung[] },
  asOf: Date = new Date(),
): Promise<VerdictDto[]> {
  const ladderIds = [...new Set(input.rungs.map((r) => r.ladderId))];
  if (ladderIds.length === 0) return [];
  const positions = await tx
    .select({ id: athletePositions.id })
    .from(athletePositions)
    .where(
      and(
        eq(athletePositions.teamId, actor.teamId),
        eq(athletePositions.athleteId, input.athleteId),
        inArray(athletePositions.ladderId, ladderIds),
      ),
    )
    .orderBy(asc(athletePositions.ladderId))
    .for("update");
  return evaluateLockedPositions(tx, actor, { positionIds: positions.map((p) => p.id), logId: input.logId }, asOf);
}

/**
 * Called by the log operations inside the log's transaction, after the entries are written and
 * with the positions already locked by this transaction (logRungsOf): applies or proposes
 * promotions exactly once, keeps the positions' derived figures current and returns one verdict
 * per position. The caller passes the positions whose current rung the log names, as read under
 * the lock: when a concurrent log moved the athlete up first, the rung logged is no longer current
 * and, like a warm-up on an easier rung, yields no verdict (its entries stay where they were done).
 */
export async function evaluateLockedPositions(
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
