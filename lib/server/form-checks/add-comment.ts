import "server-only";
import { and, eq } from "drizzle-orm";
import { db } from "@/db/client";
import { formCheckComments, formChecks } from "@/db/schema";
import { NotFound } from "@/lib/errors";
import type { Actor } from "@/lib/server/actor";
import type { CreateCommentInput, FormCheckCommentDto } from "@/lib/validation/form-checks";
import { visibleFormChecks } from "./form-check-scope";
import { enqueueMail } from "@/lib/server/jobs/enqueue-mail";

/** A staff comment pinned to a moment of the video; the athlete is told through the e-mail queue. */
export async function addComment(actor: Actor, formCheckId: string, input: CreateCommentInput): Promise<FormCheckCommentDto> {
  return db.transaction(async (tx) => {
    const [check] = await tx
      .select({ id: formChecks.id })
      .from(formChecks)
      .where(and(eq(formChecks.id, formCheckId), visibleFormChecks(actor)));
    if (!check) throw new NotFound("form check");
    const [comment] = await tx
      .insert(formCheckComments)
      .values({ teamId: actor.teamId, formCheckId: check.id, authorId: actor.userId, atSeconds: input.atSeconds, body: input.body })
      .returning({ id: formCheckComments.id, atSeconds: formCheckComments.atSeconds, body: formCheckComments.body, createdAt: formCheckComments.createdAt });
    // The athlete hears about it by e-mail, queued with the comment (nothing is sent on rollback).
    await enqueueMail(tx, { kind: "form_check_comment", teamId: actor.teamId, commentId: comment!.id });
    return {
      id: comment!.id,
      atSeconds: comment!.atSeconds,
      body: comment!.body,
      authorId: actor.userId,
      authorName: actor.name,
      createdAt: comment!.createdAt.toISOString(),
    };
  });
}
