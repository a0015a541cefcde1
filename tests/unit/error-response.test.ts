// How thrown errors become HTTP answers: typed errors keep their status, a value PostgreSQL refused
// (SQLSTATE class 22, "data exception", PostgreSQL documentation appendix A) is the caller's 422,
// a foreign key violation (23503, same appendix) from rows changed under the request is 409,
// anything else is our 500.
import { DrizzleQueryError } from "drizzle-orm/errors";
import { afterEach, describe, expect, it, vi } from "vitest";
import { NotFound } from "@/lib/errors";
import { errorResponse } from "@/lib/server/http/error-response";

const pgError = (code: string) => Object.assign(new Error("refused"), { code });

describe("errorResponse", () => {
  afterEach(() => vi.restoreAllMocks());

  it.each([
    { code: "22021", what: "a data exception (a NUL in text)", status: 422, answer: "validation_failed" },
    { code: "23503", what: "a foreign key violation (rows changed under the request)", status: 409, answer: "conflict" },
  ])("answers $status for $what wrapped by Drizzle ($code), with a warning", async ({ code, status, answer }) => {
    const warn = vi.spyOn(console, "warn").mockImplementation(() => undefined);
    const res = errorResponse(new DrizzleQueryError("insert into log_entries ...", [], pgError(code)));
    expect(res.status).toBe(status);
    expect((await res.json()).error.code).toBe(answer);
    expect(warn).toHaveBeenCalledOnce();
  });

  it("answers 422 for a data exception thrown by the driver itself (22008: date out of range)", () => {
    vi.spyOn(console, "warn").mockImplementation(() => undefined);
    expect(errorResponse(pgError("22008")).status).toBe(422);
  });

  it("keeps 500 for other database errors (23505: a unique violation is ours to prevent)", () => {
    vi.spyOn(console, "error").mockImplementation(() => undefined);
    expect(errorResponse(new DrizzleQueryError("insert ...", [], pgError("23505"))).status).toBe(500);
    expect(errorResponse(new Error("boom")).status).toBe(500);
  });

  it("keeps a typed error's own status", () => {
    expect(errorResponse(new NotFound("athlete")).status).toBe(404);
  });
});
