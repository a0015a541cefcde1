import "server-only";
import { storageEnv } from "@/lib/env";
import { isVideoType, type MediaType } from "@/lib/validation/form-checks";
import { extensionOf } from "@/lib/server/storage/media-signature";

/** How long a presigned PUT stays valid, and how long an unfinished upload holds quota. */
export const PUT_URL_SECONDS = 15 * 60;
export const PENDING_RESERVATION_MS = 60 * 60 * 1000;
/** Signed reads are issued per view after the access check and expire quickly. */
export const GET_URL_SECONDS = 5 * 60;

export function maxBytesFor(type: MediaType): number {
  const config = storageEnv();
  return isVideoType(type) ? config.UPLOAD_MAX_VIDEO_BYTES : config.UPLOAD_MAX_IMAGE_BYTES;
}

export function athleteQuotaBytes(): number {
  return storageEnv().UPLOAD_ATHLETE_QUOTA_BYTES;
}

export function megabytes(bytes: number): string {
  const mb = bytes / (1024 * 1024);
  return mb >= 1024 ? `${(mb / 1024).toFixed(1)} GB` : `${mb < 10 ? mb.toFixed(1) : Math.round(mb)} MB`;
}

/** Keys are built from ids only: a file name never reaches storage. */
export function stagingKeyOf(teamId: string, uploadId: string): string {
  return `staging/${teamId}/${uploadId}`;
}

export function finalKeyOf(teamId: string, athleteId: string, uploadId: string, type: MediaType): string {
  return `form-checks/${teamId}/${athleteId}/${uploadId}.${extensionOf(type)}`;
}
