import "server-only";
import { addDays } from "@/lib/engine/calendar-date";
import { parseIsoWeek, weekOfInstant } from "@/lib/engine/iso-week";
import { localDateOf } from "@/lib/engine/local-date";
import { invalidField } from "@/lib/errors";

export interface ReviewWeek {
  week: string;
  start: string;
  end: string;
  /** The day figures are counted to: the week's Sunday, or today while the week is running. */
  asOf: string;
}

/** The chosen ISO week in the team's zone (default: the current one); 422 for a week that does not exist. */
export function reviewWeek(week: string | undefined, timeZone: string, now: Date = new Date()): ReviewWeek {
  const label = week ?? weekOfInstant(now, timeZone);
  const parsed = parseIsoWeek(label);
  if (!parsed) throw invalidField("week", "That ISO 8601 week does not exist in that year.");
  const today = localDateOf(now, timeZone);
  const asOf = today < parsed.end ? (today < parsed.start ? parsed.start : today) : parsed.end;
  return { week: label, start: parsed.start, end: parsed.end, asOf };
}

/** The last date a position may have been reached on and still count as stalled (more than N weeks on it). */
export function stalledBefore(asOf: string, weeks: number): string {
  return addDays(asOf, -7 * weeks);
}
