import "server-only";
import { createElement } from "react";
import { format } from "date-fns";
import { InviteEmail } from "@/emails/invite-email";
import { PasswordResetEmail } from "@/emails/password-reset-email";
import { sendApprovalNotice } from "@/lib/server/notifications/send-approval-notice";
import { sendAthleteSummary, sendDigest } from "@/lib/server/notifications/send-digest";
import { sendFormCheckCommentNotice } from "@/lib/server/notifications/send-form-check-comment-notice";
import { sendPromotionNotice } from "@/lib/server/notifications/send-promotion-notice";
import { deliverOnce } from "./deliver-once";
import type { MailJob } from "./mail-job";

/** Runs one mail job; returns how many messages went out. Throws to have the queue retry it. */
export async function handleMailJob(job: MailJob): Promise<number> {
  switch (job.kind) {
    case "promotion":
      return sendPromotionNotice(job);
    case "approval_needed":
      return sendApprovalNotice(job);
    case "digest":
      return sendDigest(job);
    case "athlete_summary":
      return sendAthleteSummary(job);
    case "form_check_comment":
      return sendFormCheckCommentNotice(job);
    case "invite": {
      // Security mail: sent whatever the preferences say.
      const sent = await deliverOnce({
        key: `invite:${job.inviteId}`,
        kind: "invite",
        teamId: job.teamId,
        message: {
          to: job.to,
          subject: `${job.inviterName} invited you to ${job.teamName} on Rungwise`,
          body: createElement(InviteEmail, {
            teamName: job.teamName,
            inviterName: job.inviterName,
            role: job.role,
            link: job.link,
            expiresOn: format(new Date(job.expiresAt), "d MMMM yyyy"),
          }),
        },
      });
      return sent ? 1 : 0;
    }
    case "password_reset": {
      const sent = await deliverOnce({
        key: `password_reset:${job.resetId}`,
        kind: "password_reset",
        teamId: job.teamId,
        message: {
          to: job.to,
          subject: "Choose a new Rungwise password",
          body: createElement(PasswordResetEmail, { name: job.name, link: job.link }),
        },
      });
      return sent ? 1 : 0;
    }
  }
}
