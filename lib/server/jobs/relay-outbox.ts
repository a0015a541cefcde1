import "server-only";
import type PgBoss from "pg-boss";
import { getPool } from "@/db/client";
import { sqlExecutor } from "./boss";
import { MAIL_QUEUE } from "./mail-job";

/**
 * Moves committed outbox rows into the pg-boss queue: select (skipping rows another worker holds),
 * insert the jobs and delete the rows in one transaction, so each row becomes exactly one job.
 * Returns how many rows moved.
 */
export async function relayOutbox(boss: PgBoss, limit = 500): Promise<number> {
  const client = await getPool().connect();
  try {
    await client.query("BEGIN");
    const { rows } = await client.query<{ id: string; job: object }>(
      "SELECT id, job FROM mail_outbox ORDER BY id LIMIT $1 FOR UPDATE SKIP LOCKED",
      [limit],
    );
    if (rows.length > 0) {
      await boss.insert(
        rows.map((row) => ({ name: MAIL_QUEUE, data: row.job })),
        { db: sqlExecutor(client) },
      );
      await client.query("DELETE FROM mail_outbox WHERE id = ANY($1::bigint[])", [rows.map((row) => row.id)]);
    }
    await client.query("COMMIT");
    return rows.length;
  } catch (error) {
    await client.query("ROLLBACK").catch(() => undefined);
    throw error;
  } finally {
    client.release();
  }
}
