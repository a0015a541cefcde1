import "server-only";
import { and, eq, isNull } from "drizzle-orm";
import { db } from "@/db/client";
import { logEntries, logs } from "@/db/schema";
import type { Actor } from "@/lib/server/actor";
import { evaluateAfterLog } from "@/lib/server/promotions/evaluate-after-log";
import { auditLogChange, lockEditableLog, logSnapshot } from "./editable-log";
import { currentPositions, lockPlacedRungs } from "./log-rungs";

/** DELETE /api/v1/logs/{id}: a soft delete within the edit window, audited, then re-evaluated. */
export async function deleteLog(actor: Actor, logId: string): Promise<undefined> {
  await db.transaction(async (tx) => {
    const { log, entries } = await lockEditableLog(tx, actor, logId);
    const now = new Date();
    await tx.update(logs).set({ deletedAt: now, updatedAt: now }).where(eq(logs.id, log.id));
    await tx
      .update(logEntries)
      .set({ deletedAt: now })
      .where(and(eq(logEntries.logId, log.id), isNull(logEntries.deletedAt)));
    await auditLogChange(tx, actor, log.id, "log.deleted", { before: logSnapshot(log, entries) });
    // Positions whose ladder the athlete has since left need no re-evaluation.
    const placed = await lockPlacedRungs(tx, actor.teamId, log.athleteId, entries.map((e) => e.rungId));
    await evaluateAfterLog(tx, actor, { positionIds: currentPositions([...placed.values()]), logId: log.id });
  });
  return undefined;
}
