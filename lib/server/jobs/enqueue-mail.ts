import "server-only";
import type { Queryable } from "@/db/client";
import { mailOutbox } from "@/db/schema";
import type { MailJob } from "./mail-job";

/**
 * Enqueues mail inside the caller's transaction by writing outbox rows: they commit or roll back with
 * the request's own writes, and the worker relays them into pg-boss. No mail is sent in a request.
 */
export async function enqueueMail(q: Queryable, jobs: MailJob | MailJob[]): Promise<number> {
  const list = Array.isArray(jobs) ? jobs : [jobs];
  if (list.length === 0) return 0;
  await q.insert(mailOutbox).values(list.map((job) => ({ job })));
  return list.length;
}
