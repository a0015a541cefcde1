import "server-only";
import type { Queryable } from "@/db/client";
import { evaluate, explainVerdict, localDateOf, type Session, type Verdict } from "@/lib/engine";
import type { PositionContext } from "./load-position-context";
import { loadRungSessions } from "./load-rung-sessions";

export interface Judgement {
  verdict: Verdict;
  explanation: string;
  /** The team-local date of `asOf`. */
  today: string;
  /** Sessions on the rung since the athlete reached it, newest first. */
  sessions: Session[];
  lastPainOn: string | null;
}

/** The engine's verdict on a position as of an instant: pure evaluation over the stored sessions. */
export async function judgePosition(q: Queryable, ctx: PositionContext, asOf: Date): Promise<Judgement> {
  const today = localDateOf(asOf, ctx.timeZone);
  const sessions = await loadRungSessions(q, {
    athleteId: ctx.position.athleteId,
    rungId: ctx.rung.id,
    since: ctx.position.since,
    until: today,
  });
  const verdict = evaluate({
    measure: ctx.rung.measure,
    standard: ctx.standard,
    sessions,
    since: ctx.position.since,
    asOf,
    timeZone: ctx.timeZone,
    prerequisites: ctx.prerequisites,
  });
  return {
    verdict,
    explanation: explainVerdict(verdict),
    today,
    sessions,
    lastPainOn: sessions.find((s) => s.pain)?.date ?? null,
  };
}
