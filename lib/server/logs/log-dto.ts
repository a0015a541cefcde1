import "server-only";
import { and, asc, inArray, isNull } from "drizzle-orm";
import type { Queryable } from "@/db/client";
import { logEntries } from "@/db/schema";
import type { SetEntry } from "@/lib/engine/types";
import type { LogDto, LogEntryDto } from "@/lib/validation/logs";

export interface LogRow {
  id: string;
  athleteId: string;
  performedOn: string;
  durationMinutes: number | null;
  sessionRpe: number | null;
  enteredById: string | null;
  createdAt: Date;
}

export interface EntryRow {
  id: string;
  logId: string;
  ladderId: string;
  rungId: string;
  sets: SetEntry[];
  bestValue: number | null;
  pain: boolean;
  note: string | null;
}

export const entryColumns = {
  id: logEntries.id,
  logId: logEntries.logId,
  ladderId: logEntries.ladderId,
  rungId: logEntries.rungId,
  sets: logEntries.sets,
  bestValue: logEntries.bestValue,
  pain: logEntries.pain,
  note: logEntries.note,
};

export function toEntryDto(row: EntryRow): LogEntryDto {
  return { id: row.id, ladderId: row.ladderId, rungId: row.rungId, sets: row.sets, bestValue: row.bestValue, pain: row.pain, note: row.note };
}

export function toLogDto(log: LogRow, entries: readonly EntryRow[]): LogDto {
  return {
    id: log.id,
    athleteId: log.athleteId,
    performedOn: log.performedOn,
    durationMinutes: log.durationMinutes,
    sessionRpe: log.sessionRpe,
    enteredById: log.enteredById,
    createdAt: log.createdAt.toISOString(),
    entries: entries.map(toEntryDto),
  };
}

/** Live entries of some logs, grouped by log, in the order they were written. */
export async function entriesOf(q: Queryable, logIds: readonly string[]): Promise<Map<string, EntryRow[]>> {
  const byLog = new Map<string, EntryRow[]>();
  if (logIds.length === 0) return byLog;
  const rows = await q
    .select(entryColumns)
    .from(logEntries)
    .where(and(inArray(logEntries.logId, [...logIds]), isNull(logEntries.deletedAt)))
    .orderBy(asc(logEntries.createdAt), asc(logEntries.id));
  for (const row of rows) {
    const list = byLog.get(row.logId) ?? [];
    list.push(row);
    byLog.set(row.logId, list);
  }
  return byLog;
}
