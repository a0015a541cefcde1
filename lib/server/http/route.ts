import "server-only";
import { NextResponse, type NextRequest } from "next/server";
import type { z } from "zod";
import { Forbidden, NotFound } from "@/lib/errors";
import { can, type Permission } from "@/lib/permissions";
import type { Actor } from "@/lib/server/actor";
import { isConfirmed } from "@/lib/server/auth/recent-token-actors";
import { recentRequestActor, requireRequestActor } from "@/lib/server/auth/request-actor";
import { errorResponse } from "./error-response";
import { parseWith, readJson, searchParamsObject } from "./parse";

type Params = Record<string, string>;
type Infer<S> = S extends z.ZodType ? z.output<S> : undefined;

interface InputOptions<B extends z.ZodType | undefined, Q extends z.ZodType | undefined> {
  body?: B;
  query?: Q;
  /** Status for a successful result (201 for creates). */
  status?: number;
  /** Largest accepted body, in bytes (413 above it). */
  maxBodyBytes?: number;
}

interface RouteOptions<B extends z.ZodType | undefined, Q extends z.ZodType | undefined> extends InputOptions<B, Q> {
  /** Permission the actor's role needs; the operation still scopes rows to the actor's team. */
  can: Permission;
  /**
   * The handler confirms the actor inside its transaction (a keyed write through withIdempotency),
   * so a Bearer token seen lately may skip its own read before the transaction. Any failure before
   * the confirmation runs the request again with a fresh read.
   */
  confirmsActor?: boolean;
}

interface Input<B, Q> {
  params: Params;
  body: B;
  query: Q;
  request: NextRequest;
}

const DEFAULT_MAX_BODY = 256 * 1024;
const UUID = /^[0-9a-f]{8}-[0-9a-f]{4}-[0-9a-f]{4}-[0-9a-f]{4}-[0-9a-f]{12}$/i;

/** Path ids are UUIDs; anything else cannot name a row, so it is simply not found (never a DB error). */
function assertIdParams(params: Params): void {
  for (const [key, value] of Object.entries(params)) {
    if ((key === "id" || key.endsWith("Id")) && !UUID.test(value)) throw new NotFound("resource");
  }
}

async function readInput<B extends z.ZodType | undefined, Q extends z.ZodType | undefined>(
  options: InputOptions<B, Q>,
  request: NextRequest,
  context: { params: Promise<Params> },
): Promise<Input<Infer<B>, Infer<Q>>> {
  const params = (await context.params) ?? {};
  assertIdParams(params);
  const body = options.body
    ? parseWith(options.body, await readJson(request, options.maxBodyBytes ?? DEFAULT_MAX_BODY))
    : undefined;
  const query = options.query ? parseWith(options.query, searchParamsObject(request.nextUrl), "Query string") : undefined;
  return { params, body: body as Infer<B>, query: query as Infer<Q>, request };
}

function toResponse(result: unknown, status: number): Response {
  if (result instanceof Response) return result;
  if (result === undefined) return new NextResponse(null, { status: 204 });
  return NextResponse.json(result, { status });
}

/**
 * Wraps an authenticated JSON route: identity (401), permission (403), params, JSON (400/413), schema
 * (422), then the operation; typed errors map to statuses in errorResponse. A handler that returns
 * `undefined` answers 204; one that returns a Response passes it through.
 */
export function route<B extends z.ZodType | undefined = undefined, Q extends z.ZodType | undefined = undefined>(
  options: RouteOptions<B, Q>,
  handler: (context: Input<Infer<B>, Infer<Q>> & { actor: Actor }) => Promise<unknown>,
) {
  return async (request: NextRequest, context: { params: Promise<Params> }): Promise<Response> => {
    // The body is read once, even when the request runs twice.
    let input: Promise<Input<Infer<B>, Infer<Q>>> | undefined;
    const run = async (actor: Actor) => {
      if (!can(actor.role, options.can)) throw new Forbidden();
      input ??= readInput(options, request, context);
      return toResponse(await handler({ ...(await input), actor }), options.status ?? 200);
    };
    try {
      const recent = options.confirmsActor ? recentRequestActor(request) : null;
      if (recent) {
        // Unconfirmed failures (stale, or failed before the check came back) decide on a fresh read.
        const answered = await run(recent).catch((error: unknown) => {
          if (isConfirmed(recent)) throw error;
          return null;
        });
        // An answer without a confirmation is a route that set confirmsActor without withIdempotency.
        if (answered && !isConfirmed(recent)) throw new Error("A confirmsActor route answered without confirming its actor.");
        if (answered) return answered;
      }
      return await run(await requireRequestActor(request));
    } catch (error) {
      return errorResponse(error);
    }
  };
}

/** The same wrapper for routes anyone may call (sign-up, invite acceptance): no identity. */
export function publicRoute<B extends z.ZodType | undefined = undefined, Q extends z.ZodType | undefined = undefined>(
  options: InputOptions<B, Q>,
  handler: (context: Input<Infer<B>, Infer<Q>>) => Promise<unknown>,
) {
  return async (request: NextRequest, context: { params: Promise<Params> }): Promise<Response> => {
    try {
      const input = await readInput(options, request, context);
      return toResponse(await handler(input), options.status ?? 200);
    } catch (error) {
      return errorResponse(error);
    }
  };
}
