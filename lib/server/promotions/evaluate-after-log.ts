import "server-only";
import type { Tx } from "@/db/client";
import type { Actor } from "@/lib/server/actor";
import type { VerdictDto } from "@/lib/validation/verdicts";
import { oneTrip } from "@/db/one-trip";
import { NotFound } from "@/lib/errors";
import { evaluateContext, type Evaluation } from "./evaluate-position";
import { loadPositionContext, type PositionContext } from "./load-position-context";

/**
 * Called by the log operations inside the log's transaction, after the entries are written and
 * with the positions already locked by this transaction (logRungsOf / lockPlacedRungs, in
 * ladder-id order, so two transactions locking the same athlete's ladders can never deadlock):
 * applies or proposes promotions exactly once, keeps the positions' derived figures current and
 * returns one verdict per position. The caller passes the positions whose current rung the log
 * names, as read under the lock: when a concurrent log moved the athlete up first, the rung logged
 * is no longer current and, like a warm-up on an easier rung, yields no verdict (its entries stay
 * where they were done).
 */
export async function evaluateAfterLog(
  tx: Tx,
  actor: Actor,
  input: { positionIds: string[]; logId: string },
  asOf: Date = new Date(),
): Promise<VerdictDto[]> {
  const contexts = await oneTrip(tx, () => input.positionIds.map((positionId) => loadPositionContext(tx, { positionId, teamId: actor.teamId, asOf })));
  const { verdicts, figures } = await evaluateLoaded(tx, actor, { contexts, logId: input.logId }, asOf);
  await oneTrip(tx, figures);
  return verdicts;
}

/**
 * evaluateAfterLog for contexts the caller read itself (createLog, when a verdict may promote or
 * propose, reads them in the same trip as its inserts). Returns the verdicts, and the figures updates for the caller to send.
 */
export async function evaluateLoaded(
  tx: Tx,
  actor: Actor,
  input: { contexts: readonly (PositionContext | null)[]; logId: string },
  asOf: Date = new Date(),
): Promise<{ verdicts: VerdictDto[]; figures: () => Promise<unknown>[] }> {
  const evaluations: Evaluation[] = [];
  let moved = false;
  for (const loaded of input.contexts) {
    if (!loaded) throw new NotFound("position");
    // A move on one ladder can reach a prerequisite of another: read the rest afresh after one.
    const ctx: PositionContext | null = moved ? await loadPositionContext(tx, { positionId: loaded.position.id, teamId: actor.teamId, asOf }) : loaded;
    if (!ctx) throw new NotFound("position");
    const evaluation = await evaluateContext(tx, ctx, { asOf, actor, logId: input.logId, locked: true });
    if (evaluation.verdict.promotedTo !== null || (evaluation.verdict.achieved === true && ctx.position.achievedAt === null)) moved = true;
    evaluations.push(evaluation);
  }
  return { verdicts: evaluations.map((e) => e.verdict), figures: () => evaluations.flatMap((e) => e.figures()) };
}
