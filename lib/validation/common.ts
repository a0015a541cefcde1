import { z } from "zod";

/** Shared building blocks for input schemas (browser-safe: no server imports). */
export const zId = z.uuid({ error: "Must be an id (UUID)." });

export const zEmail = z
  .string()
  .trim()
  .toLowerCase()
  .pipe(z.email({ error: "Enter a valid e-mail address." }))
  .pipe(z.string().max(254, "E-mail address is too long."));

export const PASSWORD_MIN = 10;
export const zPassword = z
  .string()
  .min(PASSWORD_MIN, `Use at least ${PASSWORD_MIN} characters.`)
  .max(200, "Use at most 200 characters.");

/** PostgreSQL refuses a NUL character in any text value: checked here, not left to fail in the database. */
export const noNul = (value: string) => !value.includes("\u0000");
export const NUL_MESSAGE = "Contains a character that cannot be stored.";

export const zName = z.string().trim().min(1, "Enter a name.").max(100, "Keep it under 100 characters.").refine(noNul, NUL_MESSAGE);

export function isTimeZone(value: string): boolean {
  try {
    new Intl.DateTimeFormat("en", { timeZone: value });
    return value.includes("/") || value === "UTC";
  } catch {
    return false;
  }
}

export const zTimeZone = z
  .string()
  .trim()
  .refine(isTimeZone, "Choose a time zone such as Europe/Lisbon.");

/** The earliest year a date may name: nothing this app records happened before it. */
const MIN_DATE_YEAR = 1900;

/** True for a YYYY-MM-DD that names a real day. */
function isRealDay(value: string): boolean {
  const d = new Date(`${value}T00:00:00Z`);
  return !Number.isNaN(d.getTime()) && d.toISOString().slice(0, 10) === value;
}

/** A calendar date as typed or sent: YYYY-MM-DD, a real day, from MIN_DATE_YEAR on. */
export const zDate = z
  .string()
  .regex(/^\d{4}-\d{2}-\d{2}$/, "Use the form YYYY-MM-DD.")
  .refine(isRealDay, "Not a real calendar date.")
  .refine((value) => Number(value.slice(0, 4)) >= MIN_DATE_YEAR, `Use a date from ${MIN_DATE_YEAR} on.`);

/** Text PostgreSQL can store: no NUL character (it refuses one in any text value). */
export const zText = z.string().refine(noNul, NUL_MESSAGE);

/** List pagination: an opaque cursor and a page size. */
export const zPageQuery = z.strictObject({
  cursor: z.string().max(500).optional(),
  limit: z.coerce.number().int().min(1).max(100).default(50),
});

export interface Page<T> {
  items: T[];
  nextCursor: string | null;
}
