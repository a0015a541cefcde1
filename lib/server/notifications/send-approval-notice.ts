import "server-only";
import { format } from "date-fns";
import { and, eq, isNull } from "drizzle-orm";
import { createElement } from "react";
import { db } from "@/db/client";
import { users } from "@/db/schema";
import { ApprovalRequestEmail } from "@/emails/approval-request-email";
import { deliverOnce } from "@/lib/server/jobs/deliver-once";
import { APPROVAL_LINK_DAYS, approvalLink } from "./approval-link";
import { loadPromotion } from "./load-promotion";
import { preferencesFor } from "./preferences";
import { unsubscribeLinks } from "./unsubscribe-link";

/** Asks the primary coach (or, without one, the owner) to confirm a pending promotion. */
export async function sendApprovalNotice(job: { teamId: string; promotionId: string }): Promise<number> {
  const p = await loadPromotion(db, job.promotionId, job.teamId);
  if (!p || p.status !== "pending") return 0;
  const coaches =
    p.coachId && p.coachEmail
      ? [{ id: p.coachId, name: p.coachName ?? "coach", email: p.coachEmail }]
      : await db
          .select({ id: users.id, name: users.name, email: users.email })
          .from(users)
          .where(and(eq(users.teamId, p.teamId), eq(users.role, "owner"), isNull(users.disabledAt)));
  const prefs = await preferencesFor(db, coaches.map((c) => c.email));
  let sent = 0;
  for (const coach of coaches) {
    if (!prefs.get(coach.email.toLowerCase())?.approvalNotices) continue;
    const unsubscribe = unsubscribeLinks({ email: coach.email, kind: "approval_needed", teamId: p.teamId });
    const now = new Date();
    const delivered = await deliverOnce({
      key: `approval:${p.id}:${coach.email.toLowerCase()}`,
      kind: "approval_needed",
      teamId: p.teamId,
      message: {
        to: coach.email,
        subject: `${p.athleteName} is ready to ${p.direction === "down" ? "step down" : "move up"} on ${p.ladderName}`,
        headers: unsubscribe.headers,
        body: createElement(ApprovalRequestEmail, {
          coachName: coach.name,
          athleteName: p.athleteName,
          ladderName: p.ladderName,
          fromRungName: p.fromRungName,
          toRungName: p.toRungName,
          direction: p.direction,
          explanation: p.explanation,
          link: approvalLink(p.id, coach.id, now),
          expiresOn: format(new Date(now.getTime() + APPROVAL_LINK_DAYS * 86_400_000), "d MMMM yyyy"),
          unsubscribeUrl: unsubscribe.page,
        }),
      },
    });
    if (delivered) sent += 1;
  }
  return sent;
}
