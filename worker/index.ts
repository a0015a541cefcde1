// The background worker: relays the mail outbox into pg-boss, sends mail with retries, and runs the
// scheduler tick (due digests, daily re-evaluation). Run: `npm run worker` (tsx with `server-only`
// stubbed; not the react-server condition, which breaks react-dom/server and so e-mail rendering).
import { closeDb } from "@/db/client";
import { env } from "@/lib/env";
import { getBoss, stopBoss } from "@/lib/server/jobs/boss";
import { enqueueDueDigests } from "@/lib/server/jobs/enqueue-due-digests";
import { SCHEDULER_QUEUE } from "@/lib/server/jobs/mail-job";
import { processMailBatch } from "@/lib/server/jobs/process-mail-batch";
import { relayOutbox } from "@/lib/server/jobs/relay-outbox";
import { runDailyEvaluations } from "@/lib/server/jobs/run-daily-evaluations";
import { drainStorageDeletions } from "@/lib/server/storage/drain-storage-deletions";
import { sweepAbandonedUploads } from "@/lib/server/uploads/sweep-abandoned-uploads";

const IDLE_MS = 500;
const CONCURRENCY = Number(process.env.WORKER_CONCURRENCY ?? 16);
// Sending waits mostly on SMTP and the database: more lanes than cores, and connections to match.
process.env.DATABASE_POOL_SIZE ??= String(CONCURRENCY + 8);
let stopping = false;
let wake: (() => void) | null = null;
/** The scheduler tick in progress, awaited on shutdown before the database pool closes. */
let ticking: Promise<unknown> = Promise.resolve();

function log(message: string) {
  console.log(`[worker] ${new Date().toISOString()} ${message}`);
}

async function tick() {
  const now = new Date();
  const digests = await enqueueDueDigests(now);
  const days = await runDailyEvaluations(now, () => stopping);
  if (digests || days.length) log(`scheduler: ${digests} digests queued, ${days.length} teams re-evaluated`);
  // Form-check files: give up unfinished uploads, then remove queued objects (failures retry with backoff).
  const abandoned = await sweepAbandonedUploads(now);
  const storage = await drainStorageDeletions({ now, limit: 500 });
  if (abandoned || storage.removed || storage.failed) {
    log(`storage: ${abandoned} abandoned uploads, ${storage.removed} objects removed, ${storage.failed} to retry`);
  }
}

async function mailLoop() {
  const boss = await getBoss({ full: true });
  while (!stopping) {
    let busy = 0;
    try {
      busy += await relayOutbox(boss);
      busy += await processMailBatch(boss, { batchSize: 100, concurrency: CONCURRENCY });
    } catch (error) {
      log(`mail loop: ${error instanceof Error ? error.message : String(error)}`);
    }
    if (busy === 0 && !stopping) {
      await new Promise<void>((resolve) => {
        wake = resolve;
        setTimeout(resolve, IDLE_MS);
      });
      wake = null;
    }
  }
}

/**
 * For benchmarks: every `ms`, the heap still in use after a full collection (the process must run
 * with --expose-gc), which tells a leak from a heap the collector simply has not shrunk yet.
 */
function reportMemoryEvery(ms: number) {
  const gc = (globalThis as { gc?: () => void }).gc;
  setInterval(() => {
    gc?.();
    const { heapUsed, rss } = process.memoryUsage();
    console.log(`[worker] memory retained-heap-mb=${(heapUsed / 1e6).toFixed(1)} rss-mb=${(rss / 1e6).toFixed(1)} after-gc=${Boolean(gc)}`);
  }, ms).unref();
}

async function main() {
  env(); // fail fast on bad configuration
  if (process.env.WORKER_MEMORY_REPORT_MS) reportMemoryEvery(Number(process.env.WORKER_MEMORY_REPORT_MS));
  const boss = await getBoss({ full: true });
  // Every 10 minutes; pg-boss runs one tick per schedule across all worker instances.
  await boss.schedule(SCHEDULER_QUEUE, "*/10 * * * *");
  await boss.work(SCHEDULER_QUEUE, async () => {
    const run = tick();
    ticking = run.catch(() => undefined);
    await run;
  });
  await boss.send(SCHEDULER_QUEUE, {}, { singletonKey: "startup", singletonSeconds: 60 });
  log("ready");
  const loop = mailLoop();

  const shutdown = async (signal: string) => {
    if (stopping) return;
    stopping = true;
    log(`${signal}: finishing the current batch`);
    wake?.();
    await loop;
    await ticking;
    await stopBoss();
    await closeDb();
    log("stopped");
    process.exit(0);
  };
  process.on("SIGTERM", () => void shutdown("SIGTERM"));
  process.on("SIGINT", () => void shutdown("SIGINT"));
  await loop;
}

main().catch((error: unknown) => {
  console.error("[worker] failed to start:", error);
  process.exit(1);
});
