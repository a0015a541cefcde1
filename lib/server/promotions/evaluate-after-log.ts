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
 * Called by the log operations inside the log's transaction, after the entries are written:
 * evaluates every position the log touched (locking the positions in ladder-id order, so two
 * transactions locking the same athlete's ladders can never deadlock), applies or proposes
 * promotions exactly once, keeps the positions' derived figures current and returns one verdict
 * per ladder logged.
 *
 * When a concurrent transaction moved the athlete off the logged rung before this one got the
 * lock, the verdict returned is the one of the rung they stand on now (the log's entries stay on
 * the rung they were done on and no longer count toward the new one).
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
    .select({ id: athletePositions.id, ladderId: athletePositions.ladderId })
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

  const verdicts: VerdictDto[] = [];
  for (const position of positions) {
    verdicts.push(await evaluatePosition(tx, { positionId: position.id, asOf, actor, logId: input.logId }));
  }
  return verdicts;
}
