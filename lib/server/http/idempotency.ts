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
 * Runs a write at most once per (caller, route, key), in one transaction:
 * 1. claims the key first: an INSERT … ON CONFLICT DO NOTHING guarded by a transaction-scoped
 *    advisory lock on the key, so a concurrent request with the same key learns at once that the
 *    first is still running (409) instead of queueing behind it;
 * 2. runs the operation and stores its response in the same transaction, so a committed write
 *    always has its stored answer, and a failed one leaves no claim behind (the rollback frees it);
 * 3. a key already used answers from the stored row: the same body gets the original status and
 *    body, a different body is 409.
 */
export async function withIdempotency(request: IdempotentRequest, operation: (tx: Tx) => Promise<unknown>): Promise<Response> {
  sweepNowAndThen();
  const hash = requestHash(request.body);
  type Outcome = { replay: { status: number; body: unknown } } | { replay: null; value: unknown };
  const outcome = await db.transaction(async (tx): Promise<Outcome> => {
    const claimId = await claim(tx, request, hash);
    if (!claimId) return { replay: await storedAnswer(tx, request, hash) };
    const value = await operation(tx);
    await tx
      .update(idempotencyKeys)
      .set({ state: "done", responseStatus: request.status, responseBody: value ?? null })
      .where(eq(idempotencyKeys.id, claimId))
      .prepare("idempotency_done")
      .execute();
    return { replay: null, value };
  });
  if (outcome.replay) {
    const { status, body } = outcome.replay;
    return NextResponse.json(body, { status, headers: { "idempotent-replayed": "true" } });
  }
  return NextResponse.json(outcome.value, { status: request.status });
}

/** The claim's id, or null when the key is taken (stored, or held by a request still running). */
async function claim(tx: Tx, request: IdempotentRequest, hash: string): Promise<string | null> {
  const lockKey = `${request.ownerId}\n${request.scope}\n${request.key}`;
  const result = await tx.execute<{ id: string }>(sql`
    insert into ${idempotencyKeys} (owner_id, scope, key, request_hash)
    select ${request.ownerId}::uuid, ${request.scope}, ${request.key}, ${hash}
    where pg_try_advisory_xact_lock(hashtextextended(${lockKey}, 0))
    on conflict do nothing
    returning id`);
  return result.rows[0]?.id ?? null;
}

/**
 * The answer stored for a key that could not be claimed. No committed row means the first request
 * still holds the key (it commits its claim and answer together), so: 409, retry shortly.
 */
async function storedAnswer(tx: Tx, request: IdempotentRequest, hash: string): Promise<{ status: number; body: unknown }> {
  const [row] = await tx
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
  if (row && row.requestHash !== hash) throw new Conflict("This Idempotency-Key was already used with a different body.");
  if (!row || row.state !== "done") throw new Conflict("A request with this Idempotency-Key is still being processed; retry shortly.");
  return { status: row.responseStatus ?? 200, body: row.responseBody };
}
