import { z } from "zod";
import { MAX_LOOKBACK_SESSIONS, MEASURES, PROMOTION_MODES, RUNG_TAGS, type Measure } from "@/lib/engine";
import { noNul, NUL_MESSAGE, zDate, zId, zName, zPageQuery } from "./common";

/** Input schemas for ladders, rungs, standards and placements (shared by forms and handlers). */

export const zMeasure = z.enum(MEASURES, { error: "Choose a measure." });
export const zPromotionMode = z.enum(PROMOTION_MODES, { error: "Choose auto or approve." });
export const zRungTag = z.enum(RUNG_TAGS, { error: "Unknown tag." });

export const MEASURE_LABELS: Record<Measure, string> = {
  hold_seconds: "Hold (seconds)",
  hold_seconds_each_side: "Hold each side (seconds)",
  reps: "Reps",
  reps_each_side: "Reps each side",
  eccentric_seconds: "Slow lowering (seconds)",
  distance_m: "Distance (metres)",
};

/**
 * Largest sensible per-set target per measure: above these a number is a typo, not a standard
 * (common practice, no source). The database allows up to 3600 for every measure.
 */
export const MAX_MIN_VALUE: Record<Measure, number> = {
  hold_seconds: 600,
  hold_seconds_each_side: 600,
  eccentric_seconds: 60,
  reps: 100,
  reps_each_side: 100,
  distance_m: 1000,
};

const int = (label: string, min: number, max: number) =>
  z
    .number({ error: `${label} must be a number.` })
    .int(`${label} must be a whole number.`)
    .min(min, `${label} must be at least ${min}.`)
    .max(max, `${label} must be at most ${max}.`);

export const ZStepDown = z
  .strictObject({
    painSessions: int("Pain sessions", 1, 10),
    painWindow: int("Pain window", 1, MAX_LOOKBACK_SESSIONS),
    dropBelowPct: int("Drop threshold", 1, 99),
    dropSessions: int("Drop sessions", 1, 10),
  })
  .refine((v) => v.painSessions <= v.painWindow, {
    path: ["painSessions"],
    message: "Pain sessions cannot exceed the pain window.",
  });

export const ZStandardInput = z
  .strictObject({
    sets: int("Sets", 1, 20),
    minValue: z
      .number({ error: "Target must be a number." })
      .positive("Target must be above 0.")
      .max(3600, "Target must be at most 3600."),
    minReps: int("Lowerings per set", 1, 100).nullable().optional(),
    maxRpe: z.number({ error: "RPE must be a number." }).min(1, "RPE runs 1–10.").max(10, "RPE runs 1–10.").nullable().optional(),
    minRir: int("Reps in reserve", 0, 10).nullable().optional(),
    sessionsRequired: int("Sessions required", 1, 20),
    sessionsWindow: int("Sessions window", 1, MAX_LOOKBACK_SESSIONS),
    minDaysOnRung: int("Days on rung", 0, 365),
    painFree: z.boolean({ error: "Say whether sessions must be pain-free." }),
    stepDown: ZStepDown.nullable().optional(),
  })
  .superRefine((v, ctx) => {
    if (v.sessionsRequired > v.sessionsWindow) {
      ctx.addIssue({ code: "custom", path: ["sessionsRequired"], message: "Sessions required cannot exceed the sessions window." });
    }
    if (typeof v.maxRpe === "number" && typeof v.minRir === "number") {
      ctx.addIssue({ code: "custom", path: ["minRir"], message: "Use either an RPE ceiling or reps in reserve, not both." });
    }
  });
export type StandardInput = z.infer<typeof ZStandardInput>;

/** Measure-dependent limits zod cannot see when the measure lives on another object (PATCH). */
export function standardIssues(measure: Measure, standard: Pick<StandardInput, "minValue">): { path: string[]; message: string }[] {
  const max = MAX_MIN_VALUE[measure];
  if (standard.minValue > max) {
    return [{ path: ["minValue"], message: `For ${MEASURE_LABELS[measure].toLowerCase()} the target must be at most ${max}.` }];
  }
  return [];
}

export const zText = (max: number) => z.string().trim().max(max, `Keep it under ${max} characters.`).refine(noNul, NUL_MESSAGE);
export const zLabel = zName;
export const zTargetSkill = z.string().trim().min(1, "Name the target skill.").max(100, "Keep it under 100 characters.").refine(noNul, NUL_MESSAGE);

const zOptionalText = (max: number) => zText(max).nullable().optional();

const zVideoUrl = z
  .url({ protocol: /^https?$/, error: "Use a web address starting with http:// or https://." })
  .max(500, "Keep the address under 500 characters.")
  .nullable()
  .optional();

const zTags = z
  .array(zRungTag)
  .max(RUNG_TAGS.length)
  .refine((tags) => new Set(tags).size === tags.length, "Each tag once.");

const zPrerequisiteIds = z
  .array(zId)
  .max(20, "At most 20 prerequisites.")
  .refine((ids) => new Set(ids).size === ids.length, "Each prerequisite once.");

const rungFields = {
  name: zLabel,
  measure: zMeasure,
  setting: zOptionalText(200),
  cues: zOptionalText(2000),
  caution: zOptionalText(500),
  demoVideoUrl: zVideoUrl,
  tags: zTags.optional(),
  prerequisites: zPrerequisiteIds.optional(),
  standard: ZStandardInput,
};

