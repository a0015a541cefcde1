import "server-only";
import { and, asc, eq } from "drizzle-orm";
import { db } from "@/db/client";
import { athletes, positionMoves, rungs, teams } from "@/db/schema";
import { backtest, localDateOf, type Standard } from "@/lib/engine";
import { NotFound } from "@/lib/errors";
import type { Actor } from "@/lib/server/actor";
import type { BacktestItem, BacktestResult, BacktestStandard } from "@/lib/validation/backtest";
import { loadRungSessions } from "./load-rung-sessions";

interface Stint {
  athleteId: string;
  athleteName: string;
  reachedOn: string;
  /** The date of the move off the rung; null while the athlete is still on it. */
  endedOn: string | null;
  movedUp: boolean;
}

/**
 * What if the rung had this standard? Replays the stored sessions of every athlete who has been on
 * the rung — each stint from the move onto it until the move off it (from the audit rows) — and
 * answers, per stint, the first date the proposed standard would have been met (lib/engine
 * backtest; the replay stops there) beside the date they actually moved up. Prerequisites are
 * left out; only the standard is tried.
 */
export async function backtestRung(
  actor: Actor,
  ladderId: string,
  input: { rungId: string; standard: BacktestStandard },
  asOf: Date = new Date(),
): Promise<BacktestResult> {
  const ladderRungs = await db
    .select({ id: rungs.id, position: rungs.position, measure: rungs.measure, timeZone: teams.timeZone })
    .from(rungs)
    .innerJoin(teams, eq(teams.id, rungs.teamId))
    .where(and(eq(rungs.ladderId, ladderId), eq(rungs.teamId, actor.teamId)));
  const rung = ladderRungs.find((r) => r.id === input.rungId);
  if (!rung) throw new NotFound("rung");

  const standard: Standard = { ...input.standard, painFree: input.standard.painFree ?? true };
  const today = localDateOf(asOf, rung.timeZone);
  const stints = stintsOn(rung, ladderRungs, await movesOf(actor.teamId, ladderId));
  const items: BacktestItem[] = [];
  for (const stint of stints) {
    const sessions = await loadRungSessions(db, {
      athleteId: stint.athleteId,
      rungId: rung.id,
      since: stint.reachedOn,
      until: stint.endedOn ?? today,
    });
    items.push({
      athleteId: stint.athleteId,
      athleteName: stint.athleteName,
      reachedOn: stint.reachedOn,
      actualPromotedOn: stint.movedUp ? stint.endedOn : null,
      wouldPromoteOn: backtest({ measure: rung.measure, standard, sessions, since: stint.reachedOn, timeZone: rung.timeZone }),
      sessions: sessions.length,
    });
  }
  return { items };
}

function movesOf(teamId: string, ladderId: string) {
  return db
    .select({
      athleteId: positionMoves.athleteId,
      athleteName: athletes.name,
      toRungId: positionMoves.toRungId,
      fromRungId: positionMoves.fromRungId,
      effectiveOn: positionMoves.effectiveOn,
    })
    .from(positionMoves)
    .innerJoin(athletes, eq(athletes.id, positionMoves.athleteId))
    .where(and(eq(positionMoves.teamId, teamId), eq(positionMoves.ladderId, ladderId)))
    .orderBy(asc(athletes.name), asc(positionMoves.athleteId), asc(positionMoves.createdAt), asc(positionMoves.id));
}

/**
 * Stints on a rung from an athlete's ordered moves: a move onto the rung opens one, the next move
 * of that athlete on the ladder closes it. Moving to a later rung (or finishing the ladder, a move
 * to no rung) counts as moving up.
 */
export function stintsOn(
  rung: { id: string; position: number },
  ladderRungs: readonly { id: string; position: number }[],
  moves: readonly { athleteId: string; athleteName: string; toRungId: string | null; effectiveOn: string }[],
): Stint[] {
  const positionOf = new Map(ladderRungs.map((r) => [r.id, r.position]));
  const stints: Stint[] = [];
  const open = new Map<string, Stint>();
  for (const move of moves) {
    const current = open.get(move.athleteId);
    if (current) {
      current.endedOn = move.effectiveOn;
      current.movedUp = move.toRungId === null || (positionOf.get(move.toRungId) ?? 0) > rung.position;
      open.delete(move.athleteId);
    }
    if (move.toRungId === rung.id) {
      const stint: Stint = { athleteId: move.athleteId, athleteName: move.athleteName, reachedOn: move.effectiveOn, endedOn: null, movedUp: false };
      stints.push(stint);
      open.set(move.athleteId, stint);
    }
  }
  return stints;
}
