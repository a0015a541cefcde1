import { z } from "zod";
import { zDate, zId, zPageQuery } from "./common";

export const PROMOTION_STATUSES = ["pending", "approved", "declined", "auto"] as const;

export const ZPromotionListQuery = zPageQuery.extend({
  status: z.enum(PROMOTION_STATUSES).optional(),
  athleteId: zId.optional(),
  ladderId: zId.optional(),
});
export type PromotionListQuery = z.output<typeof ZPromotionListQuery>;

const zRungRef = z.object({ id: zId, name: z.string() });

/** A proposed or applied move, as the API shows it. */
export const ZPromotion = z
  .object({
    id: zId,
    athlete: z.object({ id: zId, name: z.string() }),
    ladder: z.object({ id: zId, name: z.string() }),
    fromRung: zRungRef,
    /** Null when the move finishes the ladder: the skill is achieved. */
    toRung: zRungRef.nullable(),
    direction: z.enum(["up", "down"]),
    status: z.enum(PROMOTION_STATUSES),
    /** The verdict's plain words when the proposal was made. */
    explanation: z.string(),
    readiness: z.number().int().min(0).max(100),
    effectiveOn: zDate,
    createdAt: z.string(),
    decidedAt: z.string().nullable(),
    decidedBy: z.string().nullable(),
  })
  .meta({ id: "Promotion" });
export type PromotionDto = z.infer<typeof ZPromotion>;

/** The readiness forecast of one position: an estimate from the trend, never a promise. */
export const ZForecast = z
  .object({
    estimate: zDate.nullable(),
    slopePerDay: z.number().nullable(),
    reason: z.enum(["trending_up", "not_trending_up", "already_met", "too_few_sessions"]),
    /** The value the standard asks per set. */
    target: z.number(),
    measure: z.string(),
    points: z.array(z.object({ date: zDate, best: z.number() })),
  })
  .meta({ id: "Forecast" });
export type ForecastDto = z.infer<typeof ZForecast>;
