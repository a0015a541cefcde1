// Helpers for form-check tests: files with real leading bytes, and the three-step upload the browser does.
import { POST as completeRoute } from "@/app/api/v1/uploads/[id]/complete/route";
import { POST as createUploadRoute } from "@/app/api/v1/uploads/route";
import { POST as createFormCheckRoute } from "@/app/api/v1/form-checks/route";
import { call } from "./http";

/** File signatures: EBML (WebM), ISO BMFF `ftyp` (MP4/HEIF), JPEG SOI, PNG. */
const HEADS: Record<string, number[]> = {
  "video/webm": [0x1a, 0x45, 0xdf, 0xa3, 0x9f, 0x42, 0x86, 0x81, 0x01],
  "video/mp4": [0, 0, 0, 0x18, ...Buffer.from("ftypisom")],
  "video/quicktime": [0, 0, 0, 0x14, ...Buffer.from("ftypqt  ")],
  "image/heic": [0, 0, 0, 0x18, ...Buffer.from("ftypheic")],
  "image/jpeg": [0xff, 0xd8, 0xff, 0xe0],
  "image/png": [0x89, 0x50, 0x4e, 0x47, 0x0d, 0x0a, 0x1a, 0x0a],
};

/** `size` bytes that start like a file of `type`, then a recognisable counting pattern. */
export function fileOf(type: keyof typeof HEADS | string, size: number): Uint8Array {
  const bytes = new Uint8Array(size);
  for (let i = 0; i < size; i += 1) bytes[i] = (i * 7) % 251;
  bytes.set((HEADS[type] ?? []).slice(0, size));
  return bytes;
}

export interface UploadTicket {
  uploadId: string;
  url: string;
  headers: Record<string, string>;
}

export async function presign(token: string, json: Record<string, unknown>) {
  return call(createUploadRoute, { token, json: { purpose: "form_check", ...json } });
}

/** PUT bytes to a presigned URL as a browser would. */
export async function putTo(ticket: UploadTicket, bytes: Uint8Array) {
  const response = await fetch(ticket.url, { method: "PUT", headers: ticket.headers, body: Buffer.from(bytes) });
  await response.arrayBuffer();
  return response.status;
}

export async function complete(token: string, uploadId: string) {
  return call(completeRoute, { token, params: { id: uploadId }, method: "POST" });
}

/** Presign, PUT and complete; throws if any step fails. */
export async function uploadFile(
  token: string,
  options: { contentType: string; bytes: Uint8Array; athleteId?: string; fileName?: string },
): Promise<string> {
  const ticket = await presign(token, {
    contentType: options.contentType,
    size: options.bytes.length,
    athleteId: options.athleteId,
    fileName: options.fileName,
  });
  if (ticket.status !== 201) throw new Error(`presign answered ${ticket.status}: ${JSON.stringify(ticket.data)}`);
  const uploaded = await putTo(ticket.data as unknown as UploadTicket, options.bytes);
  if (uploaded !== 200) throw new Error(`PUT answered ${uploaded}`);
  const done = await complete(token, ticket.data.uploadId as string);
  if (done.status !== 200) throw new Error(`complete answered ${done.status}: ${JSON.stringify(done.data)}`);
  return ticket.data.uploadId as string;
}

/** A finished form check with a small WebM-looking video; returns its id. */
export async function createFormCheckFor(token: string, options: { athleteId?: string; note?: string; bytes?: Uint8Array } = {}) {
  const uploadId = await uploadFile(token, {
    contentType: "video/webm",
    bytes: options.bytes ?? fileOf("video/webm", 2048),
    athleteId: options.athleteId,
  });
  const created = await call(createFormCheckRoute, { token, json: { uploadId, athleteId: options.athleteId, note: options.note } });
  if (created.status !== 201) throw new Error(`form check answered ${created.status}: ${JSON.stringify(created.data)}`);
  return created.data.id as string;
}
