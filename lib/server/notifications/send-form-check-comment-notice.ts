import "server-only";
import { and, eq } from "drizzle-orm";
import { createElement } from "react";
import { db } from "@/db/client";
import { athletes, formCheckComments, formChecks, users } from "@/db/schema";
import { FormCheckCommentEmail } from "@/emails/form-check-comment-email";
import { deliverOnce } from "@/lib/server/jobs/deliver-once";
import { appLink } from "@/lib/server/mail/send-mail";
import { preferencesFor } from "./preferences";
import { unsubscribeLinks } from "./unsubscribe-link";

const clock = (seconds: number) =>
  `${String(Math.floor(seconds / 60)).padStart(2, "0")}:${String(Math.floor(seconds % 60)).padStart(2, "0")}`;

/** One e-mail to the athlete (when they have an address and want training notices) per comment. */
export async function sendFormCheckCommentNotice(job: { teamId: string; commentId: string }): Promise<number> {
  const [row] = await db
    .select({
      commentId: formCheckComments.id,
      formCheckId: formChecks.id,
      atSeconds: formCheckComments.atSeconds,
      body: formCheckComments.body,
      coachName: users.name,
      athleteName: athletes.name,
      athleteEmail: athletes.email,
    })
    .from(formCheckComments)
    .innerJoin(formChecks, eq(formChecks.id, formCheckComments.formCheckId))
    .innerJoin(athletes, eq(athletes.id, formChecks.athleteId))
    .leftJoin(users, eq(users.id, formCheckComments.authorId))
    .where(and(eq(formCheckComments.id, job.commentId), eq(formCheckComments.teamId, job.teamId)));
  if (!row?.athleteEmail) return 0;
  const prefs = await preferencesFor(db, [row.athleteEmail]);
  if (prefs.get(row.athleteEmail.toLowerCase())?.promotionNotices === false) return 0;
  const unsubscribe = unsubscribeLinks({ email: row.athleteEmail, kind: "promotion", teamId: job.teamId });
  const at = clock(row.atSeconds);
  const sent = await deliverOnce({
    key: `form_check_comment:${row.commentId}`,
    kind: "form_check_comment",
    teamId: job.teamId,
    message: {
      to: row.athleteEmail,
      subject: `${row.coachName ?? "Your coach"} commented on your form check at ${at}`,
      headers: unsubscribe.headers,
      body: createElement(FormCheckCommentEmail, {
        athleteName: row.athleteName,
        coachName: row.coachName ?? "Your coach",
        at,
        body: row.body,
        link: appLink(`/form-checks/${row.formCheckId}`),
        unsubscribeUrl: unsubscribe.page,
      }),
    },
  });
  return sent ? 1 : 0;
}
