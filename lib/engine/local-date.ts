/**
 * Instants ↔ local calendar dates in an IANA zone, through Intl (the runtime's tz database).
 * Formatters are cached per zone, and per zone the span of a local day asked for twice in a row
 * is remembered, because requests ask for the date of "now" again and again all day (a replay
 * that steps through the days asks for each once, and pays nothing for the memo).
 */
import { formatDate } from "./calendar-date";

interface WallClock {
  year: number;
  month: number;
  day: number;
  hour: number;
  minute: number;
  second: number;
}

const formatters = new Map<string, Intl.DateTimeFormat>();
const dateFormatters = new Map<string, Intl.DateTimeFormat>();
/**
 * Per zone, the last local day asked for and its span: undefined until the day is asked for again,
 * null for a day that is not remembered (see spanOf).
 */
const lastDays = new Map<string, { date: string; span: { from: number; to: number } | null | undefined }>();

function formatterFor(timeZone: string): Intl.DateTimeFormat {
  let formatter = formatters.get(timeZone);
  if (!formatter) {
    // Throws RangeError for an unknown zone: a bad zone is a caller bug, not a date to guess.
    formatter = new Intl.DateTimeFormat("en-US", {
      timeZone,
      hourCycle: "h23",
      year: "numeric",
      month: "numeric",
      day: "numeric",
      hour: "numeric",
      minute: "numeric",
      second: "numeric",
    });
    formatters.set(timeZone, formatter);
  }
  return formatter;
}

function wallClock(ms: number, timeZone: string): WallClock {
  const clock: WallClock = { year: 0, month: 0, day: 0, hour: 0, minute: 0, second: 0 };
  for (const part of formatterFor(timeZone).formatToParts(ms)) {
    switch (part.type) {
      case "year":
      case "month":
      case "day":
      case "hour":
      case "minute":
      case "second":
        clock[part.type] = Number(part.value);
        break;
      default:
        break;
    }
  }
  return clock;
}

/** Date-only formatter: `format()` on it is several times cheaper than `formatToParts()`. */
function dateFormatterFor(timeZone: string): Intl.DateTimeFormat {
  let formatter = dateFormatters.get(timeZone);
  if (!formatter) {
    formatter = new Intl.DateTimeFormat("en-US", { timeZone, year: "numeric", month: "numeric", day: "numeric" });
    dateFormatters.set(timeZone, formatter);
  }
  return formatter;
}

const US_DATE = /^(\d{1,2})\/(\d{1,2})\/(\d{4})$/;

/** The team's local date "YYYY-MM-DD" at an instant. */
export function localDateOf(instant: Date, timeZone: string): string {
  const ms = instant.getTime();
  const last = lastDays.get(timeZone);
  if (last?.span && ms >= last.span.from && ms <= last.span.to) return last.date;
  const date = formattedDate(ms, timeZone);
  if (last?.date !== date) lastDays.set(timeZone, { date, span: undefined });
  else if (last.span === undefined) last.span = spanOf(date, timeZone);
  return date;
}

function formattedDate(ms: number, timeZone: string): string {
  // en-US numeric is "M/D/YYYY"; anything else (far years, eras) takes the slower, labelled path.
  const match = US_DATE.exec(dateFormatterFor(timeZone).format(ms));
  if (match) return formatDate(Number(match[3]), Number(match[1]), Number(match[2]));
  const clock = wallClock(ms, timeZone);
  return formatDate(clock.year, clock.month, clock.day);
}

/**
 * The first and last instant of a local day when the zone has the same offset at both (no DST
 * change that day): local time then runs evenly between them, so every instant between has that
 * date. Null for other days (a DST change, a midnight that does not exist, years Date cannot
 * place): they are formatted on every call.
 */
function spanOf(date: string, timeZone: string): { from: number; to: number } | null {
  if (!/^\d{4}-/.test(date)) return null;
  const from = instantOfLocal(date, { hour: 0, minute: 0, second: 0 }, timeZone);
  const to = endOfLocalDay(date, timeZone);
  if (zoneOffsetMs(from, timeZone) !== zoneOffsetMs(to, timeZone)) return null;
  if (formattedDate(from.getTime(), timeZone) !== date || formattedDate(to.getTime(), timeZone) !== date) return null;
  return { from: from.getTime(), to: to.getTime() };
}

/** Offset of local wall-clock time from UTC at an instant, in milliseconds (east positive). */
export function zoneOffsetMs(instant: Date, timeZone: string): number {
  const ms = instant.getTime();
  const c = wallClock(ms, timeZone);
  const wallAsUtc = Date.UTC(c.year, c.month - 1, c.day, c.hour, c.minute, c.second);
  return wallAsUtc - (ms - (((ms % 1000) + 1000) % 1000));
}

/**
 * The instant of a local wall-clock time. Two passes settle the offset across a DST change. A wall time that does
 * not exist (inside a spring-forward gap) resolves to a real instant next to the gap.
 */
export function instantOfLocal(date: string, time: { hour: number; minute: number; second: number; ms?: number }, timeZone: string): Date {
  const guess = Date.UTC(
    Number(date.slice(0, 4)),
    Number(date.slice(5, 7)) - 1,
    Number(date.slice(8, 10)),
    time.hour,
    time.minute,
    time.second,
    time.ms ?? 0,
  );
  const first = zoneOffsetMs(new Date(guess), timeZone);
  const second = zoneOffsetMs(new Date(guess - first), timeZone);
  return new Date(guess - second);
}

/** The last millisecond of a local date in the zone. */
export function endOfLocalDay(date: string, timeZone: string): Date {
  return instantOfLocal(date, { hour: 23, minute: 59, second: 59, ms: 999 }, timeZone);
}
