// Databases for vitest: one migrated template per run, and a copy of it per test worker process,
// so integration tests run in parallel without seeing each other's rows.
import fs from "node:fs";
import { fileURLToPath } from "node:url";
import { drizzle } from "drizzle-orm/node-postgres";
import { migrate } from "drizzle-orm/node-postgres/migrator";
import pg from "pg";

const TEMPLATE = "rungwise_template";
const MIGRATIONS_FOLDER = fileURLToPath(new URL("../../drizzle", import.meta.url));
const OBJECT_IN_USE = "55006"; // CREATE DATABASE … TEMPLATE while someone is connected to the template

function adminUrl(): string {
  const url = process.env.TEST_PG_ADMIN_URL;
  if (!url) throw new Error("TEST_PG_ADMIN_URL is not set; run the tests with `npm test`.");
  return url;
}

function databaseUrl(database: string): string {
  const url = new URL(adminUrl());
  url.pathname = `/${database}`;
  return url.toString();
}

async function withClient<T>(url: string, fn: (client: pg.Client) => Promise<T>): Promise<T> {
  const client = new pg.Client({ connectionString: url });
  await client.connect();
  try {
    return await fn(client);
  } finally {
    await client.end();
  }
}

/** Called once per run (vitest globalSetup): recreate the template and apply the Drizzle migrations. */
export async function prepareTemplateDatabase(): Promise<void> {
  await withClient(adminUrl(), async (client) => {
    const name = client.escapeIdentifier(TEMPLATE);
    await client.query(`DROP DATABASE IF EXISTS ${name} WITH (FORCE)`);
    await client.query(`CREATE DATABASE ${name}`);
  });
  if (!fs.existsSync(`${MIGRATIONS_FOLDER}/meta/_journal.json`)) {
    console.warn("[test db] drizzle/meta/_journal.json not found: the template database has no tables yet.");
    return;
  }
  await withClient(databaseUrl(TEMPLATE), async (client) => {
    await migrate(drizzle(client), { migrationsFolder: MIGRATIONS_FOLDER });
  });
}

// Kept on globalThis so that it holds per process even if vitest re-evaluates this module per file.
const READY = Symbol.for("rungwise.test.workerDatabase");
type WithReady = typeof globalThis & { [READY]?: Promise<string> };

async function createWorkerDatabase(): Promise<string> {
  const id = process.env.VITEST_POOL_ID ?? process.env.VITEST_WORKER_ID ?? "1";
  const database = `rungwise_w${id}`;
  await withClient(adminUrl(), async (client) => {
    const name = client.escapeIdentifier(database);
    // A previous process with the same pool id has exited; start from a clean copy.
    await client.query(`DROP DATABASE IF EXISTS ${name} WITH (FORCE)`);
    for (let attempt = 1; ; attempt += 1) {
      try {
        await client.query(`CREATE DATABASE ${name} TEMPLATE ${client.escapeIdentifier(TEMPLATE)}`);
        break;
      } catch (error) {
        const code = (error as { code?: string }).code;
        if (code !== OBJECT_IN_USE || attempt >= 20) throw error;
        await new Promise((resolve) => setTimeout(resolve, 100 * attempt));
      }
    }
  });
  const url = databaseUrl(database);
  process.env.DATABASE_URL = url;
  return url;
}

/**
 * Called in each worker before its tests import anything: point DATABASE_URL at this worker's
 * own database, copied from the template. Idempotent per process; returns the URL.
 */
export function useWorkerDatabase(): Promise<string> {
  const holder = globalThis as WithReady;
  holder[READY] ??= createWorkerDatabase();
  return holder[READY].then((url) => {
    process.env.DATABASE_URL = url;
    return url;
  });
}
