import "server-only";
import { db } from "@/db/client";
import { mailDeliveries } from "@/db/schema";
import { sendMail, type MailMessage } from "@/lib/server/mail/send-mail";

export interface Delivery {
  /** recipient × kind × period (or × the promotion), unique in mail_deliveries. */
  key: string;
  kind: string;
  teamId: string | null;
  message: MailMessage;
}

/**
 * Sends a mail at most once per key: the delivery row is inserted and the mail sent inside one
 * transaction. A second attempt (scheduler fired twice, job retried, worker restarted mid-batch)
 * finds the row and skips; a concurrent attempt waits on the unique index, then skips. A failed send
 * rolls the row back so the retry sends. Returns false when it was already sent.
 */
export async function deliverOnce(delivery: Delivery): Promise<boolean> {
  return db.transaction(async (tx) => {
    const inserted = await tx
      .insert(mailDeliveries)
      .values({ dedupeKey: delivery.key, kind: delivery.kind, teamId: delivery.teamId, recipient: delivery.message.to })
      .onConflictDoNothing({ target: mailDeliveries.dedupeKey })
      .returning({ id: mailDeliveries.id });
    if (inserted.length === 0) return false;
    await sendMail(delivery.message);
    return true;
  });
}
