import "server-only";
import type { Queryable } from "@/db/client";
import { storageDeletions } from "@/db/schema";

/**
 * Records objects to remove, in the caller's transaction: if it rolls back, nothing is removed; if
 * it commits, the drain removes them (with retries) even when storage is down right now.
 */
export async function enqueueStorageDeletion(q: Queryable, keys: (string | null | undefined)[]): Promise<string[]> {
  const wanted = [...new Set(keys.filter((key): key is string => Boolean(key)))];
  if (wanted.length === 0) return [];
  const rows = await q
    .insert(storageDeletions)
    .values(wanted.map((key) => ({ key })))
    .returning({ id: storageDeletions.id });
  return rows.map((row) => row.id);
}
