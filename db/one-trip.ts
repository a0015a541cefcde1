import type { Socket } from "node:net";
import { sql } from "drizzle-orm";
import { NodePgSession, NodePgTransaction } from "drizzle-orm/node-postgres";
import { PgDialect } from "drizzle-orm/pg-core";
import type { PoolClient } from "pg";
import { getPool, type Tx } from "./client";

// Round trips to PostgreSQL are the largest cost of a short write on this kind of machine: each
// costs a socket write and a wake-up on both sides. The pool runs pg in pipeline mode, so a
// statement goes out as soon as it is submitted; corking the socket while several are submitted
// puts them in one write, and they run in order, one after another, as they would one by one.

/** The socket of a pg client (pg keeps it on the client's connection). */
function socketOf(client: PoolClient | undefined): Socket | undefined {
  return (client as unknown as { connection?: { stream?: Socket } } | undefined)?.connection?.stream;
}

/** The pg client behind a Drizzle transaction (Drizzle keeps it on the transaction's session). */
function clientOf(tx: Tx): PoolClient | undefined {
  return (tx as unknown as { session?: { client?: PoolClient } }).session?.client;
}

type Sent<T extends readonly unknown[]> = { [K in keyof T]: Promise<T[K]> };

/**
 * Sends several statements of one transaction in one write and waits for them all. `send` must
 * submit synchronously: call `.execute()` (a Drizzle query is lazy and would otherwise be sent only
 * when awaited, after the write and out of order), never await in between. When one fails, the
 * transaction fails with it, as it would one by one.
 */
export function oneTrip<T extends readonly unknown[]>(tx: Tx, send: () => Sent<T>): Promise<T> {
  const socket = socketOf(clientOf(tx));
  socket?.cork();
  let sent: Sent<T>;
  try {
    sent = send();
  } finally {
    socket?.uncork();
  }
  return Promise.all(sent) as Promise<T>;
}

const dialect = new PgDialect();

/** What a transaction's work hands back: its result, and the statements to send with COMMIT. */
export interface TripsResult<T> {
  value: T;
  last?: () => Promise<unknown>[];
}

/**
 * A transaction in as few trips as its work allows: BEGIN goes out with whatever the work submits
 * first (in the same tick), and COMMIT with the statements the work hands back in `last`. The
 * handle has no relational queries (`tx.query`); everything else is Drizzle's own transaction.
 * A failure anywhere rolls back and rethrows, as `db.transaction` does.
 */
export async function transactionInTrips<T>(work: (tx: Tx) => Promise<TripsResult<T>>): Promise<T> {
  const client = await getPool().connect();
  const tx = new NodePgTransaction(dialect, new NodePgSession(client, dialect, undefined), undefined) as unknown as Tx;
  const socket = socketOf(client);
  let broken: Error | undefined;
  try {
    socket?.cork();
    let begun: Promise<unknown>;
    let worked: Promise<TripsResult<T>>;
    try {
      begun = tx.execute(sql`begin`).execute();
      worked = work(tx);
    } finally {
      // Flushed after the work's first statements were submitted in this same tick.
      process.nextTick(() => socket?.uncork());
    }
    // Both settle before anything else is sent: a rollback must not overtake the work's statements.
    const [began, done] = await Promise.allSettled([begun, worked]);
    if (began.status === "rejected") throw began.reason;
    if (done.status === "rejected") throw done.reason;
    const { value, last } = done.value;
    await oneTrip(tx, () => {
      const before = submitted(client);
      const statements = last?.() ?? [];
      // COMMIT goes out only when every last statement did: one that failed before it was sent (a
      // missing placeholder, a value pg cannot serialize) would otherwise be left out of a commit.
      if (submitted(client) - before !== statements.length) return [...statements, notAllSent(statements)];
      return [...statements, tx.execute(sql`commit`).execute()];
    });
    return value;
  } catch (error) {
    await tx
      .execute(sql`rollback`)
      .execute()
      .catch((rollbackError: Error) => {
        broken = rollbackError;
      });
    throw error;
  } finally {
    client.release(broken);
  }
}

/** Statements a pg client has accepted and not yet answered (queued, on the wire, or running). */
function submitted(client: PoolClient): number {
  const internals = client as unknown as { _queryQueue: unknown[]; _sentQueryQueue?: unknown[]; _activeQuery?: unknown };
  return internals._queryQueue.length + (internals._sentQueryQueue?.length ?? 0) + (internals._activeQuery ? 1 : 0);
}

/** Rejects with the reason a statement of the last trip was not sent (the caller rolls back). */
async function notAllSent(statements: Promise<unknown>[]): Promise<never> {
  const failed = (await Promise.allSettled(statements)).find((s): s is PromiseRejectedResult => s.status === "rejected");
  throw failed?.reason ?? new Error("A statement of the transaction's last trip was not sent; rolled back.");
}
