import "server-only";
import { eq } from "drizzle-orm";
import { db } from "@/db/client";
import { logEntries, logs } from "@/db/schema";
import { sessionBest } from "@/lib/engine/session-assessment";
import { Unprocessable, type FieldIssue } from "@/lib/errors";
import type { Actor } from "@/lib/server/actor";
import { evaluateAfterLog } from "@/lib/server/promotions/evaluate-after-log";
import type { LogWithVerdicts, UpdateLog } from "@/lib/validation/logs";
import { checkSets } from "./check-sets";
import { auditLogChange, lockEditableLog, logSnapshot } from "./editable-log";
import { currentPositions, logRungsOf } from "./log-rungs";

/**
 * PATCH /api/v1/logs/{id}: session minutes and RPE, and the sets, pain flag and note of existing
 * entries, within the edit window; audited with before and after, then re-evaluated.
 */
export async function updateLog(actor: Actor, logId: string, patch: UpdateLog): Promise<LogWithVerdicts> {
  return db.transaction(async (tx) => {
    const { log, entries } = await lockEditableLog(tx, actor, logId);
    const before = logSnapshot(log, entries);
    const rungList = await logRungsOf(tx, actor.teamId, log.athleteId, entries.map((e) => e.rungId));
    const measureOf = new Map(rungList.map((r) => [r.rungId, r.measure]));

    const issues: FieldIssue[] = [];
    const changes = (patch.entries ?? []).map((change, i) => {
      const entry = entries.find((e) => e.id === change.id);
      if (!entry) issues.push({ path: `entries.${i}.id`, message: "Not an entry of this log." });
      return { change, entry, i };
    });
    if (issues.length > 0) throw new Unprocessable("Some entries are not part of this log.", issues);

    for (const { change, entry, i } of changes) {
      const current = entry!;
      const measure = measureOf.get(current.rungId)!;
      if (change.sets) current.sets = checkSets(measure, change.sets, `entries.${i}.sets`);
      if (change.pain !== undefined) current.pain = change.pain;
      if (change.note !== undefined) current.note = change.note || null;
      current.bestValue = sessionBest(measure, { date: log.performedOn, sets: current.sets, pain: current.pain });
      await tx
        .update(logEntries)
        .set({ sets: current.sets, pain: current.pain, note: current.note, bestValue: current.bestValue })
        .where(eq(logEntries.id, current.id));
    }
    if (patch.durationMinutes !== undefined) log.durationMinutes = patch.durationMinutes;
    if (patch.sessionRpe !== undefined) log.sessionRpe = patch.sessionRpe;
    await tx
      .update(logs)
      .set({ durationMinutes: log.durationMinutes, sessionRpe: log.sessionRpe, updatedAt: new Date() })
      .where(eq(logs.id, log.id));

    const after = logSnapshot(log, entries);
    await auditLogChange(tx, actor, log.id, "log.updated", { before, after });
    const verdicts = await evaluateAfterLog(tx, actor, { positionIds: currentPositions(rungList), logId: log.id });
    return { ...after, verdicts };
  });
}
