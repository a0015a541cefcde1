import "server-only";
import { and, eq } from "drizzle-orm";
import type { Tx } from "@/db/client";
import { uploads } from "@/db/schema";
import { enqueueStorageDeletion } from "@/lib/server/storage/enqueue-storage-deletion";

/**
 * Forgets every upload and form check of an athlete and queues their files for removal, inside the
 * caller's transaction. For a real removal of the athlete record only: archiving keeps the history
 * (and its videos) so an athlete can come back. Returns the outbox ids; pass them to `drainSoon`
 * after the commit, or leave them to the worker.
 */
export async function purgeAthleteMedia(tx: Tx, teamId: string, athleteId: string): Promise<string[]> {
  const removed = await tx
    .delete(uploads)
    .where(and(eq(uploads.teamId, teamId), eq(uploads.athleteId, athleteId)))
    .returning({ stagingKey: uploads.stagingKey, finalKey: uploads.finalKey });
  return enqueueStorageDeletion(
    tx,
    removed.flatMap((row) => [row.stagingKey, row.finalKey]),
  );
}
