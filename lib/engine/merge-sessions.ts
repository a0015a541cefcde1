/**
 * All entries of one rung on one date form one session (design.md §3). Logs arrive set by set, so
 * several entries may share a date; merging keeps every set and any pain flag. The order of a
 * session's sets never changes its assessment (sets are counted, and the best ones taken): callers
 * may merge entries of a date in any order.
 */
import type { Session } from "./types";

function byDateDescending(a: Session, b: Session): number {
  return a.date < b.date ? 1 : a.date > b.date ? -1 : 0;
}

/** Sessions with one entry per date, newest first. Input is not modified. */
export function mergeSessions(sessions: readonly Session[]): Session[] {
  return mergeSortedDescending([...sessions].sort(byDateDescending));
}

/**
 * Sessions dated within [from, to] (inclusive, YYYY-MM-DD compares as text), merged per date,
 * newest first. Dates outside the range are dropped: the caller should have filtered, but a
 * session before the athlete reached the rung or after "today" must never count.
 */
export function sessionsInRange(sessions: readonly Session[], from: string, to: string): Session[] {
  const kept: Session[] = [];
  for (const session of sessions) {
    if (session.date >= from && session.date <= to) kept.push(session);
  }
  kept.sort(byDateDescending);
  return mergeSortedDescending(kept);
}

function mergeSortedDescending(sorted: Session[]): Session[] {
  let hasDuplicate = false;
  for (let i = 1; i < sorted.length; i += 1) {
    if ((sorted[i] as Session).date === (sorted[i - 1] as Session).date) {
      hasDuplicate = true;
      break;
    }
  }
  if (!hasDuplicate) return sorted;
  // One new sets array per merged date, filled in place: a date logged set by set can hold many
  // entries, and copying the sets gathered so far for each of them would grow with their square.
  const merged: Session[] = [];
  let open: Session | null = null;
  for (const session of sorted) {
    if (open && open.date === session.date) {
      open.sets.push(...session.sets);
      open.pain ||= session.pain;
      continue;
    }
    open = { date: session.date, sets: [...session.sets], pain: session.pain };
    merged.push(open);
  }
  return merged;
}
