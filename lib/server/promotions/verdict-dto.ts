import "server-only";
import type { Verdict } from "@/lib/engine";
import type { VerdictDto } from "@/lib/validation/verdicts";

/** The verdict as stored with a promotion or audit row: the engine's result plus its plain words. */
export type StoredVerdict = Verdict & { explanation: string };

export function storedVerdict(verdict: Verdict, explanation: string): StoredVerdict {
  return { ...verdict, explanation };
}

export function toVerdictDto(
  where: { ladderId: string; rungId: string },
  verdict: Verdict,
  explanation: string,
  outcome: { promotedTo: string | null; pendingPromotionId: string | null; achieved: boolean },
): VerdictDto {
  return {
    ladderId: where.ladderId,
    rungId: where.rungId,
    status: verdict.status,
    readiness: verdict.readiness,
    clauses: verdict.clauses.map((c) => ({ ...c })),
    explanation,
    promotedTo: outcome.promotedTo,
    pendingPromotionId: outcome.pendingPromotionId,
    achieved: outcome.achieved,
  };
}
