import { sql } from "drizzle-orm";
import {
  boolean,
  check,
  date,
  doublePrecision,
  index,
  integer,
  jsonb,
  pgEnum,
  pgTable,
  primaryKey,
  text,
  timestamp,
  unique,
  uniqueIndex,
  uuid,
} from "drizzle-orm/pg-core";
import type { StepDownRule } from "../../lib/engine/types";
import { createdAt, id, updatedAt } from "./columns";
import { athletes, teamRef } from "./teams";

export const promotionModeEnum = pgEnum("promotion_mode", ["auto", "approve"]);
export const measureEnum = pgEnum("measure", [
  "hold_seconds",
  "reps",
  "eccentric_seconds",
  "distance_m",
  "hold_seconds_each_side",
  "reps_each_side",
]);

/** Ordered progressions toward one target skill. */
export const ladders = pgTable(
  "ladders",
  {
    id: id(),
    teamId: teamRef(),
    name: text("name").notNull(),
    targetSkill: text("target_skill").notNull(),
    notes: text("notes"),
    promotionMode: promotionModeEnum("promotion_mode").notNull().default("auto"),
    /** Key of the starter-library ladder it was installed from, if any. */
    starterKey: text("starter_key"),
    archivedAt: timestamp("archived_at", { withTimezone: true }),
    createdAt: createdAt(),
    updatedAt: updatedAt(),
  },
  (t) => [index("ladders_team_name_idx").on(t.teamId, t.name)],
);

/**
 * One progression on a ladder. Live rungs hold positions 1..n; an archived rung moves to a negative
 * position so it keeps its row (and every athlete, log and promotion pointing at it) without taking a
 * live slot. The (ladder, position) unique constraint is made DEFERRABLE INITIALLY DEFERRED by hand in
 * drizzle/0001 (drizzle-kit cannot express it), so a reorder can swap positions in one transaction.
 */
export const rungs = pgTable(
  "rungs",
  {
    id: id(),
    teamId: teamRef(),
    ladderId: uuid("ladder_id")
      .notNull()
      .references(() => ladders.id, { onDelete: "cascade" }),
    position: integer("position").notNull(),
    name: text("name").notNull(),
    measure: measureEnum("measure").notNull(),
    setting: text("setting"),
    cues: text("cues"),
    caution: text("caution"),
    demoVideoUrl: text("demo_video_url"),
    tags: text("tags").array().notNull().default(sql`'{}'::text[]`),
    starterKey: text("starter_key"),
    archivedAt: timestamp("archived_at", { withTimezone: true }),
    createdAt: createdAt(),
    updatedAt: updatedAt(),
  },
  (t) => [
    unique("rungs_ladder_position_key").on(t.ladderId, t.position),
    index("rungs_team_idx").on(t.teamId),
    check("rungs_archived_position", sql`(${t.archivedAt} is null) = (${t.position} > 0)`),
  ],
);

/** A rung on another ladder that must be reached first. */
export const rungPrerequisites = pgTable(
  "rung_prerequisites",
  {
    teamId: teamRef(),
    rungId: uuid("rung_id")
      .notNull()
      .references(() => rungs.id, { onDelete: "cascade" }),
    requiresRungId: uuid("requires_rung_id")
      .notNull()
      .references(() => rungs.id, { onDelete: "cascade" }),
  },
  (t) => [
    primaryKey({ columns: [t.rungId, t.requiresRungId] }),
    check("rung_prerequisites_not_self", sql`${t.rungId} <> ${t.requiresRungId}`),
  ],
);

/** The readiness rule on one rung (exactly one per rung). */
export const standards = pgTable(
  "standards",
  {
    rungId: uuid("rung_id")
      .primaryKey()
      .references(() => rungs.id, { onDelete: "cascade" }),
    teamId: teamRef(),
    sets: integer("sets").notNull(),
    minValue: doublePrecision("min_value").notNull(),
    minReps: integer("min_reps"),
    maxRpe: doublePrecision("max_rpe"),
    minRir: integer("min_rir"),
    sessionsRequired: integer("sessions_required").notNull(),
    sessionsWindow: integer("sessions_window").notNull(),
    minDaysOnRung: integer("min_days_on_rung").notNull(),
    painFree: boolean("pain_free").notNull().default(true),
    stepDown: jsonb("step_down").$type<StepDownRule | null>(),
    updatedAt: updatedAt(),
  },
  (t) => [
    check("standards_sets", sql`${t.sets} between 1 and 20`),
    check("standards_min_value", sql`${t.minValue} > 0 and ${t.minValue} <= 3600`),
    check("standards_min_reps", sql`${t.minReps} is null or ${t.minReps} between 1 and 100`),
    check("standards_effort", sql`not (${t.maxRpe} is not null and ${t.minRir} is not null)`),
    check("standards_max_rpe", sql`${t.maxRpe} is null or ${t.maxRpe} between 1 and 10`),
    check("standards_min_rir", sql`${t.minRir} is null or ${t.minRir} between 0 and 10`),
    check("standards_window", sql`${t.sessionsRequired} between 1 and ${t.sessionsWindow} and ${t.sessionsWindow} <= 20`),
    check("standards_days", sql`${t.minDaysOnRung} between 0 and 365`),
  ],
);

export const positionStatusEnum = pgEnum("position_status", [
  "not_yet",
  "met",
  "blocked",
  "step_down",
  "pending_approval",
  "achieved",
]);

/**
 * Where an athlete stands on a ladder, plus the figures the coach's table sorts and filters on,
 * kept current in the same transaction as each log.
 */
export const athletePositions = pgTable(
  "athlete_positions",
  {
    id: id(),
    teamId: teamRef(),
    athleteId: uuid("athlete_id")
      .notNull()
      .references(() => athletes.id, { onDelete: "cascade" }),
    ladderId: uuid("ladder_id")
      .notNull()
      .references(() => ladders.id, { onDelete: "cascade" }),
    // Restrict: a rung someone stands on is archived, never deleted.
    rungId: uuid("rung_id")
      .notNull()
      .references(() => rungs.id, { onDelete: "restrict" }),
    since: date("since", { mode: "string" }).notNull(),
    readiness: integer("readiness").notNull().default(0),
    status: positionStatusEnum("status").notNull().default("not_yet"),
    lastSessionOn: date("last_session_on", { mode: "string" }),
    lastPainOn: date("last_pain_on", { mode: "string" }),
    sessionsMet: integer("sessions_met").notNull().default(0),
    achievedAt: timestamp("achieved_at", { withTimezone: true }),
    createdAt: createdAt(),
    updatedAt: updatedAt(),
  },
  (t) => [
    uniqueIndex("athlete_positions_athlete_ladder_key").on(t.athleteId, t.ladderId),
    index("athlete_positions_team_status_idx").on(t.teamId, t.status),
    index("athlete_positions_team_readiness_idx").on(t.teamId, t.readiness),
    index("athlete_positions_rung_idx").on(t.rungId),
    check("athlete_positions_readiness", sql`${t.readiness} between 0 and 100`),
  ],
);
