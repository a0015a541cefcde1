import "server-only";
import { and, eq, isNull } from "drizzle-orm";
import type { Tx } from "@/db/client";
import { auditEvents, logs } from "@/db/schema";
import { NotFound } from "@/lib/errors";
import { isStaff } from "@/lib/permissions";
import type { Actor } from "@/lib/server/actor";
import type { LogDto } from "@/lib/validation/logs";
import { assertEditable } from "./log-dates";
import { entriesOf, toLogDto, type EntryRow, type LogRow } from "./log-dto";

/**
 * A live log the actor may change (their team's; an athlete only their own), locked for the rest of
 * the transaction, with its entries; 404 otherwise, 409 once the edit window has passed.
 */
export async function lockEditableLog(tx: Tx, actor: Actor, logId: string): Promise<{ log: LogRow; entries: EntryRow[] }> {
  const owner = isStaff(actor.role) ? undefined : eq(logs.athleteId, actor.athleteId ?? "00000000-0000-0000-0000-000000000000");
  const [log] = await tx
    .select({
      id: logs.id,
      athleteId: logs.athleteId,
      performedOn: logs.performedOn,
      durationMinutes: logs.durationMinutes,
      sessionRpe: logs.sessionRpe,
      enteredById: logs.enteredById,
      createdAt: logs.createdAt,
    })
    .from(logs)
    .where(and(eq(logs.id, logId), eq(logs.teamId, actor.teamId), isNull(logs.deletedAt), owner))
    .for("update");
  if (!log) throw new NotFound("log");
  assertEditable(log.performedOn, actor.timeZone);
  const entries = (await entriesOf(tx, [log.id])).get(log.id) ?? [];
  return { log, entries };
}

export function logSnapshot(log: LogRow, entries: readonly EntryRow[]): LogDto {
  return toLogDto(log, entries);
}

export async function auditLogChange(tx: Tx, actor: Actor, logId: string, action: "log.updated" | "log.deleted", data: object) {
  await tx.insert(auditEvents).values({
    teamId: actor.teamId,
    actorUserId: actor.userId,
    actorKind: "user",
    action,
    subjectType: "log",
    subjectId: logId,
    data,
  });
}
