import { sql } from "drizzle-orm";
import { bigint, check, doublePrecision, index, integer, pgEnum, pgTable, text, timestamp, uniqueIndex, uuid } from "drizzle-orm/pg-core";
import { createdAt, id } from "./columns";
import { rungs } from "./ladders";
import { logs } from "./logs";
import { athletes, teamRef, users } from "./teams";

export const uploadStateEnum = pgEnum("upload_state", ["pending", "complete", "rejected"]);

/**
 * One file sent straight from the browser to object storage. It lands on `stagingKey` through a
 * presigned PUT; completion checks its size and leading bytes, then copies it to `finalKey` (a
 * presigned URL cannot be revoked, so nothing is ever served from the staging key).
 */
export const uploads = pgTable(
  "uploads",
  {
    id: id(),
    teamId: teamRef(),
    athleteId: uuid("athlete_id")
      .notNull()
      .references(() => athletes.id, { onDelete: "cascade" }),
    uploaderId: uuid("uploader_id").references(() => users.id, { onDelete: "set null" }),
    purpose: text("purpose").notNull(),
    contentType: text("content_type").notNull(),
    declaredSize: bigint("declared_size", { mode: "number" }).notNull(),
    actualSize: bigint("actual_size", { mode: "number" }),
    state: uploadStateEnum("state").notNull().default("pending"),
    /** For display only (sanitised); never part of a storage key. */
    fileName: text("file_name"),
    stagingKey: text("staging_key").notNull(),
    finalKey: text("final_key"),
    rejectReason: text("reject_reason"),
    createdAt: createdAt(),
    completedAt: timestamp("completed_at", { withTimezone: true }),
  },
  (t) => [
    index("uploads_athlete_state_idx").on(t.athleteId, t.state),
    index("uploads_team_idx").on(t.teamId),
    check("uploads_declared_size", sql`${t.declaredSize} > 0`),
  ],
);

/** A video or photo of an athlete's attempt, for a rung or a log, reviewed by the team's coaches. */
export const formChecks = pgTable(
  "form_checks",
  {
    id: id(),
    teamId: teamRef(),
    athleteId: uuid("athlete_id")
      .notNull()
      .references(() => athletes.id, { onDelete: "cascade" }),
    uploadId: uuid("upload_id")
      .notNull()
      .references(() => uploads.id, { onDelete: "cascade" }),
    rungId: uuid("rung_id").references(() => rungs.id, { onDelete: "set null" }),
    logId: uuid("log_id").references(() => logs.id, { onDelete: "set null" }),
    createdById: uuid("created_by_id").references(() => users.id, { onDelete: "set null" }),
    note: text("note"),
    /** A small JPEG data URL captured in the browser (videos only), shown in lists without a signed URL. */
    poster: text("poster"),
    createdAt: createdAt(),
  },
  (t) => [
    uniqueIndex("form_checks_upload_key").on(t.uploadId),
    index("form_checks_team_created_idx").on(t.teamId, t.createdAt, t.id),
    index("form_checks_athlete_created_idx").on(t.athleteId, t.createdAt, t.id),
  ],
);

/** A comment pinned to a moment of the form check's video (0 for photos). */
export const formCheckComments = pgTable(
  "form_check_comments",
  {
    id: id(),
    teamId: teamRef(),
    formCheckId: uuid("form_check_id")
      .notNull()
      .references(() => formChecks.id, { onDelete: "cascade" }),
    authorId: uuid("author_id").references(() => users.id, { onDelete: "set null" }),
    atSeconds: doublePrecision("at_seconds").notNull(),
    body: text("body").notNull(),
    createdAt: createdAt(),
  },
  (t) => [
    index("form_check_comments_check_idx").on(t.formCheckId, t.atSeconds),
    check("form_check_comments_at", sql`${t.atSeconds} >= 0`),
  ],
);

/**
 * Objects waiting to be removed from storage (an outbox): rows are written in the same transaction
 * that forgets the object, and drained with retries by `drainStorageDeletions`, which the worker calls.
 */
export const storageDeletions = pgTable(
  "storage_deletions",
  {
    id: id(),
    key: text("key").notNull(),
    attempts: integer("attempts").notNull().default(0),
    nextAttemptAt: timestamp("next_attempt_at", { withTimezone: true }).notNull().defaultNow(),
    lastError: text("last_error"),
    createdAt: createdAt(),
  },
  (t) => [index("storage_deletions_due_idx").on(t.nextAttemptAt)],
);
