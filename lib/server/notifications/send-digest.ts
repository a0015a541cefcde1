import "server-only";
import { and, eq, isNull } from "drizzle-orm";
import { createElement } from "react";
import { db } from "@/db/client";
import { athletes, users } from "@/db/schema";
import { AthleteSummaryEmail } from "@/emails/athlete-summary-email";
import { CoachDigestEmail } from "@/emails/coach-digest-email";
import { deliverOnce } from "@/lib/server/jobs/deliver-once";
import { appLink } from "@/lib/server/mail/send-mail";
import { buildAthleteSummary } from "./build-athlete-summary";
import { buildCoachDigest } from "./build-coach-digest";
import { wantsMail } from "./preferences";
import { unsubscribeLinks } from "./unsubscribe-link";

/** One coach's digest for one ISO week, at most once (key digest:user:week). */
export async function sendDigest(job: { teamId: string; userId: string; week: string }): Promise<number> {
  const [person] = await db
    .select({ email: users.email })
    .from(users)
    .where(and(eq(users.id, job.userId), eq(users.teamId, job.teamId), isNull(users.disabledAt)));
  if (!person || !(await wantsMail(db, person.email, "digest"))) return 0;
  const digest = await buildCoachDigest(db, job);
  if (!digest) return 0;
  const unsubscribe = unsubscribeLinks({ email: person.email, kind: "digest", teamId: job.teamId });
  const sent = await deliverOnce({
    key: `digest:${job.userId}:${job.week}`,
    kind: "digest",
    teamId: job.teamId,
    message: {
      to: person.email,
      subject: `Week ${job.week}: ${digest.promotions.length} promotions, ${digest.pendingApprovals.length} to approve`,
      headers: unsubscribe.headers,
      body: createElement(CoachDigestEmail, { digest, link: appLink("/coach/athletes"), unsubscribeUrl: unsubscribe.page }),
    },
  });
  return sent ? 1 : 0;
}

/** The address an athlete record is reached at: its sign-in's, else the one the coach entered. */
export async function athleteAddress(teamId: string, athleteId: string): Promise<string | null> {
  const [row] = await db
    .select({ own: athletes.email, account: users.email })
    .from(athletes)
    .leftJoin(users, eq(users.id, athletes.userId))
    .where(and(eq(athletes.id, athleteId), eq(athletes.teamId, teamId), isNull(athletes.archivedAt)));
  return row ? (row.account ?? row.own) : null;
}

/** An athlete's weekly summary of their own progress, at most once per week. */
export async function sendAthleteSummary(job: { teamId: string; athleteId: string; week: string }): Promise<number> {
  const email = await athleteAddress(job.teamId, job.athleteId);
  if (!email || !(await wantsMail(db, email, "athlete_summary"))) return 0;
  const summary = await buildAthleteSummary(db, job);
  if (!summary) return 0;
  const unsubscribe = unsubscribeLinks({ email, kind: "athlete_summary", teamId: job.teamId });
  const sent = await deliverOnce({
    key: `athlete_summary:${job.athleteId}:${job.week}`,
    kind: "athlete_summary",
    teamId: job.teamId,
    message: {
      to: email,
      subject: `Your week ${job.week}: ${summary.sessions} training days`,
      headers: unsubscribe.headers,
      body: createElement(AthleteSummaryEmail, { summary, link: appLink("/today"), unsubscribeUrl: unsubscribe.page }),
    },
  });
  return sent ? 1 : 0;
}
