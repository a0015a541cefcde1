import { sql } from "drizzle-orm";
import { boolean, check, date, doublePrecision, index, integer, jsonb, pgTable, text, timestamp, uuid } from "drizzle-orm/pg-core";
import type { SetEntry } from "../../lib/engine/types";
import { createdAt, id, updatedAt } from "./columns";
import { ladders, rungs } from "./ladders";
import { athletes, teamRef, users } from "./teams";

/** One post of training: what an athlete did on a date (entered by them or by a coach). */
export const logs = pgTable(
  "logs",
  {
    id: id(),
    teamId: teamRef(),
    athleteId: uuid("athlete_id")
      .notNull()
      .references(() => athletes.id, { onDelete: "cascade" }),
    performedOn: date("performed_on", { mode: "string" }).notNull(),
    durationMinutes: integer("duration_minutes"),
    sessionRpe: doublePrecision("session_rpe"),
    enteredById: uuid("entered_by_id").references(() => users.id, { onDelete: "set null" }),
    deletedAt: timestamp("deleted_at", { withTimezone: true }),
    createdAt: createdAt(),
    updatedAt: updatedAt(),
  },
  (t) => [
    index("logs_athlete_date_idx").on(t.athleteId, t.performedOn),
    index("logs_team_date_idx").on(t.teamId, t.performedOn),
    check("logs_duration", sql`${t.durationMinutes} is null or ${t.durationMinutes} between 1 and 600`),
    check("logs_session_rpe", sql`${t.sessionRpe} is null or ${t.sessionRpe} between 1 and 10`),
  ],
);

/**
 * One rung's sets within a log. All entries of one athlete on one rung on one date form one session
 * for the standard, however many posts they came in. `bestValue` (the weaker side for each-side
 * measures) is stored for charts and trends.
 */
export const logEntries = pgTable(
  "log_entries",
  {
    id: id(),
    teamId: teamRef(),
    logId: uuid("log_id")
      .notNull()
      .references(() => logs.id, { onDelete: "cascade" }),
    athleteId: uuid("athlete_id")
      .notNull()
      .references(() => athletes.id, { onDelete: "cascade" }),
    ladderId: uuid("ladder_id")
      .notNull()
      .references(() => ladders.id, { onDelete: "cascade" }),
    rungId: uuid("rung_id")
      .notNull()
      .references(() => rungs.id, { onDelete: "restrict" }),
    performedOn: date("performed_on", { mode: "string" }).notNull(),
    sets: jsonb("sets").$type<SetEntry[]>().notNull(),
    bestValue: doublePrecision("best_value"),
    pain: boolean("pain").notNull().default(false),
    note: text("note"),
    deletedAt: timestamp("deleted_at", { withTimezone: true }),
    createdAt: createdAt(),
  },
  (t) => [
    index("log_entries_athlete_rung_date_idx").on(t.athleteId, t.rungId, t.performedOn),
    index("log_entries_team_date_idx").on(t.teamId, t.performedOn, t.athleteId, t.ladderId),
    index("log_entries_log_idx").on(t.logId),
    // The weekly readiness table's per-position figures (sessions and pain in a week).
    index("log_entries_athlete_ladder_date_idx").on(t.athleteId, t.ladderId, t.performedOn),
    // The last pain on a rung, however long ago, without reading the rung's whole history.
    index("log_entries_pain_idx").on(t.athleteId, t.rungId, t.performedOn).where(sql`${t.pain} and ${t.deletedAt} is null`),
  ],
);
