import "server-only";
import { and, eq, isNull } from "drizzle-orm";
import { db } from "@/db/client";
import { formChecks, logs, rungs, uploads } from "@/db/schema";
import { Conflict, invalidField, NotFound } from "@/lib/errors";
import type { Actor } from "@/lib/server/actor";
import { visibleUploads } from "@/lib/server/uploads/upload-scope";
import { isVideoType, type CreateFormCheckInput } from "@/lib/validation/form-checks";
import { getFormCheck } from "./get-form-check";

/** Turns a completed upload into a form check for its athlete, optionally tied to a rung or a log. */
export async function createFormCheck(actor: Actor, input: CreateFormCheckInput) {
  const id = await db.transaction(async (tx) => {
    const [upload] = await tx
      .select({ id: uploads.id, athleteId: uploads.athleteId, state: uploads.state, contentType: uploads.contentType })
      .from(uploads)
      .where(and(eq(uploads.id, input.uploadId), visibleUploads(actor)))
      .for("update");
    if (!upload) throw new NotFound("upload");
    if (upload.state !== "complete") throw invalidField("uploadId", "Finish the upload before creating the form check.");
    if (input.athleteId && input.athleteId !== upload.athleteId) {
      throw invalidField("athleteId", "The upload was made for another athlete.");
    }
    if (input.poster && !isVideoType(upload.contentType)) {
      throw invalidField("poster", "Only videos take a poster frame.");
    }
    const [taken] = await tx.select({ id: formChecks.id }).from(formChecks).where(eq(formChecks.uploadId, upload.id));
    if (taken) throw new Conflict("This upload already has a form check.");
    if (input.rungId) {
      const [rung] = await tx
        .select({ id: rungs.id })
        .from(rungs)
        .where(and(eq(rungs.id, input.rungId), eq(rungs.teamId, actor.teamId)));
      if (!rung) throw invalidField("rungId", "No such rung in your team.");
    }
    if (input.logId) {
      const [log] = await tx
        .select({ id: logs.id })
        .from(logs)
        .where(and(eq(logs.id, input.logId), eq(logs.teamId, actor.teamId), eq(logs.athleteId, upload.athleteId), isNull(logs.deletedAt)));
      if (!log) throw invalidField("logId", "No such log for this athlete.");
    }
    const [created] = await tx
      .insert(formChecks)
      .values({
        teamId: actor.teamId,
        athleteId: upload.athleteId,
        uploadId: upload.id,
        rungId: input.rungId,
        logId: input.logId,
        createdById: actor.userId,
        note: input.note || null,
        poster: input.poster,
      })
      .returning({ id: formChecks.id });
    return created!.id;
  });
  return getFormCheck(actor, id);
}
