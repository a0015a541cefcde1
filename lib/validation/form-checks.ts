import { z } from "zod";
import { zId, zPageQuery } from "./common";

/** What a form check may be: short videos from a phone, or a photo. */
export const VIDEO_TYPES = ["video/mp4", "video/quicktime", "video/webm"] as const;
export const IMAGE_TYPES = ["image/jpeg", "image/png", "image/heic"] as const;
export const MEDIA_TYPES = [...VIDEO_TYPES, ...IMAGE_TYPES] as const;
export type MediaType = (typeof MEDIA_TYPES)[number];

export function isVideoType(type: string): boolean {
  return (VIDEO_TYPES as readonly string[]).includes(type);
}

/** Staff comment bodies stay short enough to read beside the player. */
export const COMMENT_MAX = 1000;
/** A poster frame is a small JPEG data URL (about 320 px wide); anything bigger is refused. */
export const POSTER_MAX_CHARS = 120_000;

export const ZCreateUpload = z.strictObject({
  contentType: z.enum(MEDIA_TYPES, {
    error: "Send a video (MP4, MOV or WebM) or a photo (JPEG, PNG or HEIC).",
  }),
  size: z.number({ error: "Send the file size in bytes." }).int().positive("The file is empty."),
  purpose: z.literal("form_check", { error: 'The only purpose is "form_check".' }),
  /** Shown to people only; never used to build a storage key. */
  fileName: z.string().max(300, "Keep the file name under 300 characters.").optional(),
  /** Whose form check this is. Athletes may leave it out (their own); staff must name the athlete. */
  athleteId: zId.optional(),
});
export type CreateUploadInput = z.infer<typeof ZCreateUpload>;

export const ZUpload = z.object({
  uploadId: zId,
  url: z.string(),
  method: z.literal("PUT"),
  headers: z.record(z.string(), z.string()),
  expiresAt: z.string(),
});
export type UploadTicket = z.infer<typeof ZUpload>;

export const ZCompletedUpload = z.object({
  uploadId: zId,
  state: z.literal("complete"),
  contentType: z.string(),
  size: z.number().int(),
});

export const ZCreateFormCheck = z.strictObject({
  uploadId: zId,
  athleteId: zId.optional(),
  rungId: zId.optional(),
  logId: zId.optional(),
  note: z.string().trim().max(1000, "Keep the note under 1000 characters.").optional(),
  poster: z
    .string()
    .max(POSTER_MAX_CHARS, "The poster frame is too large.")
    .regex(/^data:image\/jpeg;base64,[A-Za-z0-9+/]+=*$/, "The poster frame must be a JPEG data URL.")
    .optional(),
});
export type CreateFormCheckInput = z.infer<typeof ZCreateFormCheck>;

export const ZFormCheckListQuery = zPageQuery.extend({
  athleteId: zId.optional(),
});

export const ZCreateComment = z.strictObject({
  atSeconds: z
    .number({ error: "Send the moment in seconds." })
    .min(0, "The moment cannot be before the start.")
    .max(24 * 3600, "The moment is past the end."),
  body: z.string().trim().min(1, "Write a comment.").max(COMMENT_MAX, `Keep it under ${COMMENT_MAX} characters.`),
});
export type CreateCommentInput = z.infer<typeof ZCreateComment>;

export const ZFormCheckComment = z.object({
  id: zId,
  atSeconds: z.number(),
  body: z.string(),
  authorId: zId.nullable(),
  authorName: z.string().nullable(),
  createdAt: z.string(),
});
export type FormCheckCommentDto = z.infer<typeof ZFormCheckComment>;

export const ZFormCheck = z.object({
  id: zId,
  athleteId: zId,
  athleteName: z.string(),
  rungId: zId.nullable(),
  rungName: z.string().nullable(),
  logId: zId.nullable(),
  note: z.string().nullable(),
  kind: z.enum(["video", "photo"]),
  contentType: z.string(),
  size: z.number().int(),
  fileName: z.string().nullable(),
  poster: z.string().nullable(),
  commentCount: z.number().int(),
  createdByName: z.string().nullable(),
  createdAt: z.string(),
});
export type FormCheckDto = z.infer<typeof ZFormCheck>;

export const ZFormCheckDetail = ZFormCheck.extend({
  /** A short-lived signed GET URL, issued after the access check. */
  mediaUrl: z.string(),
  mediaUrlExpiresAt: z.string(),
  comments: z.array(ZFormCheckComment),
});
export type FormCheckDetailDto = z.infer<typeof ZFormCheckDetail>;

/** Formats a moment as mm:ss for labels ("Comment at 00:02"). */
export function formatMoment(seconds: number): string {
  const whole = Math.max(0, Math.floor(seconds));
  const minutes = Math.floor(whole / 60);
  return `${String(minutes).padStart(2, "0")}:${String(whole % 60).padStart(2, "0")}`;
}

/** A file name fit for display: no folders, no control or direction-override characters, bounded length. */
export function displayFileName(name: string | undefined | null): string | null {
  if (!name) return null;
  const base = name.split(/[\\/]/).pop() ?? "";
  const cleaned = base
    .replace(/[\p{Cc}\p{Cf}]/gu, "")
    .replace(/^\.+/, "")
    .trim()
    .slice(0, 120);
  return cleaned || null;
}
