import { addDays, isoWeekOf, isoWeekday, localDateOf, zoneOffsetMs } from "@/lib/engine";

export interface DigestSchedule {
  digestWeekday: number;
  digestHour: number;
}

/**
 * Which week's digest is due for a person at an instant, or null before this week's send moment.
 * The send moment is the chosen weekday and hour of the current ISO week in the team's zone; the
 * digest covers the ISO week of the day before it (so Monday 07:00 sends the week just ended).
 * After a worker outage the digest still goes out later in the week (catch-up).
 */
export function dueDigestWeek(now: Date, timeZone: string, schedule: DigestSchedule): string | null {
  const today = localDateOf(now, timeZone);
  const weekday = isoWeekday(today);
  const hour = new Date(now.getTime() + zoneOffsetMs(now, timeZone)).getUTCHours();
  if (weekday < schedule.digestWeekday || (weekday === schedule.digestWeekday && hour < schedule.digestHour)) return null;
  const sendDay = addDays(today, schedule.digestWeekday - weekday);
  return isoWeekOf(addDays(sendDay, -1));
}
