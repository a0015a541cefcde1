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

  it("answers 422 for a data exception wrapped by Drizzle (22021: a NUL in text)", async () => {
    const warn = vi.spyOn(console, "warn").mockImplementation(() => undefined);
    const res = errorResponse(new DrizzleQueryError("insert into athletes ...", [], pgError("22021")));
    expect(res.status).toBe(422);
    expect((await res.json()).error.code).toBe("validation_failed");
    expect(warn).toHaveBeenCalledOnce();
  });

  it("answers 422 for a data exception thrown by the driver itself (22008: date out of range)", () => {
    vi.spyOn(console, "warn").mockImplementation(() => undefined);
    expect(errorResponse(pgError("22008")).status).toBe(422);
  });

  it("answers 409 for a foreign key violation (23503): rows changed under the request", async () => {
    const warn = vi.spyOn(console, "warn").mockImplementation(() => undefined);
    const res = errorResponse(new DrizzleQueryError("insert into log_entries ...", [], pgError("23503")));
    expect(res.status).toBe(409);
    expect((await res.json()).error.code).toBe("conflict");
    expect(warn).toHaveBeenCalledOnce();
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
