import "server-only";
import { randomUUID } from "node:crypto";
import { db } from "@/db/client";
import { uploads } from "@/db/schema";
import { invalidField, PayloadTooLarge } from "@/lib/errors";
import type { Actor } from "@/lib/server/actor";
import { presignPut } from "@/lib/server/storage/object-store";
import { displayFileName, isVideoType, type CreateUploadInput, type UploadTicket } from "@/lib/validation/form-checks";
import { lockUploadAthlete } from "./lock-upload-athlete";
import { storageUsed } from "./storage-used";
import { athleteQuotaBytes, maxBytesFor, megabytes, PUT_URL_SECONDS, stagingKeyOf } from "./upload-policy";

/**
 * Starts an upload: checks type, size and the athlete's quota, records it as pending and answers a
 * presigned PUT to a staging key the browser sends the bytes to directly.
 */
export async function createUpload(actor: Actor, input: CreateUploadInput, now = new Date()): Promise<UploadTicket> {
  const max = maxBytesFor(input.contentType);
  if (input.size > max) {
    throw new PayloadTooLarge(`${isVideoType(input.contentType) ? "Videos" : "Photos"} can be at most ${megabytes(max)}.`);
  }
  const uploadId = randomUUID();
  const stagingKey = stagingKeyOf(actor.teamId, uploadId);
  await db.transaction(async (tx) => {
    const athleteId = await lockUploadAthlete(tx, actor, input.athleteId);
    const used = await storageUsed(tx, athleteId, now);
    const quota = athleteQuotaBytes();
    if (used + input.size > quota) {
      throw invalidField(
        "size",
        `This would go past the athlete's form-check storage (${megabytes(used)} of ${megabytes(quota)} used). Delete an older form check first.`,
      );
    }
    await tx.insert(uploads).values({
      id: uploadId,
      teamId: actor.teamId,
      athleteId,
      uploaderId: actor.userId,
      purpose: input.purpose,
      contentType: input.contentType,
      declaredSize: input.size,
      fileName: displayFileName(input.fileName),
      stagingKey,
      createdAt: now,
    });
  });
  const { url, headers } = await presignPut(stagingKey, input.contentType, PUT_URL_SECONDS);
  return { uploadId, url, method: "PUT", headers, expiresAt: new Date(now.getTime() + PUT_URL_SECONDS * 1000).toISOString() };
}
