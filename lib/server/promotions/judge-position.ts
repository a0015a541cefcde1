import "server-only";
import { evaluate, explainVerdict, localDateOf, mergeSessions, type Session, type Verdict } from "@/lib/engine";
import type { PositionContext } from "./load-position-context";

export interface Judgement {
  verdict: Verdict;
  explanation: string;
  /** The team-local date of `asOf`. */
  today: string;
  /** Sessions on the rung read with the context (see loadPositionContext), newest first. */
  sessions: Session[];
  /** The last date with pain on the rung up to today, however long ago. */
  lastPainOn: string | null;
}

/**
 * The engine's verdict on a position as of an instant: pure evaluation over the entries read with
 * the context, merged per date (all entries of one rung on one date are one session), up to the
 * team-local date of `asOf`.
 */
export function judgePosition(ctx: PositionContext, asOf: Date): Judgement {
  const today = localDateOf(asOf, ctx.timeZone);
  const sessions = mergeSessions(ctx.entries.filter((entry) => entry.date <= today));
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
    lastPainOn: ctx.painDates.find((date) => date <= today) ?? null,
  };
}
