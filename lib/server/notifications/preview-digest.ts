import "server-only";
import { render } from "@react-email/render";
import { createElement } from "react";
import { db } from "@/db/client";
import { AthleteSummaryEmail } from "@/emails/athlete-summary-email";
import { CoachDigestEmail } from "@/emails/coach-digest-email";
import { NotFound } from "@/lib/errors";
import type { Actor } from "@/lib/server/actor";
import { appLink } from "@/lib/server/mail/send-mail";
import { buildAthleteSummary } from "./build-athlete-summary";
import { buildCoachDigest } from "./build-coach-digest";

/** The HTML of the caller's own digest (staff) or weekly summary (athletes) for a week; sends nothing. */
export async function previewDigest(actor: Actor, week: string): Promise<Response> {
  let element;
  if (actor.role === "athlete") {
    if (!actor.athleteId) throw new NotFound("athlete record");
    const summary = await buildAthleteSummary(db, { teamId: actor.teamId, athleteId: actor.athleteId, week });
    if (!summary) throw new NotFound("athlete record");
    element = createElement(AthleteSummaryEmail, { summary, link: appLink("/today"), unsubscribeUrl: appLink("/settings") });
  } else {
    const digest = await buildCoachDigest(db, { teamId: actor.teamId, userId: actor.userId, week });
    if (!digest) throw new NotFound("digest");
    element = createElement(CoachDigestEmail, { digest, link: appLink("/coach/athletes"), unsubscribeUrl: appLink("/settings") });
  }
  const html = await render(element);
  return new Response(html, { status: 200, headers: { "content-type": "text/html; charset=utf-8" } });
}
