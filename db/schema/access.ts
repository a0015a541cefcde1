import { check, index, integer, jsonb, pgEnum, pgTable, text, timestamp, uniqueIndex, uuid } from "drizzle-orm/pg-core";
import { sql } from "drizzle-orm";
import { createdAt, id } from "./columns";
import { athletes, teamRef, users } from "./teams";

/** Personal API tokens: only a SHA-256 of the token is kept; the token is shown once. */
export const apiTokens = pgTable(
  "api_tokens",
  {
    id: id(),
    teamId: teamRef(),
    userId: uuid("user_id")
      .notNull()
      .references(() => users.id, { onDelete: "cascade" }),
    name: text("name").notNull(),
    tokenHash: text("token_hash").notNull(),
    /** First characters, so a person can tell their tokens apart. */
    prefix: text("prefix").notNull(),
    lastUsedAt: timestamp("last_used_at", { withTimezone: true }),
    revokedAt: timestamp("revoked_at", { withTimezone: true }),
    createdAt: createdAt(),
  },
  (t) => [uniqueIndex("api_tokens_hash_key").on(t.tokenHash), index("api_tokens_user_idx").on(t.userId)],
);

export const inviteRoleEnum = pgEnum("invite_role", ["coach", "athlete"]);

/** A single-use link that lets someone join a team (as a coach, or as an existing athlete record). */
export const invites = pgTable(
  "invites",
  {
    id: id(),
    teamId: teamRef(),
    email: text("email").notNull(),
    role: inviteRoleEnum("role").notNull(),
    athleteId: uuid("athlete_id").references(() => athletes.id, { onDelete: "cascade" }),
    invitedById: uuid("invited_by_id").references(() => users.id, { onDelete: "set null" }),
    tokenHash: text("token_hash").notNull(),
    expiresAt: timestamp("expires_at", { withTimezone: true }).notNull(),
    acceptedAt: timestamp("accepted_at", { withTimezone: true }),
    createdAt: createdAt(),
  },
  (t) => [
    uniqueIndex("invites_token_key").on(t.tokenHash),
    index("invites_team_idx").on(t.teamId),
    check("invites_athlete_role", sql`(${t.role} = 'athlete') = (${t.athleteId} is not null)`),
  ],
);

/** Password reset links: single use, short-lived. */
export const passwordResets = pgTable(
  "password_resets",
  {
    id: id(),
    userId: uuid("user_id")
      .notNull()
      .references(() => users.id, { onDelete: "cascade" }),
    tokenHash: text("token_hash").notNull(),
    expiresAt: timestamp("expires_at", { withTimezone: true }).notNull(),
    usedAt: timestamp("used_at", { withTimezone: true }),
    createdAt: createdAt(),
  },
  (t) => [uniqueIndex("password_resets_token_key").on(t.tokenHash)],
);

/** Failed sign-in attempts per e-mail + address, shared by every app instance. */
export const signInAttempts = pgTable(
  "sign_in_attempts",
  {
    id: id(),
    key: text("key").notNull(),
    attemptedAt: timestamp("attempted_at", { withTimezone: true }).notNull().defaultNow(),
  },
  (t) => [index("sign_in_attempts_key_idx").on(t.key, t.attemptedAt)],
);

export const idempotencyStateEnum = pgEnum("idempotency_state", ["in_flight", "done"]);

/** Replays of a write answer with the first response; kept at least 24 h. */
export const idempotencyKeys = pgTable(
  "idempotency_keys",
  {
    id: id(),
    /** The caller: a user id, so keys never collide across people. */
    ownerId: uuid("owner_id").notNull(),
    key: text("key").notNull(),
    scope: text("scope").notNull(),
    requestHash: text("request_hash").notNull(),
    state: idempotencyStateEnum("state").notNull().default("in_flight"),
    responseStatus: integer("response_status"),
    responseBody: jsonb("response_body"),
    createdAt: createdAt(),
  },
  (t) => [
    uniqueIndex("idempotency_keys_owner_key").on(t.ownerId, t.scope, t.key),
    index("idempotency_keys_created_idx").on(t.createdAt),
  ],
);

/** Who did what: every move of an athlete and every sensitive change. */
export const auditEvents = pgTable(
  "audit_events",
  {
    id: id(),
    teamId: teamRef(),
    actorUserId: uuid("actor_user_id").references(() => users.id, { onDelete: "set null" }),
    /** "system" for the engine and jobs, else the person. */
    actorKind: text("actor_kind").notNull().default("user"),
    action: text("action").notNull(),
    subjectType: text("subject_type").notNull(),
    subjectId: uuid("subject_id").notNull(),
    data: jsonb("data").notNull().default({}),
    createdAt: createdAt(),
  },
  (t) => [index("audit_events_subject_idx").on(t.teamId, t.subjectType, t.subjectId, t.createdAt)],
);

/** Demo and starter data applied so far, so start-up runs only the missing steps. */
export const seedSteps = pgTable("seed_steps", {
  name: text("name").primaryKey(),
  appliedAt: timestamp("applied_at", { withTimezone: true }).notNull().defaultNow(),
});

