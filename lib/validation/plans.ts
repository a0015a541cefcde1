import { z } from "zod";
import type { Measure } from "@/lib/engine";
import { zDate, zId, zName, zPageQuery } from "./common";

export const WEEKS_MAX = 104;
export const BLOCKS_PER_DAY_MAX = 10;

const zNotes = z.string().trim().max(2000, "Keep it under 2000 characters.");

export const ZPlanDayInput = z.strictObject({
  /** ISO weekday: 1 = Monday … 7 = Sunday. */
  weekday: z.int("Use a whole number.").min(1, "Weekday runs from 1 (Monday) to 7 (Sunday).").max(7, "Weekday runs from 1 (Monday) to 7 (Sunday)."),
  /** The day's blocks in order; the same block may appear twice. */
  blockIds: z.array(zId).max(BLOCKS_PER_DAY_MAX, `At most ${BLOCKS_PER_DAY_MAX} blocks in one day.`),
});

const zDays = z
  .array(ZPlanDayInput)
  .max(7, "A week has 7 days.")
  .superRefine((days, ctx) => {
    const seen = new Set<number>();
    days.forEach((day, index) => {
      if (seen.has(day.weekday)) ctx.addIssue({ code: "custom", path: [index, "weekday"], message: "This weekday is already in the plan." });
      seen.add(day.weekday);
    });
  });

const zWeeks = z.int("Use a whole number.").min(1, "At least 1 week.").max(WEEKS_MAX, `At most ${WEEKS_MAX} weeks.`);

export const ZCreatePlan = z.strictObject({
  name: zName,
  weeks: zWeeks,
  days: zDays,
  warmUp: zNotes.nullable().optional(),
  coolDown: zNotes.nullable().optional(),
});
export type CreatePlanInput = z.infer<typeof ZCreatePlan>;

/** Any subset; `days`, when sent, replaces the whole week. */
export const ZUpdatePlan = z
  .strictObject({
    name: zName.optional(),
    weeks: zWeeks.optional(),
    days: zDays.optional(),
    warmUp: zNotes.nullable().optional(),
    coolDown: zNotes.nullable().optional(),
  })
  .refine((v) => Object.keys(v).length > 0, { message: "Send at least one field to change." });
export type UpdatePlanInput = z.infer<typeof ZUpdatePlan>;

export const ZPlanListQuery = zPageQuery.extend({ archived: z.stringbool().optional() });

export const ZPlan = z.object({
  id: zId,
  name: z.string(),
  weeks: z.number().int(),
  warmUp: z.string().nullable(),
  coolDown: z.string().nullable(),
  archived: z.boolean(),
  days: z.array(
    z.object({
      weekday: z.number().int(),
      blockIds: z.array(zId),
      blocks: z.array(z.object({ id: zId, name: z.string(), durationSec: z.number().int() })),
      /** Estimated seconds for the day: the blocks' estimates plus a change-over between blocks. */
      durationSec: z.number().int(),
    }),
  ),
  createdAt: z.string(),
  updatedAt: z.string(),
});
export type PlanDto = z.infer<typeof ZPlan>;

/** A plan given to an athlete, or to every member of a squad (one assignment per member). */
export const ZCreateAssignment = z
  .strictObject({
    planId: zId,
    startsOn: zDate,
    endsOn: zDate.nullable().optional(),
  })
  .refine((v) => !v.endsOn || v.endsOn >= v.startsOn, { path: ["endsOn"], message: "The end date can't be before the start date." });
export type CreateAssignmentInput = z.infer<typeof ZCreateAssignment>;

export const ZAssignmentListQuery = zPageQuery;

export const ZAssignment = z.object({
  id: zId,
  athleteId: zId,
  athleteName: z.string(),
  planId: zId,
  planName: z.string(),
  squadId: zId.nullable(),
  startsOn: z.string(),
  endsOn: z.string().nullable(),
  /** The last day the plan runs for this athlete: endsOn, or the end of the plan's weeks if sooner. */
  lastDay: z.string(),
  cancelled: z.boolean(),
  /** Only in the answer to an assign: ladders where the athlete was placed on the first live rung. */
  placed: z.array(z.object({ ladderId: zId, rungId: zId })).optional(),
  createdAt: z.string(),
});
export type AssignmentDto = z.infer<typeof ZAssignment>;

export const ZSquadAssignments = z.object({ items: z.array(ZAssignment) });

// ---- The athlete's planned session for one day (planForDay), for the Today page ----

export interface PlannedSlot {
  position: number;
  ladderId: string;
  ladderName: string;
  sets: number | null;
  target: string | null;
  note: string | null;
  /** The athlete's current rung on the ladder; null when they have no position on it yet. */
  rung: { id: string; name: string; measure: Measure } | null;
}

export interface PlannedBlock {
  blockId: string;
  name: string;
  rounds: number;
  restBetweenSlotsSec: number;
  restBetweenRoundsSec: number;
  notes: string | null;
  slots: PlannedSlot[];
  /** Estimated seconds from the athlete's current rungs (the first live rung where unplaced). */
  durationSec: number;
}

export interface PlannedSession {
  assignmentId: string;
  planId: string;
  planName: string;
  /** 1-based week of the plan the date falls in. */
  week: number;
  weeks: number;
  warmUp: string | null;
  coolDown: string | null;
  blocks: PlannedBlock[];
  durationSec: number;
}

export interface PlanForDay {
  /** The team-local date asked about (YYYY-MM-DD). */
  date: string;
  /** ISO weekday of `date`: 1 = Monday … 7 = Sunday. */
  weekday: number;
  /** One entry per active assignment with blocks on that weekday; empty when nothing is planned. */
  items: PlannedSession[];
}
