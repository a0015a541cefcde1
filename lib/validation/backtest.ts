import { z } from "zod";
import type { Measure } from "@/lib/engine";
import { zDate, zId } from "./common";
import { standardIssues, ZStandardInput } from "./ladders";

const whole = (min: number, max: number, what: string) =>
  z.number({ error: `Enter ${what}.` }).int("Use a whole number.").min(min, `At least ${min}.`).max(max, `At most ${max}.`);

/** A standard to try out (the same limits the stored standards have). */
export const ZBacktestStandard = z
  .strictObject({
    sets: whole(1, 20, "the number of sets"),
    minValue: z.number({ error: "Enter the value per set." }).gt(0, "Must be above 0.").max(3600, "At most 3600."),
    minReps: whole(1, 100, "the lowerings per set").nullable().optional(),
    maxRpe: z.number().min(1, "RPE runs from 1 to 10.").max(10, "RPE runs from 1 to 10.").nullable().optional(),
    minRir: whole(0, 10, "the reps in reserve").nullable().optional(),
    sessionsRequired: whole(1, 20, "how many sessions must meet it"),
    sessionsWindow: whole(1, 20, "how many recent sessions to look at"),
    minDaysOnRung: whole(0, 365, "the days on the rung"),
    painFree: z.boolean().default(true),
    stepDown: z
      .strictObject({
        painSessions: whole(0, 20, "pain sessions"),
        painWindow: whole(0, 20, "the pain window"),
        dropBelowPct: z.number().min(0).max(100),
        dropSessions: whole(0, 20, "drop sessions"),
      })
      .nullable()
      .optional(),
  })
  .refine((s) => s.maxRpe == null || s.minRir == null, { path: ["minRir"], message: "Use an RPE ceiling or reps in reserve, not both." })
  .refine((s) => s.sessionsRequired <= s.sessionsWindow, {
    path: ["sessionsRequired"],
    message: "Can't need more sessions than the window looks at.",
  });
export type BacktestStandard = z.output<typeof ZBacktestStandard>;

/**
 * The standard a rung form holds, ready to replay, or null while the form would refuse it. The
 * form's rules decide (they are stricter, with per-measure limits), so the replay never shows a
 * standard that could not be saved; the backtest schema then shapes the request body.
 */
export function replayableStandard(measure: Measure, typed: unknown): BacktestStandard | null {
  const asForm = ZStandardInput.safeParse(typed);
  if (!asForm.success || standardIssues(measure, asForm.data).length > 0) return null;
  const asRequest = ZBacktestStandard.safeParse(asForm.data);
  return asRequest.success ? asRequest.data : null;
}

export const ZBacktestRequest = z.strictObject({ rungId: zId, standard: ZBacktestStandard });
export type BacktestRequest = z.input<typeof ZBacktestRequest>;

/** One stint of one athlete on the rung, replayed under the proposed standard. */
export const ZBacktestItem = z
  .object({
    athleteId: zId,
    athleteName: z.string(),
    /** The date the athlete reached the rung (start of the stint). */
    reachedOn: zDate,
    /** The date they actually moved up off it; null while still on it, or when they left otherwise. */
    actualPromotedOn: zDate.nullable(),
    /** The first date the proposed standard would have been met; null when never within the stint. */
    wouldPromoteOn: zDate.nullable(),
    sessions: z.number().int(),
  })
  .meta({ id: "BacktestItem" });
export type BacktestItem = z.infer<typeof ZBacktestItem>;

export const ZBacktestResult = z.object({ items: z.array(ZBacktestItem) }).meta({ id: "BacktestResult" });
export type BacktestResult = z.infer<typeof ZBacktestResult>;
