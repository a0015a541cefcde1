import { format, parseISO } from "date-fns";

/**
 * A calendar date (YYYY-MM-DD, already in the team's zone) as people read it: "Mon 30 Nov 2026".
 * Parsed as a plain local date, so no time zone can move it to the day before.
 */
export function calendarDayLabel(date: string): string {
  return format(parseISO(date), "EEE d MMM yyyy");
}
