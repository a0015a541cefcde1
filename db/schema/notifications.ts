import { sql } from "drizzle-orm";
import { bigserial, boolean, check, date, index, jsonb, pgTable, smallint, text, timestamp, uniqueIndex, uuid } from "drizzle-orm/pg-core";
import { createdAt, updatedAt } from "./columns";
import { teamRef, teams } from "./teams";

/**
 * What mail a person wants, keyed by address: an athlete record without a sign-in still has an
 * address and may opt out through the link in a mail. No row means the defaults below.
 */
export const notificationPreferences = pgTable(
  "notification_preferences",
  {
    email: text("email").primaryKey(),
    teamId: teamRef(),
    promotionNotices: boolean("promotion_notices").notNull().default(true),
    approvalNotices: boolean("approval_notices").notNull().default(true),
    weeklyDigest: boolean("weekly_digest").notNull().default(true),
    /** ISO weekday 1 (Monday) … 7 (Sunday), in the team's time zone. */
    digestWeekday: smallint("digest_weekday").notNull().default(1),
    digestHour: smallint("digest_hour").notNull().default(7),
    athleteSummary: boolean("athlete_summary").notNull().default(true),
    updatedAt: updatedAt(),
  },
  (t) => [
    index("notification_preferences_team_idx").on(t.teamId),
    check("notification_preferences_weekday", sql`${t.digestWeekday} between 1 and 7`),
    check("notification_preferences_hour", sql`${t.digestHour} between 0 and 23`),
    check("notification_preferences_email_normalised", sql`${t.email} = lower(trim(${t.email}))`),
  ],
);

/**
 * Transactional outbox: requests write the mail job here inside their own transaction (so a rolled
 * back request enqueues nothing); the worker moves rows into the pg-boss queue and deletes them in
 * one transaction of its own.
 */
export const mailOutbox = pgTable("mail_outbox", {
  id: bigserial("id", { mode: "number" }).primaryKey(),
  job: jsonb("job").notNull(),
  createdAt: createdAt(),
});

/**
 * One row per mail actually sent for a recipient × kind × period (or × promotion). The worker inserts
 * it in the same transaction as the send, so a re-run of a job, a second scheduler tick or a restart
 * after a crash never mails the same thing twice.
 */
export const mailDeliveries = pgTable(
  "mail_deliveries",
  {
    id: uuid("id").primaryKey().defaultRandom(),
    dedupeKey: text("dedupe_key").notNull(),
    teamId: uuid("team_id").references(() => teams.id, { onDelete: "cascade" }),
    recipient: text("recipient").notNull(),
    kind: text("kind").notNull(),
    sentAt: timestamp("sent_at", { withTimezone: true }).notNull().defaultNow(),
  },
  (t) => [uniqueIndex("mail_deliveries_dedupe_key").on(t.dedupeKey), index("mail_deliveries_team_idx").on(t.teamId, t.sentAt)],
);

/** Signed single-use links (approve, unsubscribe) that have been used, by their nonce. */
export const usedMailLinks = pgTable("used_mail_links", {
  nonce: text("nonce").primaryKey(),
  usedAt: timestamp("used_at", { withTimezone: true }).notNull().defaultNow(),
});

/** The daily re-evaluation of a team, claimed once per local date. */
export const dailyEvaluations = pgTable(
  "daily_evaluations",
  {
    teamId: teamRef(),
    localDate: date("local_date", { mode: "string" }).notNull(),
    result: jsonb("result").notNull().default({}),
    createdAt: createdAt(),
  },
  (t) => [uniqueIndex("daily_evaluations_team_date_key").on(t.teamId, t.localDate)],
);
