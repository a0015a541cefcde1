import "server-only";
import { getPool } from "@/db/client";
import { Forbidden } from "@/lib/errors";
import type { Actor } from "@/lib/server/actor";
import { MAIL_QUEUE } from "./mail-job";

const UNDEFINED_TABLE = "42P01";

export interface FailedJob {
  id: string;
  kind: string;
  recipient: string | null;
  error: string;
  attempts: number;
  failedAt: string | null;
  createdAt: string;
}

/** Mail jobs of the owner's team that used up their retries (pg-boss state "failed"), newest first. */
export async function listFailedJobs(actor: Actor, limit = 100): Promise<FailedJob[]> {
  if (actor.role !== "owner") throw new Forbidden();
  const { rows } = await getPool()
    .query<{
    id: string;
    kind: string | null;
    recipient: string | null;
    error: string | null;
    retry_count: number;
    completed_on: Date | null;
    created_on: Date;
  }>(
    `SELECT id, data->>'kind' AS kind, data->>'to' AS recipient, output->>'message' AS error, retry_count, completed_on, created_on
       FROM pgboss.job
      WHERE name = $1 AND state = 'failed' AND data->>'teamId' = $2
      ORDER BY completed_on DESC NULLS LAST
      LIMIT $3`,
      [MAIL_QUEUE, actor.teamId, limit],
    )
    .catch((error: unknown) => {
      // Before the worker first started there is no pgboss schema: nothing has failed yet.
      if ((error as { code?: string }).code === UNDEFINED_TABLE) return { rows: [] };
      throw error;
    });
  return rows.map((r) => ({
    id: r.id,
    kind: r.kind ?? "unknown",
    recipient: r.recipient,
    error: r.error ?? "No error recorded",
    attempts: r.retry_count + 1,
    failedAt: r.completed_on?.toISOString() ?? null,
    createdAt: r.created_on.toISOString(),
  }));
}
