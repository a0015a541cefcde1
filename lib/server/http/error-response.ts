import "server-only";
import { NextResponse } from "next/server";
import { AppError, TooManyRequests, Unprocessable } from "@/lib/errors";

export interface ErrorBody {
  error: { code: string; message: string; issues?: { path: string; message: string }[] };
}

/**
 * The PostgreSQL error code when the error (or what it wraps: Drizzle wraps the driver's error in
 * `cause`) is a data exception, class 22: a value the database cannot cast or store.
 */
function dataExceptionCode(error: unknown): string | null {
  let current: unknown = error;
  for (let depth = 0; current && typeof current === "object" && depth < 3; depth += 1) {
    const code = (current as { code?: unknown }).code;
    if (typeof code === "string" && /^22[0-9A-Z]{3}$/.test(code)) return code;
    current = (current as { cause?: unknown }).cause;
  }
  return null;
}

/**
 * The one place that turns a thrown error into an HTTP answer. Unknown errors are 500 and logged.
 * A value the database refused (class 22) came from the request, since validation let it through:
 * 422, and a warning so the missing check gets written.
 */
export function errorResponse(error: unknown): NextResponse<ErrorBody> {
  const dataCode = error instanceof AppError ? null : dataExceptionCode(error);
  if (dataCode) {
    console.warn(`A request value reached the database and was refused (${dataCode}); validation should catch it`, error);
    return errorResponse(new Unprocessable("A value in the request cannot be stored. Check the dates, numbers and text sent."));
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
