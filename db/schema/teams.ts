import { sql } from "drizzle-orm";
import { check, index, pgEnum, pgTable, text, timestamp, uniqueIndex, uuid } from "drizzle-orm/pg-core";
import { createdAt, id, updatedAt } from "./columns";

export const roleEnum = pgEnum("role", ["owner", "coach", "athlete"]);

/** One coaching business. Every team-owned row carries its id. */
export const teams = pgTable("teams", {
  id: id(),
  name: text("name").notNull(),
  /** IANA zone: days on a rung, ISO weeks and digests are counted in it. */
  timeZone: text("time_zone").notNull(),
  createdAt: createdAt(),
  updatedAt: updatedAt(),
});

/** The team a row belongs to: every team-owned table has one, and goes when its team goes. */
export const teamRef = () =>
  uuid("team_id")
    .notNull()
    .references(() => teams.id, { onDelete: "cascade" });

/** A person who can sign in. One person belongs to one team, with one role. */
export const users = pgTable(
  "users",
  {
    id: id(),
    teamId: teamRef(),
    email: text("email").notNull(),
    name: text("name").notNull(),
    role: roleEnum("role").notNull(),
    passwordHash: text("password_hash").notNull(),
    disabledAt: timestamp("disabled_at", { withTimezone: true }),
    createdAt: createdAt(),
    updatedAt: updatedAt(),
  },
  (t) => [
    uniqueIndex("users_email_key").on(t.email),
    index("users_team_idx").on(t.teamId),
    check("users_email_normalised", sql`${t.email} = lower(trim(${t.email}))`),
  ],
);

/**
 * Someone a coach trains. May have no sign-in at all: the coach logs for them. `userId` links the
 * record to an account once an invite is accepted.
 */
export const athletes = pgTable(
  "athletes",
  {
    id: id(),
    teamId: teamRef(),
    name: text("name").notNull(),
    email: text("email"),
    userId: uuid("user_id").references(() => users.id, { onDelete: "set null" }),
    primaryCoachId: uuid("primary_coach_id").references(() => users.id, { onDelete: "set null" }),
    notes: text("notes"),
    archivedAt: timestamp("archived_at", { withTimezone: true }),
    createdAt: createdAt(),
    updatedAt: updatedAt(),
  },
  (t) => [
    index("athletes_team_name_idx").on(t.teamId, t.name),
    uniqueIndex("athletes_user_key").on(t.userId),
    uniqueIndex("athletes_team_email_key").on(t.teamId, t.email),
    check("athletes_email_normalised", sql`${t.email} is null or ${t.email} = lower(trim(${t.email}))`),
  ],
);
