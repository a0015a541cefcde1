import "server-only";
import { and, eq } from "drizzle-orm";
import { db, type Tx } from "@/db/client";
import { athletes, uploads } from "@/db/schema";
import { Conflict, invalidField, NotFound, PayloadTooLarge, type AppError } from "@/lib/errors";
import type { Actor } from "@/lib/server/actor";
import { drainSoon } from "@/lib/server/storage/drain-storage-deletions";
import { enqueueStorageDeletion } from "@/lib/server/storage/enqueue-storage-deletion";
import { matchesDeclaredType, SIGNATURE_BYTES } from "@/lib/server/storage/media-signature";
import { copyObject, leadingBytes, objectSize } from "@/lib/server/storage/object-store";
import type { MediaType } from "@/lib/validation/form-checks";
import { storageUsed } from "./storage-used";
import { athleteQuotaBytes, finalKeyOf, maxBytesFor, megabytes } from "./upload-policy";
import { visibleUploads } from "./upload-scope";

interface PendingUpload {
  id: string;
  teamId: string;
  athleteId: string;
  contentType: MediaType;
  declaredSize: number;
  stagingKey: string;
}

type Outcome =
  | { ok: true; upload: { uploadId: string; state: "complete"; contentType: string; size: number }; cleanup: string[] }
  | { ok: false; error: AppError; cleanup: string[] };

/** Why stored bytes are refused, or null when they are what was announced. */
async function problemWith(tx: Tx, upload: PendingUpload, size: number, now: Date): Promise<AppError | null> {
  const max = maxBytesFor(upload.contentType);
  if (size > max) return new PayloadTooLarge(`The file is larger than ${megabytes(max)}.`);
  if (size !== upload.declaredSize) {
    return invalidField("size", `The file stored is ${size} bytes, not the ${upload.declaredSize} announced.`);
  }
  const used = await storageUsed(tx, upload.athleteId, now, upload.id);
  const quota = athleteQuotaBytes();
  if (used + size > quota) {
    return invalidField("size", `This would go past the athlete's form-check storage (${megabytes(quota)}).`);
  }
  const head = await leadingBytes(upload.stagingKey, SIGNATURE_BYTES);
  if (!matchesDeclaredType(upload.contentType, head)) {
    return invalidField("contentType", `The file's contents are not ${upload.contentType}.`);
  }
  return null;
}

/**
 * Confirms an upload once the browser has sent the bytes: checks the stored object's size (HEAD) and
 * leading bytes (ranged GET) against what was announced, then moves it from the staging key to its
 * final key. A bad file is removed and the upload marked rejected (422/413); a second call is 409.
 */
export async function completeUpload(actor: Actor, uploadId: string, now = new Date()) {
  const outcome = await db.transaction(async (tx): Promise<Outcome> => {
    const [found] = await tx
      .select({ athleteId: uploads.athleteId })
      .from(uploads)
      .where(and(eq(uploads.id, uploadId), visibleUploads(actor)));
    if (!found) throw new NotFound("upload");
    // Athlete row first, then the upload: the same order as new uploads, so quota checks serialise.
    await tx.select({ id: athletes.id }).from(athletes).where(eq(athletes.id, found.athleteId)).for("update");
    const [upload] = await tx
      .select({
        id: uploads.id,
        teamId: uploads.teamId,
        athleteId: uploads.athleteId,
        contentType: uploads.contentType,
        declaredSize: uploads.declaredSize,
        stagingKey: uploads.stagingKey,
        state: uploads.state,
      })
      .from(uploads)
      .where(and(eq(uploads.id, uploadId), visibleUploads(actor)))
      .for("update");
    if (!upload) throw new NotFound("upload");
    if (upload.state === "complete") throw new Conflict("This upload is already complete.");
    if (upload.state === "rejected") throw new Conflict("This upload was refused; start a new one.");
    const pending = { ...upload, contentType: upload.contentType as MediaType };

    const size = await objectSize(pending.stagingKey);
    if (size === null) throw invalidField("uploadId", "No file has arrived for this upload yet: send it first.");

    const problem = await problemWith(tx, pending, size, now);
    if (problem) {
      await tx
        .update(uploads)
        .set({ state: "rejected", actualSize: size, rejectReason: problem.message })
        .where(eq(uploads.id, pending.id));
      return { ok: false, error: problem, cleanup: await enqueueStorageDeletion(tx, [pending.stagingKey]) };
    }

    const finalKey = finalKeyOf(pending.teamId, pending.athleteId, pending.id, pending.contentType);
    await copyObject(pending.stagingKey, finalKey, pending.contentType);
    await tx
      .update(uploads)
      .set({ state: "complete", actualSize: size, finalKey, completedAt: now })
      .where(eq(uploads.id, pending.id));
    return {
      ok: true,
      upload: { uploadId: pending.id, state: "complete", contentType: pending.contentType, size },
      cleanup: await enqueueStorageDeletion(tx, [pending.stagingKey]),
    };
  });
  // The staging object goes either way: a refused file is never kept, an accepted one now lives at its final key.
  await drainSoon(outcome.cleanup);
  if (!outcome.ok) throw outcome.error;
  return outcome.upload;
}
