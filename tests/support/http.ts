// Calls App Router route handlers in-process with real Request objects, as Next.js would.
import { NextRequest } from "next/server";

type Handler = (request: NextRequest, context: { params: Promise<Record<string, string>> }) => Promise<Response>;

export interface CallOptions {
  method?: string;
  path?: string;
  token?: string;
  json?: unknown;
  rawBody?: string;
  headers?: Record<string, string>;
  params?: Record<string, string>;
}

export async function call(handler: Handler, options: CallOptions = {}) {
  const headers = new Headers(options.headers);
  if (options.token) headers.set("authorization", `Bearer ${options.token}`);
  let body: string | undefined = options.rawBody;
  if (options.json !== undefined) {
    body = JSON.stringify(options.json);
    headers.set("content-type", "application/json");
  }
  const request = new NextRequest(new URL(options.path ?? "/api/v1/test", "http://localhost:3000"), {
    method: options.method ?? (body === undefined ? "GET" : "POST"),
    headers,
    body,
  });
  const response = await handler(request, { params: Promise.resolve(options.params ?? {}) });
  const text = await response.text();
  let data: unknown = null;
  try {
    data = text ? JSON.parse(text) : null;
  } catch {
    data = text;
  }
  return { status: response.status, headers: response.headers, data: data as Record<string, unknown> & { error?: { code: string; issues?: { path: string }[] } } };
}
