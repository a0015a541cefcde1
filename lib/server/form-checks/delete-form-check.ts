import "server-only";
import { and, eq } from "drizzle-orm";
import { db } from "@/db/client";
import { formChecks, uploads } from "@/db/schema";
import { NotFound } from "@/lib/errors";
import type { Actor } from "@/lib/server/actor";
import { drainSoon } from "@/lib/server/storage/drain-storage-deletions";
import { enqueueStorageDeletion } from "@/lib/server/storage/enqueue-storage-deletion";
import { visibleFormChecks } from "./form-check-scope";

/**
 * Deletes a form check (its athlete or the team's staff): the rows go at once, with their comments
 * and the upload's quota; the file goes through the storage-deletion outbox, retried until removed.
 */
export async function deleteFormCheck(actor: Actor, formCheckId: string): Promise<void> {
  const outbox = await db.transaction(async (tx) => {
    const [check] = await tx
      .select({ id: formChecks.id, uploadId: formChecks.uploadId })
      .from(formChecks)
      .where(and(eq(formChecks.id, formCheckId), visibleFormChecks(actor)))
      .for("update");
    if (!check) throw new NotFound("form check");
    const [upload] = await tx
      .delete(uploads)
      .where(and(eq(uploads.id, check.uploadId), eq(uploads.teamId, actor.teamId)))
      .returning({ stagingKey: uploads.stagingKey, finalKey: uploads.finalKey });
    // The form check and its comments follow the upload (ON DELETE CASCADE); say so explicitly anyway.
    await tx.delete(formChecks).where(eq(formChecks.id, check.id));
    return enqueueStorageDeletion(tx, [upload?.finalKey, upload?.stagingKey]);
  });
  await drainSoon(outbox);
}
