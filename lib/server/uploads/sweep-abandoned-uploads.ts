import "server-only";
import { and, eq, lt } from "drizzle-orm";
import { db } from "@/db/client";
import { uploads } from "@/db/schema";
import { enqueueStorageDeletion } from "@/lib/server/storage/enqueue-storage-deletion";

/** Unfinished uploads older than this are given up (their PUT URL expired long ago). */
const ABANDON_AFTER_MS = 24 * 3600 * 1000;

/**
 * Marks uploads never completed as rejected and queues whatever reached their staging key for
 * removal. The worker calls it on a schedule, before draining the storage-deletion outbox.
 */
export async function sweepAbandonedUploads(now = new Date()): Promise<number> {
  return db.transaction(async (tx) => {
    const stale = await tx
      .update(uploads)
      .set({ state: "rejected", rejectReason: "Never completed." })
      .where(and(eq(uploads.state, "pending"), lt(uploads.createdAt, new Date(now.getTime() - ABANDON_AFTER_MS))))
      .returning({ stagingKey: uploads.stagingKey });
    await enqueueStorageDeletion(tx, stale.map((row) => row.stagingKey));
    return stale.length;
  });
}
