import { z } from "zod";
import { CLAUSE_NAMES, VERDICT_STATUSES } from "@/lib/engine/types";

/** One clause of a verdict, as the API returns it. */
export const ZClause = z
  .object({
    clause: z.enum(CLAUSE_NAMES),
    pass: z.boolean(),
    required: z.number(),
    have: z.number(),
    window: z.number().optional(),
    detail: z.string().optional(),
  })
  .meta({ id: "Clause" });

/** The engine's explained result for one rung after a log (POST /api/v1/logs → verdicts[]). */
export const ZVerdictDto = z
  .object({
    ladderId: z.uuid(),
    rungId: z.uuid(),
    status: z.enum(VERDICT_STATUSES),
    readiness: z.number().int().min(0).max(100),
    clauses: z.array(ZClause),
    /** Plain words: "2 of 3 sessions met — needs 3 more days on this rung". */
    explanation: z.string(),
    /** The rung the athlete moved to at once (auto ladders), else null. */
    promotedTo: z.uuid().nullable(),
    /** The proposal waiting for a coach (approve ladders, step-downs), else null. */
    pendingPromotionId: z.uuid().nullable(),
    /** True when this verdict finished the ladder: the skill is achieved (auto ladders). */
    achieved: z.boolean().optional(),
  })
  .meta({ id: "Verdict" });
export type VerdictDto = z.infer<typeof ZVerdictDto>;
