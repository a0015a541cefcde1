import "server-only";
import type { Session } from "@/lib/engine";
import { horizonOf, PAST_TODAY, recentDatesOf, type PositionContext } from "./load-position-context";

/**
 * A recent-history context read before some entries on its rung were written, as the same read
 * would return it after: the entries and pain dates loadPositionContext selects, by the same rules
 * (entries from the position's date on; the window of the last recentDatesOf(standard) dates up to
 * the horizon; the last few pain dates up to it). Lets a log judge its positions from the read that
 * went out with its locks, instead of reading them again after its inserts.
 *
 * The added entries go after the read ones of their date. PostgreSQL orders a date's entries by
 * created_at, which a log takes from the app's clock, so a concurrent log can sit on either side;
 * that changes no verdict, because a session's sets are judged regardless of order (mergeSessions).
 */
export function contextWithEntries(ctx: PositionContext, added: readonly Session[], asOf: Date): PositionContext {
  const kept = added.filter((entry) => entry.date >= ctx.position.since);
  if (kept.length === 0) return ctx;
  const horizon = horizonOf(asOf);

  // A stable sort keeps the read order, and puts the added entries after those of their date.
  const entries = [...ctx.entries, ...kept].sort((a, b) => (a.date < b.date ? -1 : a.date > b.date ? 1 : 0));
  const windowDates = [...new Set(entries.map((e) => e.date).filter((date) => date <= horizon))].sort().reverse().slice(0, recentDatesOf(ctx.standard));
  // The window's first date; with no date up to the horizon, the position's (greatest() skips a null).
  const from = windowDates.at(-1) ?? ctx.position.since;

  const painDates = [...new Set([...ctx.painDates, ...kept.filter((e) => e.pain && e.date <= horizon).map((e) => e.date)])]
    .sort()
    .reverse()
    .slice(0, PAST_TODAY + 1);

  return { ...ctx, entries: entries.filter((e) => e.date >= from), painDates };
}
