import { z } from "zod";
import { MEASURES } from "@/lib/engine/types";
import { POSITION_STATUSES } from "./readiness";

const ZMove = z.object({
  id: z.uuid(),
  effectiveOn: z.string(),
  at: z.string(),
  cause: z.enum(["placement", "auto", "approved", "manual", "step_down"]),
  fromRungName: z.string().nullable(),
  toRungName: z.string().nullable(),
  /** Who made the move; null for the engine or a removed account. */
  byName: z.string().nullable(),
});

export const ZLadderProgress = z.object({
  ladderId: z.uuid(),
  ladderName: z.string(),
  current: z.object({
    rungId: z.uuid(),
    rungName: z.string(),
    position: z.number().int(),
    rungCount: z.number().int(),
    since: z.string(),
    readiness: z.number().int(),
    status: z.enum(POSITION_STATUSES),
  }),
  /** Each rung reached on this ladder, in order, with the date it was reached. */
  path: z.array(z.object({ rungId: z.uuid().nullable(), rungName: z.string().nullable(), reachedOn: z.string(), cause: ZMove.shape.cause })),
  /** One point per session (rung × date) in the last year, oldest first. */
  sessions: z.array(
    z.object({ date: z.string(), rungId: z.uuid(), best: z.number().nullable(), pain: z.boolean(), note: z.string().nullable() }),
  ),
  /** The current rung's standard: the line the chart draws. */
  standard: z
    .object({ measure: z.enum(MEASURES), sets: z.number().int(), minValue: z.number(), text: z.string() })
    .nullable(),
  /** A straight-line estimate from the current rung's sessions: a guide, never a promise. */
  forecast: z.object({
    estimate: z.string().nullable(),
    slopePerDay: z.number().nullable(),
    reason: z.enum(["trending_up", "not_trending_up", "already_met", "too_few_sessions"]),
  }),
  moves: z.array(ZMove),
});
export type LadderProgress = z.infer<typeof ZLadderProgress>;

export const ZProgress = z
  .object({ athleteId: z.uuid(), athleteName: z.string(), asOf: z.string(), ladders: z.array(ZLadderProgress) })
  .meta({ id: "AthleteProgress" });
export type ProgressDto = z.infer<typeof ZProgress>;
