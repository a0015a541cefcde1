import "server-only";
import { and, eq, isNotNull, isNull, ne, or } from "drizzle-orm";
import { db } from "@/db/client";
import { athletes, users } from "@/db/schema";
import { parseIsoWeek } from "@/lib/engine";
import { invalidField } from "@/lib/errors";
import type { Actor } from "@/lib/server/actor";
import { enqueueMail } from "@/lib/server/jobs/enqueue-mail";
import type { MailJob } from "@/lib/server/jobs/mail-job";

/**
 * Queues the week's digests for the actor's team now: one per coach and owner, one summary per
 * athlete with an address. Opt-outs and already-sent digests are skipped by the worker, so running
 * this twice sends each person one mail.
 */
export async function enqueueWeekDigests(actor: Actor, week: string): Promise<{ enqueued: number }> {
  if (!parseIsoWeek(week)) throw invalidField("week", "Use an ISO week like 2026-W49.");
  const staff = await db
    .select({ id: users.id })
    .from(users)
    .where(and(eq(users.teamId, actor.teamId), ne(users.role, "athlete"), isNull(users.disabledAt)));
  const trainees = await db
    .select({ id: athletes.id })
    .from(athletes)
    .leftJoin(users, eq(users.id, athletes.userId))
    .where(and(eq(athletes.teamId, actor.teamId), isNull(athletes.archivedAt), or(isNotNull(athletes.email), isNotNull(users.email))));
  const jobs: MailJob[] = [
    ...staff.map((s): MailJob => ({ kind: "digest", teamId: actor.teamId, userId: s.id, week })),
    ...trainees.map((a): MailJob => ({ kind: "athlete_summary", teamId: actor.teamId, athleteId: a.id, week })),
  ];
  await db.transaction(async (tx) => {
    for (let i = 0; i < jobs.length; i += 1000) await enqueueMail(tx, jobs.slice(i, i + 1000));
  });
  return { enqueued: jobs.length };
}
