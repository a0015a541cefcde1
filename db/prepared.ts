import type { SQL } from "drizzle-orm";
import { db, type Db, type Queryable } from "./client";

/** What Drizzle's `.prepare(name)` returns, as far as callers use it. */
export interface Prepared<R> {
  execute(placeholders?: Record<string, unknown>): Promise<R>;
}

/** Drizzle's handles keep their connection (the pool, or a transaction's client) on the session. */
function connectionOf(q: Queryable): unknown {
  return (q as unknown as { session: { client: unknown } }).session.client;
}

/**
 * Statements on the hot logging path, built by Drizzle once (with `sql.placeholder`s) and named, so
 * PostgreSQL parses each once per connection, then run on the handle given: the pool, or an open
 * transaction's connection. Drizzle prepares only on the database handle and rebuilds the SQL on
 * every call inside a transaction; for a short request that building is a large share of its time.
 * A variant key (an entry count, a scope) selects among shapes of one statement.
 *
 * Values Drizzle computes in JavaScript while building (`$onUpdate`, `$defaultFn`) are computed
 * once, when the statement is built, and then reused: set such columns in SQL (`updatedAt:
 * sql\`now()\``) in a statement built here.
 */
export function preparedVariants<K extends string | number, R>(build: (db: Db, variant: K) => Prepared<R>): (q: Queryable, variant: K) => Prepared<R> {
  const built = new Map<K, Prepared<R>>();
  return (q, variant) => {
    let statement = built.get(variant);
    if (!statement) {
      statement = build(db, variant);
      built.set(variant, statement);
    }
    // The same built statement, pointed at this handle's connection (Drizzle's prepared query reads
    // its `client` when executed).
    return Object.create(statement, { client: { value: connectionOf(q) } }) as Prepared<R>;
  };
}

/** preparedVariants for a statement of one shape. */
export function preparedOnce<R>(build: (db: Db) => Prepared<R>): (q: Queryable) => Prepared<R> {
  const prepare = preparedVariants((database: Db, _variant: 0) => build(database));
  return (q) => prepare(q, 0);
}

/** A raw SQL statement (with placeholders) prepared once under a name; rows come back as objects. */
export function preparedSql<R>(name: string, statement: SQL): (q: Queryable) => Prepared<{ rows: R[] }> {
  return preparedOnce((database: Db) => {
    const internals = database as unknown as {
      dialect: { sqlToQuery(sql: SQL): unknown };
      session: { prepareQuery(query: unknown, fields: undefined, name: string, arrayMode: boolean): Prepared<{ rows: R[] }> };
    };
    return internals.session.prepareQuery(internals.dialect.sqlToQuery(statement), undefined, name, false);
  });
}
