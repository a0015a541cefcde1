import { sql } from "drizzle-orm";
import { date, index, jsonb, pgEnum, pgTable, text, timestamp, uniqueIndex, uuid } from "drizzle-orm/pg-core";
import { createdAt, id } from "./columns";
import { athletePositions, ladders, rungs } from "./ladders";
import { logs } from "./logs";
import { athletes, teamRef, users } from "./teams";

export const promotionStatusEnum = pgEnum("promotion_status", ["pending", "approved", "declined", "auto"]);
export const moveDirectionEnum = pgEnum("move_direction", ["up", "down"]);

/**
 * A proposed or applied move up (or a step down) produced by the engine. `auto` rows were applied at
 * once; `pending` rows wait for a coach. At most one pending proposal per position.
 */
export const promotions = pgTable(
  "promotions",
  {
    id: id(),
    teamId: teamRef(),
    athleteId: uuid("athlete_id")
      .notNull()
      .references(() => athletes.id, { onDelete: "cascade" }),
    ladderId: uuid("ladder_id")
      .notNull()
      .references(() => ladders.id, { onDelete: "cascade" }),
    positionId: uuid("position_id")
      .notNull()
      .references(() => athletePositions.id, { onDelete: "cascade" }),
    fromRungId: uuid("from_rung_id")
      .notNull()
      .references(() => rungs.id, { onDelete: "restrict" }),
    /** Null when the athlete finished the ladder (skill achieved). */
    toRungId: uuid("to_rung_id").references(() => rungs.id, { onDelete: "restrict" }),
    direction: moveDirectionEnum("direction").notNull().default("up"),
    status: promotionStatusEnum("status").notNull(),
    verdict: jsonb("verdict").notNull(),
    logId: uuid("log_id").references(() => logs.id, { onDelete: "set null" }),
    /** The session date that met the standard: the new rung's `since`. */
    effectiveOn: date("effective_on", { mode: "string" }).notNull(),
    decidedById: uuid("decided_by_id").references(() => users.id, { onDelete: "set null" }),
    decidedAt: timestamp("decided_at", { withTimezone: true }),
    createdAt: createdAt(),
  },
  (t) => [
    uniqueIndex("promotions_one_pending_key").on(t.positionId).where(sql`${t.status} = 'pending'`),
    index("promotions_team_status_idx").on(t.teamId, t.status, t.createdAt),
    index("promotions_athlete_idx").on(t.athleteId, t.createdAt),
  ],
);

export const moveCauseEnum = pgEnum("move_cause", ["placement", "auto", "approved", "manual", "step_down"]);

/**
 * The audit of every change of an athlete's rung: who or what, when, from → to, and the verdict that
 * caused it. The athlete's path (the date each rung was reached) is read from here.
 */
export const positionMoves = pgTable(
  "position_moves",
  {
    id: id(),
    teamId: teamRef(),
    athleteId: uuid("athlete_id")
      .notNull()
      .references(() => athletes.id, { onDelete: "cascade" }),
    ladderId: uuid("ladder_id")
      .notNull()
      .references(() => ladders.id, { onDelete: "cascade" }),
    fromRungId: uuid("from_rung_id").references(() => rungs.id, { onDelete: "restrict" }),
    toRungId: uuid("to_rung_id").references(() => rungs.id, { onDelete: "restrict" }),
    cause: moveCauseEnum("cause").notNull(),
    actorUserId: uuid("actor_user_id").references(() => users.id, { onDelete: "set null" }),
    actorKind: text("actor_kind").notNull().default("user"),
    promotionId: uuid("promotion_id").references(() => promotions.id, { onDelete: "set null" }),
    verdict: jsonb("verdict"),
    effectiveOn: date("effective_on", { mode: "string" }).notNull(),
    createdAt: createdAt(),
  },
  (t) => [index("position_moves_athlete_ladder_idx").on(t.athleteId, t.ladderId, t.createdAt)],
);
