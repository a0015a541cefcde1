import "server-only";
import { z } from "zod";
import { Unprocessable } from "@/lib/errors";
import { zDate, zText } from "@/lib/validation/common";

/** Opaque keyset cursors: base64url JSON of the last row's sort key. */
export function encodeCursor(value: unknown): string {
  return Buffer.from(JSON.stringify(value), "utf8").toString("base64url");
}

export function decodeCursor<S extends z.ZodType>(schema: S, cursor: string | undefined): z.output<S> | undefined {
  if (!cursor) return undefined;
  try {
    const parsed = schema.safeParse(JSON.parse(Buffer.from(cursor, "base64url").toString("utf8")));
    if (parsed.success) return parsed.data;
  } catch {
    // fall through to the validation error below
  }
  throw new Unprocessable("Query string is not valid.", [{ path: "cursor", message: "Unknown or expired cursor." }]);
}

/** Splits a fetched `limit + 1` rows into a page and the cursor for the next one. */
export function pageOf<T, K>(rows: T[], limit: number, keyOf: (row: T) => K) {
  const items = rows.slice(0, limit);
  const last = items.at(-1);
  return {
    items,
    nextCursor: rows.length > limit && last !== undefined ? encodeCursor(keyOf(last)) : null,
  };
}

/**
 * A timestamptz as PostgreSQL prints it ("2026-12-02 11:57:51.123456+00"): cursors carry it as
 * text, microseconds kept (a JavaScript Date would drop them), and a forged one cannot break the cast.
 */
export const zPgTimestamp = z
  .string()
  .regex(/^\d{4}-\d{2}-\d{2} \d{2}:\d{2}:\d{2}(\.\d{1,6})?[+-]\d{2}(:\d{2})?$/)
  .refine((value) => {
    const [date, time] = value.split(" ") as [string, string];
    const [hours, minutes, seconds] = time.slice(0, 8).split(":").map(Number) as [number, number, number];
    return zDate.safeParse(date).success && hours < 24 && minutes < 60 && seconds < 60;
  });

/** Name-ordered lists; the id is checked so a forged cursor is a 422, never a failed uuid cast. */
export const zNameIdCursor = z.object({ name: zText, id: z.uuid() });
