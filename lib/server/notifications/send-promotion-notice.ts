import "server-only";
import { createElement } from "react";
import { db } from "@/db/client";
import { PromotionNoticeEmail } from "@/emails/promotion-notice-email";
import { deliverOnce } from "@/lib/server/jobs/deliver-once";
import { appLink } from "@/lib/server/mail/send-mail";
import { loadPromotion } from "./load-promotion";
import { preferencesFor } from "./preferences";
import { unsubscribeLinks } from "./unsubscribe-link";

/** The athlete's notice of a new rung (cues and caution) and a copy to their primary coach. */
export async function sendPromotionNotice(job: { teamId: string; promotionId: string }): Promise<number> {
  const p = await loadPromotion(db, job.promotionId, job.teamId);
  if (!p || (p.status !== "auto" && p.status !== "approved")) return 0;
  const recipients = [
    p.athleteEmail ? { email: p.athleteEmail, name: p.athleteName, forCoach: false, link: appLink("/today") } : null,
    p.coachEmail && p.coachEmail !== p.athleteEmail
      ? { email: p.coachEmail, name: p.coachName ?? "coach", forCoach: true, link: appLink(`/coach/athletes/${p.athleteId}`) }
      : null,
  ].filter((r) => r !== null);
  const prefs = await preferencesFor(db, recipients.map((r) => r.email));
  let sent = 0;
  for (const r of recipients) {
    if (!prefs.get(r.email.toLowerCase())?.promotionNotices) continue;
    const unsubscribe = unsubscribeLinks({ email: r.email, kind: "promotion", teamId: p.teamId });
    const headline = p.toRungName ? `moved up to ${p.toRungName}` : `finished ${p.ladderName}`;
    const delivered = await deliverOnce({
      key: `promotion:${p.id}:${r.email.toLowerCase()}`,
      kind: "promotion",
      teamId: p.teamId,
      message: {
        to: r.email,
        subject: r.forCoach ? `${p.athleteName} ${headline}` : `You ${headline}`,
        headers: unsubscribe.headers,
        body: createElement(PromotionNoticeEmail, {
          recipientName: r.name,
          athleteName: p.athleteName,
          forCoach: r.forCoach,
          ladderName: p.ladderName,
          fromRungName: p.fromRungName,
          toRungName: p.toRungName,
          cues: p.cues,
          caution: p.caution,
          explanation: p.explanation,
          link: r.link,
          unsubscribeUrl: unsubscribe.page,
        }),
      },
    });
    if (delivered) sent += 1;
  }
  return sent;
}
