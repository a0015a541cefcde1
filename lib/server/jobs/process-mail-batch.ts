import "server-only";
import type PgBoss from "pg-boss";
import { handleMailJob } from "./handle-mail-job";
import { MAIL_QUEUE, type MailJob } from "./mail-job";

export interface BatchOptions {
  batchSize?: number;
  concurrency?: number;
  /** Test hook: stop (as if the process died) after this many jobs, leaving the rest active. */
  crashAfter?: number;
}

export class SimulatedCrash extends Error {}

/**
 * Fetches a batch of mail jobs and runs them a few at a time; each job is completed or failed on its
 * own (a failed one is retried with backoff by pg-boss, then left "failed"). Returns jobs fetched.
 */
export async function processMailBatch(boss: PgBoss, options: BatchOptions = {}): Promise<number> {
  const jobs = await boss.fetch<MailJob>(MAIL_QUEUE, { batchSize: options.batchSize ?? 50 });
  let next = 0;
  let handled = 0;
  const lane = async () => {
    while (next < jobs.length) {
      const job = jobs[next++]!;
      if (options.crashAfter !== undefined && handled >= options.crashAfter) throw new SimulatedCrash("simulated crash");
      handled += 1;
      try {
        await handleMailJob(job.data);
        await boss.complete(MAIL_QUEUE, job.id);
      } catch (error) {
        const message = error instanceof Error ? error.message : String(error);
        await boss.fail(MAIL_QUEUE, job.id, { message });
      }
    }
  };
  await Promise.all(Array.from({ length: Math.max(1, options.concurrency ?? 8) }, lane));
  return jobs.length;
}
