import os from "node:os";
import { drizzle, type NodePgDatabase } from "drizzle-orm/node-postgres";
import { Pool } from "pg";
import * as schema from "./schema";

export type Db = NodePgDatabase<typeof schema>;
/** A transaction handle: operations that write several rows take one so callers can compose them. */
export type Tx = Parameters<Parameters<Db["transaction"]>[0]>[0];
/** Either the pool-backed database or an open transaction. */
export type Queryable = Db | Tx;

/**
 * Connections when DATABASE_POOL_SIZE is unset: twice this machine's cores plus one. More than the
 * database can run at once only moves the queue into PostgreSQL, where waiting costs more than in
 * the pool (HikariCP wiki, "About Pool Sizing", after the PostgreSQL project's formula: core_count
 * × 2 + effective_spindle_count as a starting point). The cores counted are the app's; set
 * DATABASE_POOL_SIZE when the database runs on another machine.
 */
export function defaultPoolSize(): number {
  return os.availableParallelism() * 2 + 1;
}

let pool: Pool | undefined;
let instance: Db | undefined;

function connect(): Db {
  if (instance) return instance;
  const url = process.env.DATABASE_URL;
  if (!url) throw new Error("DATABASE_URL is not set");
  const max = Number(process.env.DATABASE_POOL_SIZE || defaultPoolSize());
  pool = new Pool({
    connectionString: url,
    max,
    // Idle connections are kept for minutes, not pg's default 10 s: a new one costs PostgreSQL a
    // process and cold caches, and every named statement is parsed again on it, so a server whose
    // pool emptied in a quiet spell would answer its next burst slowly. After a long quiet the pool
    // shrinks again, and idle connections never keep a script from exiting.
    idleTimeoutMillis: 5 * 60_000,
    allowExitOnIdle: true,
    // Pipeline mode: a statement goes out as soon as it is submitted, so a transaction can send
    // several in one trip (db/one-trip.ts). Awaited one by one, statements behave as without it.
    pipeline: true,
  });
  instance = drizzle(pool, { schema });
  return instance;
}

/**
 * The shared database handle, connected on first use so tests and scripts can point DATABASE_URL at
 * their own database before anything queries.
 */
export const db: Db = new Proxy({} as Db, {
  get(_target, prop) {
    const real = connect();
    const value: unknown = Reflect.get(real, prop, real);
    return typeof value === "function" ? value.bind(real) : value;
  },
});

/** The underlying pool (for raw SQL in benchmarks, health checks and shutdown). */
export function getPool(): Pool {
  connect();
  return pool!;
}

export async function closeDb(): Promise<void> {
  await pool?.end();
  pool = undefined;
  instance = undefined;
}
