import { sql } from "drizzle-orm";
import { check, date, index, integer, pgTable, primaryKey, text, timestamp, uniqueIndex, uuid } from "drizzle-orm/pg-core";
import { createdAt, id, updatedAt } from "./columns";
import { ladders } from "./ladders";
import { athletes, teamRef, users } from "./teams";

/** A named group of athletes (a class, a level). An athlete may be in several. */
export const squads = pgTable(
  "squads",
  {
    id: id(),
    teamId: teamRef(),
    name: text("name").notNull(),
    description: text("description"),
    archivedAt: timestamp("archived_at", { withTimezone: true }),
    createdAt: createdAt(),
    updatedAt: updatedAt(),
  },
  (t) => [index("squads_team_idx").on(t.teamId, t.name)],
);

export const squadMembers = pgTable(
  "squad_members",
  {
    teamId: teamRef(),
    squadId: uuid("squad_id")
      .notNull()
      .references(() => squads.id, { onDelete: "cascade" }),
    athleteId: uuid("athlete_id")
      .notNull()
      .references(() => athletes.id, { onDelete: "cascade" }),
  },
  (t) => [primaryKey({ columns: [t.squadId, t.athleteId] }), index("squad_members_athlete_idx").on(t.athleteId)],
);

/** A superset: 2–6 slots done in rotation for N rounds. */
export const blocks = pgTable(
  "blocks",
  {
    id: id(),
    teamId: teamRef(),
    name: text("name").notNull(),
    rounds: integer("rounds").notNull(),
    restBetweenSlotsSec: integer("rest_between_slots_sec").notNull(),
    restBetweenRoundsSec: integer("rest_between_rounds_sec").notNull(),
    notes: text("notes"),
    archivedAt: timestamp("archived_at", { withTimezone: true }),
    createdAt: createdAt(),
    updatedAt: updatedAt(),
  },
  (t) => [
    index("blocks_team_idx").on(t.teamId, t.name),
    check("blocks_rounds", sql`${t.rounds} between 1 and 20`),
    check("blocks_rests", sql`${t.restBetweenSlotsSec} between 0 and 900 and ${t.restBetweenRoundsSec} between 0 and 1800`),
  ],
);

/** A slot points at a ladder, so each athlete works their own current rung of it. */
export const blockSlots = pgTable(
  "block_slots",
  {
    id: id(),
    teamId: teamRef(),
    blockId: uuid("block_id")
      .notNull()
      .references(() => blocks.id, { onDelete: "cascade" }),
    position: integer("position").notNull(),
    ladderId: uuid("ladder_id")
      .notNull()
      .references(() => ladders.id, { onDelete: "restrict" }),
    sets: integer("sets"),
    target: text("target"),
    note: text("note"),
  },
  (t) => [
    uniqueIndex("block_slots_block_position_key").on(t.blockId, t.position),
    check("block_slots_sets", sql`${t.sets} is null or ${t.sets} between 1 and 20`),
  ],
);

/** Ordered blocks on weekdays, repeated for a number of weeks. */
export const plans = pgTable(
  "plans",
  {
    id: id(),
    teamId: teamRef(),
    name: text("name").notNull(),
    weeks: integer("weeks").notNull(),
    warmUp: text("warm_up"),
    coolDown: text("cool_down"),
    archivedAt: timestamp("archived_at", { withTimezone: true }),
    createdAt: createdAt(),
    updatedAt: updatedAt(),
  },
  (t) => [index("plans_team_idx").on(t.teamId, t.name), check("plans_weeks", sql`${t.weeks} between 1 and 104`)],
);

/** One block on one ISO weekday (1 = Monday) of a plan, in order. */
export const planDayBlocks = pgTable(
  "plan_day_blocks",
  {
    teamId: teamRef(),
    planId: uuid("plan_id")
      .notNull()
      .references(() => plans.id, { onDelete: "cascade" }),
    weekday: integer("weekday").notNull(),
    position: integer("position").notNull(),
    blockId: uuid("block_id")
      .notNull()
      .references(() => blocks.id, { onDelete: "restrict" }),
  },
  (t) => [
    primaryKey({ columns: [t.planId, t.weekday, t.position] }),
    check("plan_day_blocks_weekday", sql`${t.weekday} between 1 and 7`),
  ],
);

/** A plan given to an athlete (directly, or through a squad). */
export const assignments = pgTable(
  "assignments",
  {
    id: id(),
    teamId: teamRef(),
    athleteId: uuid("athlete_id")
      .notNull()
      .references(() => athletes.id, { onDelete: "cascade" }),
    planId: uuid("plan_id")
      .notNull()
      .references(() => plans.id, { onDelete: "restrict" }),
    squadId: uuid("squad_id").references(() => squads.id, { onDelete: "set null" }),
    startsOn: date("starts_on", { mode: "string" }).notNull(),
    endsOn: date("ends_on", { mode: "string" }),
    createdById: uuid("created_by_id").references(() => users.id, { onDelete: "set null" }),
    cancelledAt: timestamp("cancelled_at", { withTimezone: true }),
    createdAt: createdAt(),
  },
  (t) => [
    index("assignments_athlete_idx").on(t.athleteId, t.startsOn),
    check("assignments_dates", sql`${t.endsOn} is null or ${t.endsOn} >= ${t.startsOn}`),
  ],
);
