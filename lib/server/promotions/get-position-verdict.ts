import "server-only";
import { db } from "@/db/client";
import { explainClause } from "@/lib/engine";
import { NotFound } from "@/lib/errors";
import type { Actor } from "@/lib/server/actor";
import type { PositionVerdictDto } from "@/lib/validation/position-verdict";
import { findVisiblePosition } from "./find-visible-position";
import { judgePosition } from "./judge-position";
import { loadPositionContext } from "./load-position-context";
import { toVerdictDto } from "./verdict-dto";

/**
 * The live verdict of a position, evaluated now over the stored sessions and not stored: for the
 * athlete's Today and the coach's athlete page ("2 of 3 sessions met — needs 3 more days on this
 * rung"). Reads only; promotions happen on logs and in the daily evaluation.
 */
export async function getPositionVerdict(
  actor: Actor,
  where: { athleteId: string; ladderId: string },
  asOf: Date = new Date(),
): Promise<PositionVerdictDto> {
  const positionId = await findVisiblePosition(db, actor, where.athleteId, where.ladderId);
  const ctx = await loadPositionContext(db, { positionId, teamId: actor.teamId, asOf });
  if (!ctx) throw new NotFound("position");
  const judged = judgePosition(ctx, asOf);
  const pending = ctx.pending;
  const achieved = ctx.position.achievedAt !== null;
  return {
    ...toVerdictDto({ ladderId: ctx.ladder.id, rungId: ctx.rung.id }, judged.verdict, judged.explanation, {
      promotedTo: null,
      pendingPromotionId: pending?.id ?? null,
      achieved,
    }),
    ladderName: ctx.ladder.name,
    rungName: ctx.rung.name,
    nextRungName: ctx.nextRung?.name ?? null,
    since: ctx.position.since,
    daysOnRung: judged.verdict.daysOnRung,
    pendingDirection: pending?.direction ?? null,
    clauseLines: judged.verdict.clauses.map(explainClause),
  };
}
