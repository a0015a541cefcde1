import "server-only";
import { eq, sql } from "drizzle-orm";
import type { Db, Tx } from "@/db/client";
import { preparedOnce } from "@/db/prepared";
import { athletePositions } from "@/db/schema";
import { NotFound } from "@/lib/errors";
import type { Actor } from "@/lib/server/actor";
import { enqueueNotice } from "@/lib/server/notifications/enqueue-notice";
import type { VerdictDto } from "@/lib/validation/verdicts";
import { judgePosition, type Judgement } from "./judge-position";
import { loadPositionContext, type PositionContext } from "./load-position-context";
import { movePosition } from "./move-position";
import {
  declinedWithoutNewEvidence,
  recordAutoPromotion,
  recordPendingPromotion,
  type PromotionDraft,
} from "./record-promotion";
import { storedVerdict, toVerdictDto } from "./verdict-dto";

/** Who asks: a person of a team (reads are scoped to it) or the system (daily job, seed). */
export type EvaluationActor = Actor | "system";

export interface EvaluatePositionInput {
  positionId: string;
  asOf: Date;
  actor: EvaluationActor;
  /** The log that triggered the evaluation, kept on any promotion it causes. */
  logId?: string | null;
  /** The caller already holds the position's row lock (the log paths lock while validating). */
  locked?: boolean;
}

type Outcome = {
  promotedTo: string | null;
  pendingPromotionId: string | null;
  /** The direction of the proposal now waiting for a coach, if any. */
  pendingDirection: "up" | "down" | null;
  achieved: boolean;
};

/**
 * The one code path from evidence to promotion. Locks the position row (FOR UPDATE) and re-reads
 * everything under the lock, so concurrent or retried evaluations see each other's moves: an
 * athlete is promoted exactly once. Then:
 *   - met on an auto ladder → moved to the next live rung at once (since = the latest session's
 *     date), or the skill is achieved on the last rung (a promotion row with no target rung);
 *   - met on an approve ladder → one pending proposal (also for the last rung: approving it
 *     achieves the skill);
 *   - step_down → one pending "down" proposal to the live rung below (never applied by itself);
 *   - blocked (only prerequisites fail) → waits, and the verdict says for what.
 * Nothing new is proposed while a proposal is pending, after the skill is achieved, or when a coach
 * declined the same move and no session has been logged since. The position's derived figures are
 * written in the same transaction. Returns the verdict of the rung evaluated.
 */
export async function evaluatePosition(tx: Tx, input: EvaluatePositionInput): Promise<VerdictDto> {
  const teamId = input.actor === "system" ? undefined : input.actor.teamId;
  const ctx = await loadPositionContext(tx, { positionId: input.positionId, teamId, lock: !input.locked, asOf: input.asOf });
  if (!ctx) throw new NotFound("position");
  const { verdict, figures } = await evaluateContext(tx, ctx, input);
  await Promise.all(figures());
  return verdict;
}

export interface Evaluation {
  verdict: VerdictDto;
  /**
   * Sends the position's derived-figures update and returns its statements, none when there is
   * nothing to update (submits synchronously; see oneTrip, whose last trip counts what was sent).
   */
  figures: () => Promise<unknown>[];
}

/**
 * evaluatePosition for a context the caller read under the position's lock: judges, acts on the
 * verdict, and leaves the figures update to the caller, who may send it with its own last statements.
 */
export async function evaluateContext(tx: Tx, ctx: PositionContext, input: Omit<EvaluatePositionInput, "positionId">): Promise<Evaluation> {
  const judged = judgePosition(ctx, input.asOf);
  const outcome = quietOutcome(ctx, judged) ?? (await act(tx, ctx, judged, input));
  const verdict = toVerdictDto({ ladderId: ctx.ladder.id, rungId: ctx.rung.id }, judged.verdict, judged.explanation, outcome);
  if (!outcome.promotedTo) return { verdict, figures: () => [writeFigures(tx, ctx, judged, outcome)] };

  // The athlete is on a new rung: its figures start from the evidence there (usually none yet).
  const moved = await loadPositionContext(tx, { positionId: ctx.position.id, asOf: input.asOf });
  if (!moved) return { verdict, figures: () => [] };
  const fresh = judgePosition(moved, input.asOf);
  const movedOutcome = { ...outcome, pendingDirection: moved.pending?.direction ?? null, achieved: false };
  return { verdict, figures: () => [writeFigures(tx, moved, fresh, movedOutcome)] };
}

/**
 * Evaluates a context the caller read under the position's lock when acting on its verdict writes
 * nothing (the skill is achieved, a proposal waits, or the verdict moves nothing): the verdict and
 * the figures update, with no statement of its own before them. Null when acting may write (a
 * standard met, a step down due; a coach's earlier decline may still hold it back): evaluateContext
 * does that.
 */
export function evaluateWithoutActing(tx: Tx, ctx: PositionContext, asOf: Date): Evaluation | null {
  const judged = judgePosition(ctx, asOf);
  const outcome = quietOutcome(ctx, judged);
  if (!outcome) return null;
  const verdict = toVerdictDto({ ladderId: ctx.ladder.id, rungId: ctx.rung.id }, judged.verdict, judged.explanation, outcome);
  return { verdict, figures: () => [writeFigures(tx, ctx, judged, outcome)] };
}

