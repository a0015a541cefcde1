import "server-only";
import PgBoss from "pg-boss";
import type { Pool, PoolClient } from "pg";
import { getPool } from "@/db/client";
import { MAIL_QUEUE, SCHEDULER_QUEUE } from "./mail-job";

/** pg-boss's database hook over one of our connections or the shared pool (one pool per process). */
export function sqlExecutor(target: Pool | PoolClient) {
  return {
    executeSql: async (text: string, values?: unknown[]) => {
      const result = await target.query(text, values);
      return { rows: result.rows };
    },
  };
}

/** Retries with exponential backoff (30 s, 60 s, 120 s …); after the last one the job is "failed". */
export const MAIL_RETRY = { retryLimit: 5, retryDelay: 30, retryBackoff: true, expireInSeconds: 300 } as const;

const HOLDER = Symbol.for("rungwise.pgBoss");
type WithBoss = typeof globalThis & { [HOLDER]?: Promise<PgBoss> };

/**
 * The process's pg-boss, on the shared pool. `full` (the worker) also runs maintenance and the cron
 * timekeeper; the app and tests only need queue operations. Queues are created before any send.
 */
export function getBoss(options: { full?: boolean } = {}): Promise<PgBoss> {
  const holder = globalThis as WithBoss;
  holder[HOLDER] ??= (async () => {
    const boss = new PgBoss({
      db: sqlExecutor(getPool()),
      supervise: options.full ?? false,
      schedule: options.full ?? false,
      migrate: true,
    });
    boss.on("error", (error: Error) => console.error("[jobs]", error.message));
    await boss.start();
    await boss.createQueue(MAIL_QUEUE, { name: MAIL_QUEUE, ...MAIL_RETRY });
    await boss.createQueue(SCHEDULER_QUEUE, { name: SCHEDULER_QUEUE, retryLimit: 1, expireInSeconds: 600 });
    return boss;
  })().catch((error: unknown) => {
    delete holder[HOLDER];
    throw error;
  });
  return holder[HOLDER];
}

export async function stopBoss(): Promise<void> {
  const holder = globalThis as WithBoss;
  const pending = holder[HOLDER];
  if (!pending) return;
  delete holder[HOLDER];
  const boss = await pending;
  await boss.stop({ graceful: true, wait: true, timeout: 20_000 });
}
