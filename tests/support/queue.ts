// Runs the worker's mail path in-process: relay the outbox into pg-boss, then fetch and handle jobs
// until nothing is left that is due now. Tests call it where the worker would be running.
import { getBoss } from "@/lib/server/jobs/boss";
import { processMailBatch, type BatchOptions } from "@/lib/server/jobs/process-mail-batch";
import { relayOutbox } from "@/lib/server/jobs/relay-outbox";

export async function drainQueue(options: BatchOptions = {}): Promise<void> {
  const boss = await getBoss();
  for (;;) {
    const moved = await relayOutbox(boss);
    const handled = await processMailBatch(boss, { concurrency: 1, ...options });
    if (moved === 0 && handled === 0) return;
  }
}
