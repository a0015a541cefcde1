/**
 * The first date a standard would have been met, replaying the rung's sessions in date order:
 * each session date is evaluated as of the end of that local day. When only the days clause is
 * missing, the answer is the day it comes true (since + minDaysOnRung), unless a session on or
 * before that day changes the picture first — then replay goes on from that session. Only the
 * standard is replayed: prerequisites are left out. The answer may lie after the last session, or
 * in the future, when it depends on days alone.
 */
import { addDays } from "./calendar-date";
import { evaluate } from "./evaluate";
import { endOfLocalDay } from "./local-date";
import { mergeSessions } from "./merge-sessions";
import type { Measure, Session, Standard, Verdict } from "./types";

export interface BacktestInput {
  measure: Measure;
  standard: Standard;
  sessions: readonly Session[];
  since: string;
  timeZone: string;
}

function onlyDaysMissing(verdict: Verdict): boolean {
  if (verdict.status !== "not_yet" || verdict.stepDown) return false;
  return verdict.clauses.every((c) => c.pass || c.clause === "days");
}

export function backtest(input: BacktestInput): string | null {
  const oldestFirst = mergeSessions(input.sessions)
    .filter((s) => s.date >= input.since)
    .reverse();
  const daysTrue = addDays(input.since, Math.max(0, input.standard.minDaysOnRung));

  for (let i = 0; i < oldestFirst.length; i += 1) {
    const date = (oldestFirst[i] as Session).date;
    const verdict = evaluate({
      measure: input.measure,
      standard: input.standard,
      sessions: oldestFirst,
      since: input.since,
      asOf: endOfLocalDay(date, input.timeZone),
      timeZone: input.timeZone,
      prerequisites: [],
    });
    if (verdict.status === "met") return date;
    if (onlyDaysMissing(verdict)) {
      const next = oldestFirst[i + 1];
      if (!next || next.date > daysTrue) return daysTrue;
    }
  }
  return null;
}
