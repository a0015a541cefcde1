import { z } from "zod";
import { zDate } from "./common";
import { ZVerdictDto } from "./verdicts";

/** The live verdict of one position (evaluated now, not stored), with names for display. */
export const ZPositionVerdict = ZVerdictDto.extend({
  ladderName: z.string(),
  rungName: z.string(),
  /** Null on the last rung. */
  nextRungName: z.string().nullable(),
  since: zDate,
  daysOnRung: z.number().int(),
  /** A proposal waiting for a coach: "up" (approve ladders) or "down" (step down). */
  pendingDirection: z.enum(["up", "down"]).nullable(),
  /** One plain line per clause, for a checklist. */
  clauseLines: z.array(z.string()),
}).meta({ id: "PositionVerdict" });
export type PositionVerdictDto = z.infer<typeof ZPositionVerdict>;
