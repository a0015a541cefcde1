import { z } from "zod";
import { MEASURES } from "@/lib/engine/types";
import { zDate, zId } from "./common";
import { ZVerdictDto } from "./verdicts";

/** Upper bounds for one set (common practice, no source): nobody holds a skill for an hour or does 300 reps in a set. */
export const SET_LIMITS = { seconds: 3600, reps: 300, metres: 1000, lowerings: 50 } as const;
export const MAX_SETS_PER_ENTRY = 20;
export const MAX_ENTRIES_PER_LOG = 20;
/** Logs can be changed or deleted for this many days after the date they record. */
export const LOG_EDIT_WINDOW_DAYS = 7;
/** Largest accepted log body (413 above it). */
export const LOG_MAX_BODY_BYTES = 64 * 1024;

const zAmount = z.number().min(0, "Must be 0 or more.").max(SET_LIMITS.seconds, `Must be at most ${SET_LIMITS.seconds}.`);
const zRpe = z.number().min(1, "RPE runs from 1 to 10.").max(10, "RPE runs from 1 to 10.").multipleOf(0.5, "Use whole or half RPE steps.");
const zRir = z.number().int("Reps in reserve is a whole number.").min(0, "RIR runs from 0 to 10.").max(10, "RIR runs from 0 to 10.");

/**
 * One set: `value` for one-sided measures, or `left` and `right` for each-side measures; effort as
 * RPE or RIR (not both); `reps` counts lowerings in an eccentric set. Measure-specific limits (reps
 * rungs at most 300 per set) are checked against the rung on the server.
 */
export const ZSet = z
  .strictObject({
    value: zAmount.optional(),
    left: zAmount.optional(),
    right: zAmount.optional(),
    reps: z.number().int("Lowerings are a whole number.").min(1, "At least 1 lowering.").max(SET_LIMITS.lowerings).optional(),
    rpe: zRpe.optional(),
    rir: zRir.optional(),
  })
  .superRefine((set, ctx) => {
    const sided = set.left !== undefined || set.right !== undefined;
    if (set.value === undefined && !sided) ctx.addIssue({ code: "custom", path: ["value"], message: "Enter the seconds or reps of this set." });
    if (set.value !== undefined && sided) ctx.addIssue({ code: "custom", path: ["value"], message: "Send value, or left and right, not both." });
    if (sided && (set.left === undefined || set.right === undefined)) {
      ctx.addIssue({ code: "custom", path: [set.left === undefined ? "left" : "right"], message: "Enter both sides." });
    }
    if (set.rpe !== undefined && set.rir !== undefined) ctx.addIssue({ code: "custom", path: ["rir"], message: "Give effort as RPE or RIR, not both." });
  });
export type SetInput = z.infer<typeof ZSet>;

const zNote = z.string().trim().max(500, "Keep the note under 500 characters.");

export const ZLogEntryInput = z.strictObject({
  rungId: zId,
  sets: z.array(ZSet).min(1, "Log at least one set.").max(MAX_SETS_PER_ENTRY, `At most ${MAX_SETS_PER_ENTRY} sets per rung.`),
  pain: z.boolean().default(false),
  note: zNote.nullish(),
});

const zDuration = z.number().int("Whole minutes.").min(1, "At least 1 minute.").max(600, "At most 600 minutes.");
const zSessionRpe = z.number().min(1, "Session RPE runs from 1 to 10.").max(10, "Session RPE runs from 1 to 10.");

/** POST /api/v1/logs (with an Idempotency-Key header). */
export const ZCreateLog = z.strictObject({
  athleteId: zId.optional(),
  performedOn: zDate,
  durationMinutes: zDuration.nullish(),
  sessionRpe: zSessionRpe.nullish(),
  entries: z.array(ZLogEntryInput).min(1, "Log at least one rung.").max(MAX_ENTRIES_PER_LOG, `At most ${MAX_ENTRIES_PER_LOG} rungs per log.`),
});
export type CreateLogInput = z.input<typeof ZCreateLog>;
export type CreateLog = z.output<typeof ZCreateLog>;

/** PATCH /api/v1/logs/{id}: session figures and the sets, pain and note of existing entries. */
export const ZUpdateLog = z
  .strictObject({
    durationMinutes: zDuration.nullable().optional(),
    sessionRpe: zSessionRpe.nullable().optional(),
    entries: z
      .array(
        z.strictObject({
          id: zId,
          sets: z.array(ZSet).min(1, "Keep at least one set.").max(MAX_SETS_PER_ENTRY).optional(),
          pain: z.boolean().optional(),
          note: zNote.nullable().optional(),
        }),
      )
      .max(MAX_ENTRIES_PER_LOG)
      .optional(),
  })
  .refine((v) => Object.keys(v).length > 0, "Send at least one field to change.");
