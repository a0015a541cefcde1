/**
 * Arithmetic on local calendar dates written "YYYY-MM-DD". A calendar date has no time zone and no
 * daylight-saving hour, so counting days here is exact; zones only matter when turning an instant
 * into a date (local-date.ts).
 */
const MS_PER_DAY = 86_400_000;
const DATE_RE = /^(\d{4})-(\d{2})-(\d{2})$/;

export interface DateParts {
  year: number;
  month: number; // 1–12
  day: number;
}

/** Parts of a well-formed, existing date, or null ("2026-02-30" is null). */
export function parseDate(date: string): DateParts | null {
  const match = DATE_RE.exec(date);
  if (!match) return null;
  const year = Number(match[1]);
  const month = Number(match[2]);
  const day = Number(match[3]);
  if (month < 1 || month > 12 || day < 1 || day > daysInMonth(year, month)) return null;
  return { year, month, day };
}

export function isValidDate(date: string): boolean {
  return parseDate(date) !== null;
}

function digit(text: string, index: number): number {
  const code = text.charCodeAt(index) - 48;
  return code >= 0 && code <= 9 ? code : Number.NaN;
}

/**
 * Days since 1970-01-01 (negative before); NaN when not shaped YYYY-MM-DD. Pure arithmetic
 * (days-from-civil, Hinnant's "chrono-compatible low-level date algorithms") because it runs on
 * every verdict.
 */
export function dayNumber(date: string): number {
  if (date.length !== 10 || date.charCodeAt(4) !== 45 || date.charCodeAt(7) !== 45) return Number.NaN;
  const year = digit(date, 0) * 1000 + digit(date, 1) * 100 + digit(date, 2) * 10 + digit(date, 3);
  const month = digit(date, 5) * 10 + digit(date, 6);
  const day = digit(date, 8) * 10 + digit(date, 9);
  const y = month <= 2 ? year - 1 : year;
  const era = Math.floor(y / 400);
  const yearOfEra = y - era * 400;
  const dayOfYear = Math.floor((153 * (month + (month > 2 ? -3 : 9)) + 2) / 5) + day - 1;
  const dayOfEra = yearOfEra * 365 + Math.floor(yearOfEra / 4) - Math.floor(yearOfEra / 100) + dayOfYear;
  return era * 146_097 + dayOfEra - 719_468;
}

export function fromDayNumber(days: number): string {
  const d = new Date(days * MS_PER_DAY);
  return formatDate(d.getUTCFullYear(), d.getUTCMonth() + 1, d.getUTCDate());
}

export function addDays(date: string, days: number): string {
  return fromDayNumber(dayNumber(date) + days);
}

/** Whole calendar days from `from` to `to` (negative when `to` is earlier). */
export function daysBetween(from: string, to: string): number {
  return dayNumber(to) - dayNumber(from);
}

export function formatDate(year: number, month: number, day: number): string {
  return `${String(year).padStart(4, "0")}-${month < 10 ? "0" : ""}${month}-${day < 10 ? "0" : ""}${day}`;
}

export function isLeapYear(year: number): boolean {
  return (year % 4 === 0 && year % 100 !== 0) || year % 400 === 0;
}

function daysInMonth(year: number, month: number): number {
  if (month === 2) return isLeapYear(year) ? 29 : 28;
  return month === 4 || month === 6 || month === 9 || month === 11 ? 30 : 31;
}
