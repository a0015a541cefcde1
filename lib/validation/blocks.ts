import { z } from "zod";
import { MEASURES, RUNG_TAGS } from "@/lib/engine";
import { zId, zName, zPageQuery } from "./common";

export const SLOTS_MIN = 2;
export const SLOTS_MAX = 6;
export const ROUNDS_MAX = 20;
export const REST_BETWEEN_SLOTS_MAX = 900;
export const REST_BETWEEN_ROUNDS_MAX = 1800;

const zShortText = (max: number) => z.string().trim().max(max, `Keep it under ${max} characters.`);

export const ZBlockSlotInput = z.strictObject({
  ladderId: zId,
  /** Total sets of this slot in the block; absent: one per round. */
  sets: z.int("Use a whole number.").min(1, "At least 1 set.").max(20, "At most 20 sets.").nullable().optional(),
  /** The coach's words for the aim of the slot, e.g. "3 easy holds". Shown to the athlete as is. */
  target: zShortText(120).nullable().optional(),
  note: zShortText(500).nullable().optional(),
});
export type BlockSlotInput = z.infer<typeof ZBlockSlotInput>;

const zSlots = z
  .array(ZBlockSlotInput)
  .min(SLOTS_MIN, `A block needs at least ${SLOTS_MIN} slots.`)
  .max(SLOTS_MAX, `A block holds at most ${SLOTS_MAX} slots.`);

const zRounds = z.int("Use a whole number.").min(1, "At least 1 round.").max(ROUNDS_MAX, `At most ${ROUNDS_MAX} rounds.`);
const zRest = (max: number) =>
  z.int("Use whole seconds.").min(0, "Rest can't be negative.").max(max, `At most ${max} seconds.`);

export const ZCreateBlock = z.strictObject({
  name: zName,
  rounds: zRounds,
  restBetweenSlotsSec: zRest(REST_BETWEEN_SLOTS_MAX),
  restBetweenRoundsSec: zRest(REST_BETWEEN_ROUNDS_MAX),
  notes: zShortText(2000).nullable().optional(),
  slots: zSlots,
});
export type CreateBlockInput = z.infer<typeof ZCreateBlock>;

/** Any subset of the fields; `slots`, when sent, replaces the whole slot list in the order given. */
export const ZUpdateBlock = z
  .strictObject({
    name: zName.optional(),
    rounds: zRounds.optional(),
    restBetweenSlotsSec: zRest(REST_BETWEEN_SLOTS_MAX).optional(),
    restBetweenRoundsSec: zRest(REST_BETWEEN_ROUNDS_MAX).optional(),
    notes: zShortText(2000).nullable().optional(),
    slots: zSlots.optional(),
  })
  .refine((v) => Object.keys(v).length > 0, { message: "Send at least one field to change." });
export type UpdateBlockInput = z.infer<typeof ZUpdateBlock>;

export const ZBlockListQuery = zPageQuery.extend({ archived: z.stringbool().optional() });

/** The rung a block-level estimate reads: the ladder's first live rung. */
export const ZEstimateRung = z.object({
  id: zId,
  name: z.string(),
  measure: z.enum(MEASURES),
  /** The standard's value per set (seconds, reps or metres). */
  target: z.number(),
  /** Lowerings per eccentric set. */
  lowerings: z.number().nullable(),
  tags: z.array(z.enum(RUNG_TAGS)),
});
export type EstimateRung = z.infer<typeof ZEstimateRung>;

export const ZPairingWarning = z.object({
  rule: z.string(),
  slotIndexes: z.array(z.number().int()),
  message: z.string(),
});

export const ZBlock = z.object({
  id: zId,
  name: z.string(),
  rounds: z.number().int(),
  restBetweenSlotsSec: z.number().int(),
  restBetweenRoundsSec: z.number().int(),
  notes: z.string().nullable(),
  archived: z.boolean(),
  slots: z.array(
    z.object({
      ladderId: zId,
      ladderName: z.string(),
      sets: z.number().int().nullable(),
      target: z.string().nullable(),
      note: z.string().nullable(),
      /** The rung the estimate and warnings read (the ladder's first live rung); null for a ladder with no live rung. */
      estimateRung: ZEstimateRung.nullable(),
    }),
  ),
  /** Estimated seconds, from each ladder's first live rung (see lib/training/block-estimate.ts). */
  durationSec: z.number().int(),
  warnings: z.array(ZPairingWarning),
  createdAt: z.string(),
  updatedAt: z.string(),
});
export type BlockDto = z.infer<typeof ZBlock>;

/** A ladder the block editor can put in a slot, with the rung its estimate reads. */
export interface LadderChoice {
  id: string;
  name: string;
  firstRung: EstimateRung | null;
}
