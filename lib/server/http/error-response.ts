import "server-only";
import { NextResponse } from "next/server";
import { AppError, Conflict, TooManyRequests, Unprocessable } from "@/lib/errors";

export interface ErrorBody {
  error: { code: string; message: string; issues?: { path: string; message: string }[] };
}

/**
 * The PostgreSQL error code (SQLSTATE) of the error or of what it wraps (Drizzle wraps the
 * driver's error in `cause`), when it has one.
 */
function sqlState(error: unknown): string | null {
  let current: unknown = error;
  for (let depth = 0; current && typeof current === "object" && depth < 3; depth += 1) {
    const code = (current as { code?: unknown }).code;
    if (typeof code === "string" && /^[0-9A-Z]{5}$/.test(code)) return code;
    current = (current as { cause?: unknown }).cause;
  }
  return null;
}

/**
 * The one place that turns a thrown error into an HTTP answer. Unknown errors are 500 and logged.
 * Two database refusals are the request's, not ours, and get a warning so the gap can be closed:
 * - a data exception (class 22): a value validation let through that the database cannot store,
 *   422;
 * - a foreign key violation (23503): another request changed the rows between this one's checks
 *   and its write (a row it refers to was deleted, or a row it deletes came into use), 409, try
 *   again.
 */
export function errorResponse(error: unknown): NextResponse<ErrorBody> {
  const state = error instanceof AppError ? null : sqlState(error);
  if (state?.startsWith("22")) {
    console.warn(`A request value reached the database and was refused (${state}); validation should catch it`, error);
    return errorResponse(new Unprocessable("A value in the request cannot be stored. Check the dates, numbers and text sent."));
  }
  if (state === "23503") {
    console.warn("A reference changed under the request between its checks and its write", error);
    return errorResponse(
      new Conflict("Someone changed this at the same moment: something it refers to was removed, or something it removes is now in use. Reload and try again."),
    );
  }
  if (error instanceof AppError) {
    const body: ErrorBody = { error: { code: error.code, message: error.message } };
    if (error instanceof Unprocessable) body.error.issues = error.issues;
    const headers = new Headers();
    if (error instanceof TooManyRequests) headers.set("Retry-After", String(error.retryAfterSeconds));
    return NextResponse.json(body, { status: error.status, headers });
  }
  console.error("Unhandled error in a route handler", error);
  return NextResponse.json(
    { error: { code: "internal_error", message: "Something went wrong on our side. Please try again." } },
    { status: 500 },
  );
}
