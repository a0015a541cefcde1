import "server-only";
import type { z } from "zod";
import { BadRequest, PayloadTooLarge, Unprocessable } from "@/lib/errors";

/** zod issues as `{ path, message }` with dotted paths (`rungs.0.standard.sets`). */
export function toFieldIssues(error: z.ZodError) {
  return error.issues.map((issue) => ({
    path: issue.path.map(String).join(".") || "(root)",
    message: issue.message,
  }));
}

export function parseWith<S extends z.ZodType>(schema: S, value: unknown, what = "Request body"): z.output<S> {
  const result = schema.safeParse(value);
  if (!result.success) {
    throw new Unprocessable(`${what} is not valid.`, toFieldIssues(result.error));
  }
  return result.data;
}

/** Reads a JSON body with a size cap: 413 when too large, 400 when not JSON. */
export async function readJson(request: Request, maxBytes: number): Promise<unknown> {
  const declared = Number(request.headers.get("content-length") ?? "0");
  if (declared > maxBytes) throw new PayloadTooLarge(`Request body is larger than ${maxBytes} bytes.`);
  // A client that hangs up mid-body is its own failure, not ours: answer 400, never 500.
  const text = await request.text().catch(() => {
    throw new BadRequest("Request body could not be read.");
  });
  if (Buffer.byteLength(text) > maxBytes) throw new PayloadTooLarge(`Request body is larger than ${maxBytes} bytes.`);
  if (text.trim() === "") throw new BadRequest("Request body must be JSON.");
  let value: unknown;
  try {
    value = JSON.parse(text);
  } catch {
    throw new BadRequest("Request body is not valid JSON.");
  }
  // PostgreSQL stores no NUL in text, so no field may carry one (a "\u0000" escape, not an escaped backslash).
  if (text.includes("\\u0000") && ESCAPED_NUL.test(text)) throw new BadRequest("Request body must not contain NUL characters.");
  return value;
}

const ESCAPED_NUL = /(?<!\\)(?:\\\\)*\\u0000/;

/** Query parameters as a plain object (repeated keys keep the last value). */
export function searchParamsObject(url: URL): Record<string, string> {
  const params = Object.fromEntries(url.searchParams.entries());
  if (Object.values(params).some((value) => value.includes("\u0000"))) throw new BadRequest("Query string must not contain NUL characters.");
  return params;
}
