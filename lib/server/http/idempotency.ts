import "server-only";
import { createHash } from "node:crypto";
import { NextResponse } from "next/server";
import { and, eq, lt, sql } from "drizzle-orm";
import { db, type Db, type Tx } from "@/db/client";
import { oneTrip, transactionInTrips, type TripsResult } from "@/db/one-trip";
import { preparedOnce, preparedSql } from "@/db/prepared";
import { idempotencyKeys } from "@/db/schema";
import { BadRequest, Conflict } from "@/lib/errors";
import type { Actor } from "@/lib/server/actor";
import { confirmActor } from "@/lib/server/auth/recent-token-actors";

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
  /** The caller: keys never collide across people. One taken unconfirmed is confirmed in the first trip. */
  actor: Actor;
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

/** A keyed write in two steps, so its first reads travel with the claim in one trip. */
export interface IdempotentWrite<R> {
  /**
   * Reads (and row locks) sent together with the claim. They must submit synchronously and write
   * nothing. A read that locks rows adds `keyOpen` (with these placeholders) to its conditions, so
   * it locks nothing when another request still holds the key (this one answers 409 then, without
   * queueing behind the first one's locks) or when the key already has its answer (a replay).
   */
  read: (tx: Tx, key: KeyPlaceholders) => Promise<R>;
  /**
   * The write, run only once the key is claimed. Returns the answer, and the statements it still
   * has to send (sent in one trip with the stored answer).
   */
  write: (tx: Tx, read: R) => Promise<{ value: unknown; last?: () => Promise<unknown>[] }>;
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
export async function withIdempotency<R>(request: IdempotentRequest, operation: IdempotentWrite<R>): Promise<Response> {
  sweepNowAndThen();
  const hash = requestHash(request.body);
  const key: KeyPlaceholders = {
    lockKey: `${request.actor.userId}\n${request.scope}\n${request.key}`,
    keyOwner: request.actor.userId,
    keyScope: request.scope,
    keyName: request.key,
  };
  // A first answer is serialized once: the same JSON is stored for replays and sent.
  type Outcome = { replay: { status: number; body: unknown } } | { replay: null; json: string };
  const outcome = await transactionInTrips(async (tx): Promise<TripsResult<Outcome>> => {
    // BEGIN, the actor's confirmation (when it was not read fresh), the claim and the operation's
    // reads go out together; nothing is written before all three are back.
    const [, claimId, read] = await oneTrip(
      tx,
      () => [confirmActor(tx, request.actor), claim(tx, request, hash, key.lockKey), operation.read(tx, key)] as const,
    );
    if (!claimId) return { value: { replay: await storedAnswer(tx, request, hash) } };
    const { value, last } = await operation.write(tx, read);
    const json = JSON.stringify(value ?? null);
    // The operation's last statements, the stored answer and COMMIT go out together.
    return {
      value: { replay: null, json },
      last: () => [...(last?.() ?? []), markDone(tx).execute({ id: claimId, status: request.status, body: json })],
    };
  });
  if (outcome.replay) {
    const { status, body } = outcome.replay;
    return NextResponse.json(body, { status, headers: { "idempotent-replayed": "true" } });
  }
  return new NextResponse(outcome.json, { status: request.status, headers: { "content-type": "application/json" } });
}

/** Taken while a request holds the key: try-lock, so a second request never waits for the first. */
const keyLock = sql`pg_try_advisory_xact_lock(hashtextextended(${sql.placeholder("lockKey")}, 0))`;

/** The placeholders `keyOpen` reads: the key's lock name and the key itself. */
export interface KeyPlaceholders {
  lockKey: string;
  keyOwner: string;
  keyScope: string;
  keyName: string;
}

/**
 * True for the request that may write under its key: it holds the key's lock (no other request
 * does) and no answer is stored for the key yet. Its own claim, sent just before, is not done.
 */
export const keyOpen = sql`(${keyLock} and not exists (
  select 1 from ${idempotencyKeys} k
  where k.owner_id = ${sql.placeholder("keyOwner")}::uuid and k.scope = ${sql.placeholder("keyScope")}
    and k.key = ${sql.placeholder("keyName")} and k.state = 'done'))`;

const claimKey = preparedSql<{ id: string }>(
  "idempotency_claim",
  sql`insert into ${idempotencyKeys} (owner_id, scope, key, request_hash)
      select ${sql.placeholder("ownerId")}::uuid, ${sql.placeholder("scope")}, ${sql.placeholder("key")}, ${sql.placeholder("hash")}
      where ${keyLock}
      on conflict do nothing
      returning id`,
);

const markDone = preparedOnce((database: Db) =>
  database
    .update(idempotencyKeys)
    // The answer arrives as JSON text (serialized once, see withIdempotency).
    .set({ state: "done", responseStatus: sql<number>`${sql.placeholder("status")}`, responseBody: sql`${sql.placeholder("body")}::jsonb` })
    .where(eq(idempotencyKeys.id, sql.placeholder("id")))
    .prepare("idempotency_done"),
);

/** The claim's id, or null when the key is taken (stored, or held by a request still running). */
function claim(tx: Tx, request: IdempotentRequest, hash: string, lockKey: string): Promise<string | null> {
  return claimKey(tx)
    .execute({ ownerId: request.actor.userId, scope: request.scope, key: request.key, hash, lockKey })
    .then((result) => result.rows[0]?.id ?? null);
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
      and(eq(idempotencyKeys.ownerId, request.actor.userId), eq(idempotencyKeys.scope, request.scope), eq(idempotencyKeys.key, request.key)),
    );
  if (row && row.requestHash !== hash) throw new Conflict("This Idempotency-Key was already used with a different body.");
  if (!row || row.state !== "done") throw new Conflict("A request with this Idempotency-Key is still being processed; retry shortly.");
  return { status: row.responseStatus ?? 200, body: row.responseBody };
}
