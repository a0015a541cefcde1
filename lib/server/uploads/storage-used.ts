import "server-only";
import { and, eq, gt, ne, or, sql } from "drizzle-orm";
import type { Queryable } from "@/db/client";
import { uploads } from "@/db/schema";
import { PENDING_RESERVATION_MS } from "./upload-policy";

/**
 * Bytes an athlete's form checks take: completed files at their stored size, plus recent unfinished
 * uploads at their declared size (they may still arrive). `exceptUploadId` leaves one upload out,
 * for re-checking it at completion.
 */
export async function storageUsed(q: Queryable, athleteId: string, now: Date, exceptUploadId?: string): Promise<number> {
  const since = new Date(now.getTime() - PENDING_RESERVATION_MS);
  const [row] = await q
    .select({ used: sql<string>`coalesce(sum(coalesce(${uploads.actualSize}, ${uploads.declaredSize})), 0)` })
    .from(uploads)
    .where(
      and(
        eq(uploads.athleteId, athleteId),
        or(eq(uploads.state, "complete"), and(eq(uploads.state, "pending"), gt(uploads.createdAt, since))),
        exceptUploadId ? ne(uploads.id, exceptUploadId) : undefined,
      ),
    );
  return Number(row?.used ?? 0);
}
