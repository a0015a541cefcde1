import type { OpenAPIRegistry } from "@asteasolutions/zod-to-openapi";
import { z } from "zod";

export const ZErrorBody = z
  .object({
    error: z.object({
      code: z.string(),
      message: z.string(),
      issues: z.array(z.object({ path: z.string(), message: z.string() })).optional(),
    }),
  })
  .meta({ id: "Error" });

const ERROR_TEXT: Record<number, string> = {
  400: "Malformed JSON or a missing required header",
  401: "No identity: sign in or send a Bearer token",
  403: "Your role does not allow this",
  404: "Not found, or not in your team",
  409: "Conflict with the current state (for a write, also: another request removed a row it refers to, or began using one it removes)",
  413: "Body too large",
  415: "Unsupported media type",
  422: "Validation failed; `issues` names each field",
  429: "Rate limited; see Retry-After",
  503: "The payment provider did not answer; nothing changed, retry later",
};

/** A list response in the API's one shape. */
export function pageOf<T extends z.ZodType>(item: T) {
  return z.object({ items: z.array(item), nextCursor: z.string().nullable() });
}

export interface Operation {
  method: "get" | "post" | "put" | "patch" | "delete";
  path: string;
  summary: string;
  tag: string;
  params?: z.ZodObject;
  query?: z.ZodObject;
  headers?: z.ZodObject;
  body?: z.ZodType;
  ok: { status: number; schema?: z.ZodType; description?: string; contentType?: string };
  errors?: number[];
  /** False for the few routes anyone may call. */
  authenticated?: boolean;
}

/** Registers one documented operation with the API's error responses. */
export function defineOperation(registry: OpenAPIRegistry, op: Operation): void {
  const authenticated = op.authenticated ?? true;
  const errors = new Set([...(op.errors ?? []), ...(authenticated ? [401, 403] : [])]);
  if (op.body) {
    errors.add(400);
    errors.add(422);
  }
  if (op.query) errors.add(422);
  // A write that another request overtakes (a referenced row removed, a removed row taken into use) is 409.
  if (op.method !== "get") errors.add(409);
  const responses: Record<string, object> = {
    [op.ok.status]: {
      description: op.ok.description ?? "Success",
      ...(op.ok.schema ? { content: { [op.ok.contentType ?? "application/json"]: { schema: op.ok.schema } } } : {}),
    },
  };
  for (const status of [...errors].sort()) {
    responses[status] = { description: ERROR_TEXT[status] ?? "Error", content: { "application/json": { schema: ZErrorBody } } };
  }
  registry.registerPath({
    method: op.method,
    path: op.path,
    summary: op.summary,
    tags: [op.tag],
    security: authenticated ? [{ bearer: [] }, { session: [] }] : [],
    request: {
      params: op.params,
      query: op.query,
      headers: op.headers,
      body: op.body ? { required: true, content: { "application/json": { schema: op.body } } } : undefined,
    },
    responses,
  });
}

export const zIdParam = z.object({ id: z.uuid() });
