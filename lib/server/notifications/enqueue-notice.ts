import "server-only";
import { eq } from "drizzle-orm";
import type { Tx } from "@/db/client";
import { promotions } from "@/db/schema";
import { enqueueMail } from "@/lib/server/jobs/enqueue-mail";

export interface NoticeInput {
  kind: "promotion" | "approval_needed";
  promotionId: string;
  /** The promotion's team, when the caller has it at hand (saves reading it back). */
  teamId?: string;
}

/**
 * Called by the log (and daily re-evaluation) transaction after a promotion row is written: the
 * notice is queued in the same transaction, so a rolled-back log mails nothing. Preferences are read
 * by the worker at send time.
 */
export async function enqueueNotice(tx: Tx, input: NoticeInput): Promise<void> {
  const teamId = input.teamId ?? (await teamOf(tx, input.promotionId));
  if (!teamId) return;
  await enqueueMail(tx, { kind: input.kind, teamId, promotionId: input.promotionId });
}

async function teamOf(tx: Tx, promotionId: string): Promise<string | null> {
  const [row] = await tx.select({ teamId: promotions.teamId }).from(promotions).where(eq(promotions.id, promotionId));
  return row?.teamId ?? null;
}