function refineMeasure(v: { measure?: Measure; standard?: Pick<StandardInput, "minValue"> }, ctx: z.RefinementCtx) {
  if (!v.measure || !v.standard) return;
  for (const issue of standardIssues(v.measure, v.standard)) {
    ctx.addIssue({ code: "custom", path: ["standard", ...issue.path], message: issue.message });
  }
}

export const ZRungInput = z.strictObject(rungFields).superRefine(refineMeasure);
export type RungInput = z.infer<typeof ZRungInput>;

export const ZRungPatch = z
  .strictObject({
    name: rungFields.name.optional(),
    measure: rungFields.measure.optional(),
    setting: rungFields.setting,
    cues: rungFields.cues,
    caution: rungFields.caution,
    demoVideoUrl: rungFields.demoVideoUrl,
    tags: rungFields.tags,
    prerequisites: rungFields.prerequisites,
    standard: ZStandardInput.optional(),
  })
  .superRefine(refineMeasure)
  .refine((v) => Object.keys(v).length > 0, { message: "Send at least one field to change." });
export type RungPatch = z.infer<typeof ZRungPatch>;

const ladderFields = {
  name: zLabel,
  targetSkill: zTargetSkill,
  promotionMode: zPromotionMode,
  notes: zOptionalText(2000),
};

export const ZCreateLadder = z.strictObject({
  ...ladderFields,
  rungs: z.array(ZRungInput).max(50, "At most 50 rungs on a ladder.").default([]),
});
export type CreateLadderInput = z.infer<typeof ZCreateLadder>;

export const ZLadderPatch = z
  .strictObject({
    name: ladderFields.name.optional(),
    targetSkill: ladderFields.targetSkill.optional(),
    promotionMode: ladderFields.promotionMode.optional(),
    notes: ladderFields.notes,
    archived: z.boolean().optional(),
  })
  .refine((v) => Object.keys(v).length > 0, { message: "Send at least one field to change." });
export type LadderPatch = z.infer<typeof ZLadderPatch>;

export const ZDuplicateLadder = z.strictObject({ name: zLabel.optional() });

export const ZRungOrder = z.strictObject({
  rungIds: z
    .array(zId)
    .min(1, "List the ladder's rungs.")
    .max(100)
    .refine((ids) => new Set(ids).size === ids.length, "Each rung once."),
});

export const ZLadderListQuery = zPageQuery.extend({
  q: z.string().trim().max(100).optional(),
  mode: zPromotionMode.optional(),
  archived: z.stringbool().optional(),
});

export const ZPlacement = z.strictObject({
  rungId: zId,
  since: zDate.optional(),
});
export type PlacementInput = z.infer<typeof ZPlacement>;

// ---- Responses ----

export const ZStandard = z.object({
  sets: z.number(),
  minValue: z.number(),
  minReps: z.number().nullable(),
  maxRpe: z.number().nullable(),
  minRir: z.number().nullable(),
  sessionsRequired: z.number(),
  sessionsWindow: z.number(),
  minDaysOnRung: z.number(),
  painFree: z.boolean(),
  stepDown: ZStepDown.nullable(),
});

export const ZPrerequisiteRef = z.object({
  rungId: zId,
  rungName: z.string(),
  ladderId: zId,
  ladderName: z.string(),
});

export const ZRung = z.object({
  id: zId,
  ladderId: zId,
  position: z.number().describe("1..n for live rungs; negative once archived"),
  name: z.string(),
  measure: zMeasure,
  setting: z.string().nullable(),
  cues: z.string().nullable(),
  caution: z.string().nullable(),
  demoVideoUrl: z.string().nullable(),
  tags: z.array(zRungTag),
  archived: z.boolean(),
  athleteCount: z.number().describe("Athletes currently on this rung"),
  prerequisites: z.array(ZPrerequisiteRef),
  standard: ZStandard,
  standardText: z.string().describe("The standard in plain words"),
});
export type RungDto = z.infer<typeof ZRung>;

export const ZLadder = z.object({
  id: zId,
  name: z.string(),
  targetSkill: z.string(),
  notes: z.string().nullable(),
  promotionMode: zPromotionMode,
  starter: z.boolean().describe("Installed from the starter library"),
  archived: z.boolean(),
  rungs: z.array(ZRung).describe("Live rungs, in order"),
  archivedRungs: z.array(ZRung).describe("Archived rungs, kept because athletes, logs or promotions point at them"),
  createdAt: z.string(),
  updatedAt: z.string(),
});
export type LadderDto = z.infer<typeof ZLadder>;

export const ZLadderSummary = z.object({
  id: zId,
  name: z.string(),
  targetSkill: z.string(),
  promotionMode: zPromotionMode,
  starter: z.boolean(),
  archived: z.boolean(),
  rungCount: z.number(),
  athleteCount: z.number(),
  updatedAt: z.string(),
});
export type LadderSummaryDto = z.infer<typeof ZLadderSummary>;

export const ZPosition = z.object({
  ladderId: zId,
  ladderName: z.string(),
  rungId: zId,
  rungName: z.string(),
  rungPosition: z.number(),
  rungArchived: z.boolean(),
  since: z.string(),
  readiness: z.number(),
  status: z.enum(["not_yet", "met", "blocked", "step_down", "pending_approval", "achieved"]),
});
export type PositionDto = z.infer<typeof ZPosition>;
