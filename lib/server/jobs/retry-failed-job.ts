import "server-only";
import { getPool } from "@/db/client";
import { Forbidden, NotFound } from "@/lib/errors";
import type { Actor } from "@/lib/server/actor";
import { zId } from "@/lib/validation/common";
import { getBoss } from "./boss";
import { MAIL_QUEUE } from "./mail-job";

/** Puts one failed mail job of the owner's team back in the queue (pg-boss retry). */
export async function retryFailedJob(actor: Actor, jobId: string): Promise<void> {
  if (actor.role !== "owner") throw new Forbidden();
  // The id comes from a form: one that is no UUID names no job (and would fail the cast below).
  if (!zId.safeParse(jobId).success) throw new NotFound("failed job");
  const { rows } = await getPool().query(
    "SELECT 1 FROM pgboss.job WHERE name = $1 AND id = $2::uuid AND state = 'failed' AND data->>'teamId' = $3",
    [MAIL_QUEUE, jobId, actor.teamId],
  );
  if (rows.length === 0) throw new NotFound("failed job");
  const boss = await getBoss();
  await boss.retry(MAIL_QUEUE, jobId);
}
