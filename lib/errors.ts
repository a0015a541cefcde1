/**
 * Typed domain errors. Operations throw these; one place (lib/server/http/error-response.ts) turns them
 * into HTTP answers, so no handler builds an error response by hand.
 */
export interface FieldIssue {
  path: string;
  message: string;
}

export abstract class AppError extends Error {
  abstract readonly status: number;
  abstract readonly code: string;
}

export class BadRequest extends AppError {
  readonly status = 400;
  readonly code = "bad_request";
}

export class Unauthorized extends AppError {
  readonly status = 401;
  readonly code = "unauthorized";
  constructor(message = "Sign in or send a valid API token.") {
    super(message);
  }
}

export class Forbidden extends AppError {
  readonly status = 403;
  readonly code = "forbidden";
  constructor(message = "Your role does not allow this.") {
    super(message);
  }
}

export class NotFound extends AppError {
  readonly status = 404;
  readonly code = "not_found";
  constructor(what: string) {
    super(`No such ${what}.`);
  }
}

export class Conflict extends AppError {
  readonly status = 409;
  readonly code = "conflict";
}

export class PayloadTooLarge extends AppError {
  readonly status = 413;
  readonly code = "payload_too_large";
}

export class UnsupportedMediaType extends AppError {
  readonly status = 415;
  readonly code = "unsupported_media_type";
}

export class Unprocessable extends AppError {
  readonly status = 422;
  readonly code = "validation_failed";
  constructor(
    message: string,
    readonly issues: FieldIssue[] = [],
  ) {
    super(message);
  }
}

export class TooManyRequests extends AppError {
  readonly status = 429;
  readonly code = "rate_limited";
  constructor(
    message: string,
    readonly retryAfterSeconds: number,
  ) {
    super(message);
  }
}

/** A service we depend on (the payment provider) did not answer: nothing was changed, retry later. */
export class ServiceUnavailable extends AppError {
  readonly status = 503;
  readonly code = "service_unavailable";
}

/** A single-field validation failure, for rules zod cannot see (uniqueness, cross-row checks). */
export function invalidField(path: string, message: string): Unprocessable {
  return new Unprocessable(message, [{ path, message }]);
}
