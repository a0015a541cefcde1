import "server-only";
import { NextResponse } from "next/server";
import { AppError, TooManyRequests, Unprocessable } from "@/lib/errors";

export interface ErrorBody {
  error: { code: string; message: string; issues?: { path: string; message: string }[] };
}

/** The one place that turns a thrown error into an HTTP answer. Unknown errors are 500 and logged. */
export function errorResponse(error: unknown): NextResponse<ErrorBody> {
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
