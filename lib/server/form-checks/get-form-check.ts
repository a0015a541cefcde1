import "server-only";
import { and, asc, eq } from "drizzle-orm";
import { db, type Queryable } from "@/db/client";
import { formCheckComments, formChecks, users } from "@/db/schema";
import { NotFound } from "@/lib/errors";
import type { Actor } from "@/lib/server/actor";
import { presignGet } from "@/lib/server/storage/object-store";
import { GET_URL_SECONDS } from "@/lib/server/uploads/upload-policy";
import type { FormCheckDetailDto } from "@/lib/validation/form-checks";
import { selectFormChecks, toFormCheckDto } from "./form-check-dto";
import { visibleFormChecks } from "./form-check-scope";

/**
 * One form check with its comments and a signed GET URL for the file. The URL is issued only after
 * the row passed the access check in the WHERE clause, and expires in minutes (no public bucket).
 */
export async function getFormCheck(actor: Actor, formCheckId: string, q: Queryable = db, now = new Date()): Promise<FormCheckDetailDto> {
  const [row] = await selectFormChecks(q).where(and(eq(formChecks.id, formCheckId), visibleFormChecks(actor)));
  if (!row || !row.finalKey) throw new NotFound("form check");
  const comments = await q
    .select({
      id: formCheckComments.id,
      atSeconds: formCheckComments.atSeconds,
      body: formCheckComments.body,
      authorId: formCheckComments.authorId,
      authorName: users.name,
      createdAt: formCheckComments.createdAt,
    })
    .from(formCheckComments)
    .leftJoin(users, eq(users.id, formCheckComments.authorId))
    .where(and(eq(formCheckComments.formCheckId, row.id), eq(formCheckComments.teamId, actor.teamId)))
    .orderBy(asc(formCheckComments.atSeconds), asc(formCheckComments.createdAt));
  const mediaUrl = await presignGet(row.finalKey, {
    expiresInSeconds: GET_URL_SECONDS,
    contentType: row.contentType,
    fileName: row.fileName,
  });
  return {
    ...toFormCheckDto(row),
    mediaUrl,
    mediaUrlExpiresAt: new Date(now.getTime() + GET_URL_SECONDS * 1000).toISOString(),
    comments: comments.map((c) => ({ ...c, createdAt: c.createdAt.toISOString() })),
  };
}
