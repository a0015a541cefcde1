import "server-only";
import { eq } from "drizzle-orm";
import type { Tx } from "@/db/client";
import { promotions } from "@/db/schema";
import { enqueueMail } from "@/lib/server/jobs/enqueue-mail";

export interface NoticeInput {
  kind: "promotion" | "approval_needed";
  promotionId: string;
}

/**
 * Called by the log (and daily re-evaluation) transaction after a promotion row is written: the
 * notice is queued in the same transaction, so a rolled-back log mails nothing. Preferences are read
 * by the worker at send time.
 */
export async function enqueueNotice(tx: Tx, input: NoticeInput): Promise<void> {
  const [row] = await tx.select({ teamId: promotions.teamId }).from(promotions).where(eq(promotions.id, input.promotionId));
  if (!row) return;
  await enqueueMail(tx, { kind: input.kind, teamId: row.teamId, promotionId: input.promotionId });
}
