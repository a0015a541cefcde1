import "server-only";
import type { Tx } from "@/db/client";

export interface CommentNotice {
  kind: "form_check_comment";
  commentId: string;
}

/**
 * The hook that tells the athlete about a new comment, called inside the comment's transaction.
 * The e-mail queue is not part of the app yet, so it sends nothing; once the queue's `enqueueNotice`
 * exists, this forwards the notice to it and callers stay unchanged.
 */
export async function notifyComment(_tx: Tx, _notice: CommentNotice): Promise<void> {}
