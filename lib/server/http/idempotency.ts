import "server-only";
import { createHash } from "node:crypto";
import { NextResponse } from "next/server";
import { and, eq, lt, sql } from "drizzle-orm";
import { db, type Tx } from "@/db/client";
import { idempotencyKeys } from "@/db/schema";
import { BadRequest, Conflict } from "@/lib/errors";

/** Keys are kept at least this long; older ones are swept now and then. */
const KEEP_HOURS = 24;
const SWEEP_EVERY = 500;
const KEY_PATTERN = /^[\x21-\x7e]{8,200}$/;
let callsSinceSweep = 0;

/** The Idempotency-Key header: required on keyed writes, 8–200 visible ASCII characters. */
export function idempotencyKeyOf(request: Request): string {
  const key = request.headers.get("idempotency-key")?.trim();
  if (!key) throw new BadRequest("Send an Idempotency-Key header (a fresh random id per write) so a retry cannot log twice.");
  if (!KEY_PATTERN.test(key)) throw new BadRequest("Idempotency-Key must be 8–200 visible ASCII characters.");
  return key;
}

/** JSON with object keys sorted, so the same body always hashes the same. */
function canonical(value: unknown): string {
  if (Array.isArray(value)) return `[${value.map(canonical).join(",")}]`;
  if (value && typeof value === "object") {
    const entries = Object.entries(value as Record<string, unknown>)
      .filter(([, v]) => v !== undefined)
      .sort(([a], [b]) => (a < b ? -1 : a > b ? 1 : 0));
    return `{${entries.map(([k, v]) => `${JSON.stringify(k)}:${canonical(v)}`).join(",")}}`;
  }
  return JSON.stringify(value) ?? "null";
}

export function requestHash(body: unknown): string {
  return createHash("sha256").update(canonical(body)).digest("hex");
}

export interface IdempotentRequest {
  /** The caller (a user id): keys never collide across people. */
  ownerId: string;
  /** The route, e.g. "POST /api/v1/logs". */
  scope: string;
  key: string;
  /** The validated body; its canonical SHA-256 tells a replay from a reuse of the key. */
  body: unknown;
  /** Status of a first, successful answer. */
  status: number;
}

function sweepNowAndThen(): void {
  callsSinceSweep += 1;
  if (callsSinceSweep < SWEEP_EVERY) return;
  callsSinceSweep = 0;
  void db
    .delete(idempotencyKeys)
    .where(lt(idempotencyKeys.createdAt, sql`now() - make_interval(hours => ${KEEP_HOURS * 2})`))
    .catch(() => undefined);
}

/**
 * Runs a write at most once per (caller, route, key):
 * 1. claims the key with its own short INSERT … ON CONFLICT DO NOTHING (committed at once, so a
 *    concurrent request with the same key sees it);
 * 2. runs the operation in a transaction and stores the response in that same transaction, so a
 *    committed write always has its stored answer;
 * 3. on failure deletes the claim, so a retry can proceed.
 * A replay with the same body answers the stored status and body; a different body, or a replay
 * while the first request is still running, is 409.
 */
export async function withIdempotency(
  request: IdempotentRequest,
  operation: (tx: Tx) => Promise<unknown>,
  attempt = 0,
): Promise<Response> {
  if (attempt === 0) sweepNowAndThen();
  const hash = requestHash(request.body);
  const [claimed] = await db
    .insert(idempotencyKeys)
    .values({ ownerId: request.ownerId, scope: request.scope, key: request.key, requestHash: hash })
    .onConflictDoNothing()
    .returning({ id: idempotencyKeys.id });
  if (!claimed) return replay(request, hash, operation, attempt);

  try {
    const result = await db.transaction(async (tx) => {
      const value = await operation(tx);
      await tx
        .update(idempotencyKeys)
        .set({ state: "done", responseStatus: request.status, responseBody: value ?? null })
        .where(eq(idempotencyKeys.id, claimed.id));
      return value;
    });
    return NextResponse.json(result, { status: request.status });
  } catch (error) {
    await db
      .delete(idempotencyKeys)
      .where(eq(idempotencyKeys.id, claimed.id))
      .catch(() => undefined);
    throw error;
  }
}

async function replay(
  request: IdempotentRequest,
  hash: string,
  operation: (tx: Tx) => Promise<unknown>,
  attempt: number,
): Promise<Response> {
  const [row] = await db
    .select({
      requestHash: idempotencyKeys.requestHash,
      state: idempotencyKeys.state,
      responseStatus: idempotencyKeys.responseStatus,
      responseBody: idempotencyKeys.responseBody,
    })
    .from(idempotencyKeys)
    .where(
      and(eq(idempotencyKeys.ownerId, request.ownerId), eq(idempotencyKeys.scope, request.scope), eq(idempotencyKeys.key, request.key)),
    );
  if (!row) {
    // The first request failed and released the key between our insert and this read: claim it again, once.
    if (attempt === 0) return withIdempotency(request, operation, 1);
    throw new Conflict("A request with this Idempotency-Key is still being processed; retry shortly.");
  }
  if (row.requestHash !== hash) throw new Conflict("This Idempotency-Key was already used with a different body.");
  if (row.state !== "done") throw new Conflict("A request with this Idempotency-Key is still being processed; retry shortly.");
  return NextResponse.json(row.responseBody, { status: row.responseStatus ?? 200, headers: { "idempotent-replayed": "true" } });
}
