import "server-only";
import { eq, sql } from "drizzle-orm";
import type { Queryable } from "@/db/client";
import { athletes, formCheckComments, formChecks, rungs, uploads, users } from "@/db/schema";
import { isVideoType, type FormCheckDto } from "@/lib/validation/form-checks";

/** The columns a form check shows, with its athlete, rung, file and comment count joined in. */
export function selectFormChecks(q: Queryable) {
  return q
    .select({
      id: formChecks.id,
      athleteId: formChecks.athleteId,
      athleteName: athletes.name,
      rungId: formChecks.rungId,
      rungName: rungs.name,
      logId: formChecks.logId,
      note: formChecks.note,
      poster: formChecks.poster,
      contentType: uploads.contentType,
      size: uploads.actualSize,
      fileName: uploads.fileName,
      finalKey: uploads.finalKey,
      createdByName: users.name,
      createdAt: formChecks.createdAt,
      /** Full-precision text for keyset cursors (a JS Date would drop microseconds). */
      createdAtKey: sql<string>`${formChecks.createdAt}::text`,
      commentCount: sql<number>`(select count(*)::int from ${formCheckComments} where ${formCheckComments.formCheckId} = ${formChecks.id})`,
    })
    .from(formChecks)
    .innerJoin(athletes, eq(athletes.id, formChecks.athleteId))
    .innerJoin(uploads, eq(uploads.id, formChecks.uploadId))
    .leftJoin(rungs, eq(rungs.id, formChecks.rungId))
    .leftJoin(users, eq(users.id, formChecks.createdById));
}

export type FormCheckRow = Awaited<ReturnType<ReturnType<typeof selectFormChecks>["execute"]>>[number];

export function toFormCheckDto(row: FormCheckRow): FormCheckDto {
  return {
    id: row.id,
    athleteId: row.athleteId,
    athleteName: row.athleteName,
    rungId: row.rungId,
    rungName: row.rungName,
    logId: row.logId,
    note: row.note,
    kind: isVideoType(row.contentType) ? "video" : "photo",
    contentType: row.contentType,
    size: row.size ?? 0,
    fileName: row.fileName,
    poster: row.poster,
    commentCount: Number(row.commentCount),
    createdByName: row.createdByName,
    createdAt: row.createdAt.toISOString(),
  };
}
