import { z } from "zod";
import { zDate } from "./common";

/** Longest window one request may ask for. */
export const LOAD_MAX_DAYS = 366;

export const ZLoadQuery = z
  .strictObject({
    from: zDate.optional().meta({ description: "First day (YYYY-MM-DD, team-local); default: 27 days before `to`." }),
    to: zDate.optional().meta({ description: "Last day (YYYY-MM-DD, team-local); default: today." }),
  })
  .refine((v) => !v.from || !v.to || v.from <= v.to, { path: ["from"], message: "`from` must be on or before `to`." })
  .meta({ id: "LoadQuery" });
export type LoadQuery = z.output<typeof ZLoadQuery>;

const ZLoadWeek = z.object({
  week: z.string(),
  start: z.string(),
  load: z.number(),
  /** Mean daily load / population SD (Foster 1998); null when every day had the same load. */
  monotony: z.number().nullable(),
  strain: z.number().nullable(),
  /** False while the week is still running (its later days count as 0). */
  complete: z.boolean(),
});

export const ZLoad = z
  .object({
    athleteId: z.uuid(),
    from: z.string(),
    to: z.string(),
    /** Which standard deviation monotony uses. */
    sdKind: z.literal("population"),
    days: z.array(z.object({ date: z.string(), load: z.number() })),
    weeks: z.array(ZLoadWeek),
    acwr: z.object({
      /** Hulin et al. 2014, as of `to`: acute = last 7 days, chronic = weekly mean of the last 28 (coupled) or the 21 before (uncoupled). */
      rolling: z
        .object({
          acute: z.number(),
          chronicCoupled: z.number(),
          chronicUncoupled: z.number(),
          coupled: z.number().nullable(),
          uncoupled: z.number().nullable(),
        })
        .nullable(),
      /** Williams et al. 2017, as of `to`: EWMA acute (N = 7) and chronic (N = 28), seeded with the first day of logged load. */
      ewma: z.object({ acute: z.number(), chronic: z.number(), ratio: z.number().nullable() }).nullable(),
      /** Days of logged history (from the first logged session load) needed before a ratio is shown. */
      minDaysOfHistory: z.number().int(),
      daysOfHistory: z.number().int(),
    }),
  })
  .meta({ id: "TrainingLoad" });
export type LoadDto = z.infer<typeof ZLoad>;
