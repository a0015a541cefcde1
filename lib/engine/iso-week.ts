/**
 * ISO 8601 week dates on local calendar dates. Weeks start on Monday; week 1 is the week with the
 * year's first Thursday, so the ISO week-year can differ from the calendar year around 1 January.
 */
import { dayNumber, formatDate, fromDayNumber, parseDate } from "./calendar-date";
import { localDateOf } from "./local-date";

export interface IsoWeek {
  year: number;
  week: number;
  /** Monday, YYYY-MM-DD. */
  start: string;
  /** Sunday, YYYY-MM-DD. */
  end: string;
}

/** 1 = Monday … 7 = Sunday. 1970-01-01 (day 0) was a Thursday. */
export function isoWeekday(date: string): number {
  return ((((dayNumber(date) + 3) % 7) + 7) % 7) + 1;
}

function weekdayOfDay(day: number): number {
  return ((((day + 3) % 7) + 7) % 7) + 1;
}

/** Monday of week 1: the week holding 4 January. */
function firstMonday(isoYear: number): number {
  const jan4 = dayNumber(formatDate(isoYear, 1, 4));
  return jan4 - (weekdayOfDay(jan4) - 1);
}

function isoParts(date: string): { year: number; week: number; weekday: number } {
  const day = dayNumber(date);
  const weekday = weekdayOfDay(day);
  // The Thursday of this week decides the week-year.
  const thursday = day - weekday + 4;
  const year = Number(fromDayNumber(thursday).slice(0, 4));
  return { year, week: Math.floor((thursday - firstMonday(year)) / 7) + 1, weekday };
}

function label(year: number, week: number): string {
  return `${year}-W${week < 10 ? "0" : ""}${week}`;
}

/** "2005-01-01" → "2004-W53". */
export function isoWeekOf(date: string): string {
  const { year, week } = isoParts(date);
  return label(year, week);
}

/** Full week date, "2005-01-01" → "2004-W53-6". */
export function isoWeekDate(date: string): string {
  const { year, week, weekday } = isoParts(date);
  return `${label(year, week)}-${weekday}`;
}

/** 52 or 53. */
export function isoWeeksInYear(year: number): number {
  return (firstMonday(year + 1) - firstMonday(year)) / 7;
}

/** "2026-W49" → its Monday and Sunday; null when malformed or the week does not exist. */
export function parseIsoWeek(text: string): IsoWeek | null {
  const match = /^(\d{4})-W(\d{2})$/.exec(text);
  if (!match) return null;
  const year = Number(match[1]);
  const week = Number(match[2]);
  if (week < 1 || week > isoWeeksInYear(year)) return null;
  const monday = firstMonday(year) + 7 * (week - 1);
  return { year, week, start: fromDayNumber(monday), end: fromDayNumber(monday + 6) };
}

/** The ISO week of an instant in the team's zone (design.md §4: weeks are in the team's zone). */
export function weekOfInstant(instant: Date, timeZone: string): string {
  return isoWeekOf(localDateOf(instant, timeZone));
}

/** Validates a YYYY-MM-DD date before week arithmetic on untrusted input. */
export function isoWeekOfChecked(date: string): string | null {
  return parseDate(date) ? isoWeekOf(date) : null;
}

/** Also reachable from here: weeks and local dates are used together. */
export { localDateOf } from "./local-date";
