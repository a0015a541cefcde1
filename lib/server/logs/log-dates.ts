import "server-only";
import { addDays, daysBetween } from "@/lib/engine/calendar-date";
import { localDateOf } from "@/lib/engine/local-date";
import { Conflict, invalidField } from "@/lib/errors";
import { LOG_EDIT_WINDOW_DAYS } from "@/lib/validation/logs";

/** Training can be logged up to tomorrow in the team's zone (a late-evening session abroad), never later. */
export function assertLoggableDate(performedOn: string, timeZone: string, now = new Date()): void {
  const latest = addDays(localDateOf(now, timeZone), 1);
  if (performedOn > latest) throw invalidField("performedOn", `Training can be logged up to ${latest}, not for later dates.`);
}

/**
 * Logs can be changed for 7 days after the date they record; later the history is settled (409:
 * the request is fine, the log's state does not allow it).
 */
export function assertEditable(performedOn: string, timeZone: string, now = new Date()): void {
  const today = localDateOf(now, timeZone);
  if (daysBetween(performedOn, today) > LOG_EDIT_WINDOW_DAYS) {
    throw new Conflict(`Logs can be changed or deleted for ${LOG_EDIT_WINDOW_DAYS} days after the day they record.`);
  }
}
