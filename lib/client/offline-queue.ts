/**
 * Unsent writes of the Today screen, kept in IndexedDB so they survive a reload, a closed tab and a
 * dead connection. Each set gets its Idempotency-Key when it is first queued and keeps it through
 * every retry, so the server writes it once however often it is sent.
 */
import { openDB, type DBSchema, type IDBPDatabase } from "idb";
import type { SetInput } from "@/lib/validation/logs";

export interface PendingSet {
  kind: "set";
  key: string;
  athleteId: string;
  performedOn: string;
  rungId: string;
  set: SetInput;
  pain: boolean;
  note: string | null;
  queuedAt: number;
  /** The server refused it (4xx other than a retryable one): shown, not resent. */
  error?: string;
}

export interface PendingFinish {
  kind: "finish";
  key: string;
  athleteId: string;
  performedOn: string;
  durationMinutes: number;
  sessionRpe: number;
  queuedAt: number;
  error?: string;
}

export type PendingWrite = PendingSet | PendingFinish;

interface QueueDb extends DBSchema {
  pending: { key: string; value: PendingWrite; indexes: { byAthlete: string } };
}

let opened: Promise<IDBPDatabase<QueueDb>> | undefined;

function database() {
  opened ??= openDB<QueueDb>("rungwise-offline", 1, {
    upgrade(db) {
      const store = db.createObjectStore("pending", { keyPath: "key" });
      store.createIndex("byAthlete", "athleteId");
    },
  });
  return opened;
}

export function newIdempotencyKey(): string {
  return crypto.randomUUID();
}

export async function enqueue(write: PendingWrite): Promise<void> {
  await (await database()).put("pending", write);
}

/** An athlete's unsent writes, oldest first. */
export async function pendingFor(athleteId: string): Promise<PendingWrite[]> {
  const rows = await (await database()).getAllFromIndex("pending", "byAthlete", athleteId);
  return rows.sort((a, b) => a.queuedAt - b.queuedAt);
}

export async function removePending(key: string): Promise<void> {
  await (await database()).delete("pending", key);
}
