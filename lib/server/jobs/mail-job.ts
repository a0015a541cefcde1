/** Every mail the worker sends, as the job data stored in the outbox and the queue. */
export type MailJob =
  | { kind: "promotion"; teamId: string; promotionId: string }
  | { kind: "approval_needed"; teamId: string; promotionId: string }
  | { kind: "digest"; teamId: string; userId: string; week: string }
  | { kind: "athlete_summary"; teamId: string; athleteId: string; week: string }
  | { kind: "form_check_comment"; teamId: string; commentId: string }
  | {
      kind: "invite";
      teamId: string;
      inviteId: string;
      to: string;
      teamName: string;
      inviterName: string;
      role: "coach" | "athlete";
      link: string;
      expiresAt: string;
    }
  | { kind: "password_reset"; teamId: string; resetId: string; to: string; name: string; link: string };

export type MailKind = MailJob["kind"];

export const MAIL_QUEUE = "mail";
export const SCHEDULER_QUEUE = "scheduler-tick";
