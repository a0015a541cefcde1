import "server-only";
import { and, eq, inArray, isNull, ne, sql } from "drizzle-orm";
import { db } from "@/db/client";
import { athletes, mailDeliveries, notificationPreferences, teams, users } from "@/db/schema";
import { dueDigestWeek } from "./due-digests";
import { enqueueMail } from "./enqueue-mail";
import type { MailJob } from "./mail-job";

/**
 * The scheduler tick: enqueues every coach digest and athlete summary whose send moment has passed
 * this week and that was not delivered yet. Firing twice is harmless: delivery is once per key.
 */
export async function enqueueDueDigests(now: Date): Promise<number> {
  const staff = await db
    .select({
      userId: users.id,
      teamId: users.teamId,
      timeZone: teams.timeZone,
      on: sql<boolean>`coalesce(${notificationPreferences.weeklyDigest}, true)`,
      weekday: sql<number>`coalesce(${notificationPreferences.digestWeekday}, 1)::int`,
      hour: sql<number>`coalesce(${notificationPreferences.digestHour}, 7)::int`,
    })
    .from(users)
    .innerJoin(teams, eq(teams.id, users.teamId))
    .leftJoin(notificationPreferences, eq(notificationPreferences.email, users.email))
    .where(and(ne(users.role, "athlete"), isNull(users.disabledAt)));
  const address = sql`coalesce(${users.email}, ${athletes.email})`;
  const trainees = await db
    .select({
      athleteId: athletes.id,
      teamId: athletes.teamId,
      timeZone: teams.timeZone,
      on: sql<boolean>`coalesce(${notificationPreferences.athleteSummary}, true)`,
      weekday: sql<number>`coalesce(${notificationPreferences.digestWeekday}, 1)::int`,
      hour: sql<number>`coalesce(${notificationPreferences.digestHour}, 7)::int`,
    })
    .from(athletes)
    .innerJoin(teams, eq(teams.id, athletes.teamId))
    .leftJoin(users, eq(users.id, athletes.userId))
    .leftJoin(notificationPreferences, eq(notificationPreferences.email, address))
    .where(and(isNull(athletes.archivedAt), sql`${address} is not null`));

  const candidates: { key: string; job: MailJob }[] = [];
  for (const s of staff) {
    const week = s.on ? dueDigestWeek(now, s.timeZone, { digestWeekday: s.weekday, digestHour: s.hour }) : null;
    if (week) candidates.push({ key: `digest:${s.userId}:${week}`, job: { kind: "digest", teamId: s.teamId, userId: s.userId, week } });
  }
  for (const a of trainees) {
    const week = a.on ? dueDigestWeek(now, a.timeZone, { digestWeekday: a.weekday, digestHour: a.hour }) : null;
    if (week) {
      candidates.push({
        key: `athlete_summary:${a.athleteId}:${week}`,
        job: { kind: "athlete_summary", teamId: a.teamId, athleteId: a.athleteId, week },
      });
    }
  }
  if (candidates.length === 0) return 0;
  const sent = new Set<string>();
  for (let i = 0; i < candidates.length; i += 5000) {
    const keys = candidates.slice(i, i + 5000).map((c) => c.key);
    const rows = await db.select({ key: mailDeliveries.dedupeKey }).from(mailDeliveries).where(inArray(mailDeliveries.dedupeKey, keys));
    for (const row of rows) sent.add(row.key);
  }
  const due = candidates.filter((c) => !sent.has(c.key)).map((c) => c.job);
  for (let i = 0; i < due.length; i += 1000) await enqueueMail(db, due.slice(i, i + 1000));
  return due.length;
}