export type UpdateLog = z.output<typeof ZUpdateLog>;

export const ZLogsQuery = z.strictObject({
  from: zDate.optional(),
  to: zDate.optional(),
  cursor: z.string().max(500).optional(),
  limit: z.coerce.number().int().min(1).max(100).default(30),
});

export const ZTodayQuery = z.strictObject({ date: zDate.optional() });

// ── Responses ──────────────────────────────────────────────────────────────────────────────────

export const ZSetDto = z
  .object({
    value: z.number().nullish(),
    left: z.number().nullish(),
    right: z.number().nullish(),
    reps: z.number().nullish(),
    rpe: z.number().nullish(),
    rir: z.number().nullish(),
  })
  .meta({ id: "Set" });

export const ZLogEntryDto = z
  .object({
    id: z.uuid(),
    ladderId: z.uuid(),
    rungId: z.uuid(),
    sets: z.array(ZSetDto),
    bestValue: z.number().nullable(),
    pain: z.boolean(),
    note: z.string().nullable(),
  })
  .meta({ id: "LogEntry" });
export type LogEntryDto = z.infer<typeof ZLogEntryDto>;

export const ZLogDto = z
  .object({
    id: z.uuid(),
    athleteId: z.uuid(),
    performedOn: z.string(),
    durationMinutes: z.number().nullable(),
    sessionRpe: z.number().nullable(),
    enteredById: z.uuid().nullable(),
    createdAt: z.string(),
    entries: z.array(ZLogEntryDto),
  })
  .meta({ id: "Log" });
export type LogDto = z.infer<typeof ZLogDto>;

export const ZLogWithVerdicts = ZLogDto.extend({ verdicts: z.array(ZVerdictDto) }).meta({ id: "LogWithVerdicts" });
export type LogWithVerdicts = z.infer<typeof ZLogWithVerdicts>;

export const ZStandardDto = z
  .object({
    sets: z.number(),
    minValue: z.number(),
    minReps: z.number().nullable(),
    maxRpe: z.number().nullable(),
    minRir: z.number().nullable(),
    sessionsRequired: z.number(),
    sessionsWindow: z.number(),
    minDaysOnRung: z.number(),
    painFree: z.boolean(),
  })
  .meta({ id: "StandardSummary" });

/** An athlete's current rung on one ladder, as Today shows it. */
export const ZTodayRung = z
  .object({
    ladderId: z.uuid(),
    ladderName: z.string(),
    rungId: z.uuid(),
    rungName: z.string(),
    measure: z.enum(MEASURES),
    setting: z.string().nullable(),
    cues: z.string().nullable(),
    caution: z.string().nullable(),
    standard: ZStandardDto.nullable(),
    /** The standard in plain words. */
    standardText: z.string().nullable(),
    readiness: z.number(),
    status: z.string(),
    /** The engine's verdict in plain words: "2 of 3 sessions met — needs 3 more days on this rung". */
    explanation: z.string().nullable(),
    since: z.string(),
    /** Entries already logged on this rung on the day (all posts), oldest first. */
    logged: z.array(ZLogEntryDto.extend({ logId: z.uuid() })),
  })
  .meta({ id: "TodayRung" });
export type TodayRung = z.infer<typeof ZTodayRung>;

export const ZTodaySlot = z.object({
  ladderId: z.uuid(),
  ladderName: z.string(),
  sets: z.number().nullable(),
  target: z.string().nullable(),
  note: z.string().nullable(),
  /** Null when the athlete is not placed on the slot's ladder yet. */
  rung: ZTodayRung.nullable(),
});

export const ZTodayBlock = z.object({
  id: z.string(),
  name: z.string(),
  rounds: z.number(),
  restBetweenSlotsSec: z.number(),
  restBetweenRoundsSec: z.number(),
  slots: z.array(ZTodaySlot),
});

export const ZToday = z
  .object({
    athleteId: z.uuid(),
    athleteName: z.string(),
    date: z.string(),
    timeZone: z.string(),
    blocks: z.array(ZTodayBlock),
    /** Every ladder the athlete is placed on, so unplanned work can still be logged. */
    positions: z.array(ZTodayRung),
    /** The day's logs (session RPE and minutes live on the first one). */
    logs: z.array(z.object({ id: z.uuid(), durationMinutes: z.number().nullable(), sessionRpe: z.number().nullable() })),
  })
  .meta({ id: "Today" });
export type TodayDto = z.infer<typeof ZToday>;
export type TodayBlockDto = z.infer<typeof ZTodayBlock>;
export type TodaySlotDto = z.infer<typeof ZTodaySlot>;