/** The outcome of a verdict that moves and proposes nothing; null when acting on it may write. */
function quietOutcome(ctx: PositionContext, judged: Judgement): Outcome | null {
  const none: Outcome = { promotedTo: null, pendingPromotionId: null, pendingDirection: null, achieved: ctx.position.achievedAt !== null };
  if (ctx.position.achievedAt) return none;
  // Read under the position lock: a proposal waits, so nothing new is proposed or applied.
  if (ctx.pending) return { ...none, pendingPromotionId: ctx.pending.id, pendingDirection: ctx.pending.direction };
  const { status } = judged.verdict;
  return status === "met" || (status === "step_down" && ctx.previousRung) ? null : none;
}

/** Acts on a verdict quietOutcome left to act on: the position is neither achieved nor waiting. */
async function act(tx: Tx, ctx: PositionContext, judged: Judgement, input: Omit<EvaluatePositionInput, "positionId">): Promise<Outcome> {
  const none: Outcome = { promotedTo: null, pendingPromotionId: null, pendingDirection: null, achieved: false };

  const { verdict } = judged;
  const effectiveOn = verdict.lastSessionDate ?? judged.today;
  const draft = (direction: "up" | "down", toRungId: string | null): PromotionDraft => ({
    direction,
    toRungId,
    effectiveOn,
    verdict: storedVerdict(verdict, judged.explanation),
    logId: input.logId ?? null,
  });

  if (verdict.status === "met") {
    if (await declinedWithoutNewEvidence(tx, ctx, "up", effectiveOn)) return none;
    const toRungId = ctx.nextRung?.id ?? null;
    if (ctx.ladder.promotionMode === "approve") {
      return { ...none, pendingPromotionId: await propose(tx, ctx, draft("up", toRungId)), pendingDirection: "up" };
    }
    const promotionId = await recordAutoPromotion(tx, ctx, draft("up", toRungId), input.asOf);
    await movePosition(tx, {
      positionId: ctx.position.id,
      teamId: ctx.position.teamId,
      athleteId: ctx.position.athleteId,
      ladderId: ctx.ladder.id,
      fromRungId: ctx.rung.id,
      toRungId,
      effectiveOn,
      cause: "auto",
      actorUserId: null,
      promotionId,
      verdict: storedVerdict(verdict, judged.explanation),
      at: input.asOf,
    });
    await enqueueNotice(tx, { kind: "promotion", promotionId, teamId: ctx.position.teamId });
    return { promotedTo: toRungId, pendingPromotionId: null, pendingDirection: null, achieved: toRungId === null };
  }

  if (verdict.status === "step_down" && ctx.previousRung) {
    if (await declinedWithoutNewEvidence(tx, ctx, "down", effectiveOn)) return none;
    return { ...none, pendingPromotionId: await propose(tx, ctx, draft("down", ctx.previousRung.id)), pendingDirection: "down" };
  }
  throw new Error(`No action for a ${verdict.status} verdict that quietOutcome left to act.`);
}

async function propose(tx: Tx, ctx: PositionContext, draft: PromotionDraft): Promise<string> {
  const pending = await recordPendingPromotion(tx, ctx, draft);
  if (pending.created) await enqueueNotice(tx, { kind: "approval_needed", promotionId: pending.id, teamId: ctx.position.teamId });
  return pending.id;
}

type PositionStatus = typeof athletePositions.$inferSelect.status;

/** The figures the coach's tables sort and filter on, from the latest verdict and proposal. */
async function writeFigures(tx: Tx, ctx: PositionContext, judged: Judgement, outcome: Outcome): Promise<void> {
  const { verdict } = judged;
  const status = outcome.achieved
    ? ("achieved" as const)
    : outcome.pendingDirection === "up"
      ? ("pending_approval" as const)
      : outcome.pendingDirection === "down"
        ? ("step_down" as const)
        : verdict.status;
  await positionFigures(tx).execute({
    id: ctx.position.id,
    readiness: outcome.achieved ? 100 : verdict.readiness,
    status,
    lastSessionOn: verdict.lastSessionDate,
    lastPainOn: judged.lastPainOn,
    sessionsMet: verdict.sessionsMet,
  });
}

const positionFigures = preparedOnce((database: Db) =>
  database
    .update(athletePositions)
    .set({
      readiness: sql<number>`${sql.placeholder("readiness")}`,
      status: sql<PositionStatus>`${sql.placeholder("status")}`,
      lastSessionOn: sql<string | null>`${sql.placeholder("lastSessionOn")}`,
      lastPainOn: sql<string | null>`${sql.placeholder("lastPainOn")}`,
      sessionsMet: sql<number>`${sql.placeholder("sessionsMet")}`,
      // Spelled out: a statement built once would otherwise keep the time it was built at.
      updatedAt: sql`now()`,
    })
    .where(eq(athletePositions.id, sql.placeholder("id")))
    .prepare("position_figures"),
);
