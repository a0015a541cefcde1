import "server-only";
import { and, asc, eq, inArray, lte } from "drizzle-orm";
import { db } from "@/db/client";
import { storageDeletions } from "@/db/schema";
import { deleteObject } from "./object-store";

export interface DrainOptions {
  /** Only these outbox rows (right after the transaction that wrote them); default: every due row. */
  ids?: string[];
  limit?: number;
  now?: Date;
  /** The remover; tests pass a failing one to see the retry schedule. */
  remove?: (key: string) => Promise<void>;
}

/** Wait before the next attempt: 30 s, 1 min, 2 min, … capped at 6 hours (common practice, no source). */
export function retryDelayMs(attempts: number): number {
  return Math.min(30_000 * 2 ** Math.max(0, attempts - 1), 6 * 3600 * 1000);
}

/**
 * Removes due objects from storage and forgets their outbox rows; a failure is kept with the error
 * and retried later with backoff. Rows are claimed with SKIP LOCKED, so several workers can drain at
 * once. The background worker calls this on a schedule; deletions also call it once right away.
 */
export async function drainStorageDeletions(options: DrainOptions = {}) {
  const now = options.now ?? new Date();
  const remove = options.remove ?? deleteObject;
  return db.transaction(async (tx) => {
    const due = await tx
      .select({ id: storageDeletions.id, key: storageDeletions.key, attempts: storageDeletions.attempts })
      .from(storageDeletions)
      .where(and(lte(storageDeletions.nextAttemptAt, now), options.ids ? inArray(storageDeletions.id, options.ids) : undefined))
      .orderBy(asc(storageDeletions.nextAttemptAt))
      .limit(options.limit ?? 100)
      .for("update", { skipLocked: true });
    let removed = 0;
    let failed = 0;
    for (const row of due) {
      try {
        await remove(row.key);
        await tx.delete(storageDeletions).where(eq(storageDeletions.id, row.id));
        removed += 1;
      } catch (error) {
        const attempts = row.attempts + 1;
        await tx
          .update(storageDeletions)
          .set({
            attempts,
            nextAttemptAt: new Date(now.getTime() + retryDelayMs(attempts)),
            lastError: (error instanceof Error ? error.message : String(error)).slice(0, 500),
          })
          .where(eq(storageDeletions.id, row.id));
        failed += 1;
      }
    }
    return { removed, failed };
  });
}

/** Best effort right after a commit: the outbox keeps anything this does not manage. */
export async function drainSoon(ids: string[]): Promise<void> {
  if (ids.length === 0) return;
  try {
    await drainStorageDeletions({ ids });
  } catch (error) {
    console.warn("Storage deletions left for the worker's retry:", error instanceof Error ? error.message : error);
  }
}
