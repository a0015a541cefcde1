import "server-only";
import { and, eq, isNull, sql } from "drizzle-orm";
import { db } from "@/db/client";
import { rungs } from "@/db/schema";
import { Unprocessable, type FieldIssue } from "@/lib/errors";
import type { Actor } from "@/lib/server/actor";
import { ladderForWrite } from "./ladder-for-write";
import { loadLadder } from "./ladder-dto";
import { assertPrerequisiteGraph, lockTeamLadders } from "./prerequisite-graph";

/**
 * Puts a ladder's live rungs in a new order. `rungIds` must be exactly the live rungs (else 422 naming
 * the strays and the missing). Only positions change: every rung keeps its id, so athletes, logs and
 * promotions still point at the same rung. The (ladder, position) unique key is deferred, so the
 * positions swap in one statement.
 */
export async function reorderRungs(actor: Actor, ladderId: string, rungIds: string[]) {
  await db.transaction(async (tx) => {
    await lockTeamLadders(tx, actor.teamId);
    await ladderForWrite(tx, actor.teamId, ladderId);
    const live = await tx
      .select({ id: rungs.id })
      .from(rungs)
      .where(and(eq(rungs.ladderId, ladderId), eq(rungs.teamId, actor.teamId), isNull(rungs.archivedAt)));
    const liveIds = new Set(live.map((r) => r.id));
    const issues: FieldIssue[] = [];
    rungIds.forEach((id, i) => {
      if (!liveIds.has(id)) issues.push({ path: `rungIds.${i}`, message: "Not a live rung of this ladder." });
    });
    const missing = [...liveIds].filter((id) => !rungIds.includes(id));
    if (missing.length) issues.push({ path: "rungIds", message: `Missing ${missing.length} of the ladder's rungs: ${missing.join(", ")}.` });
    if (issues.length) throw new Unprocessable("List exactly the ladder's live rungs.", issues);

    const positions = new Map(rungIds.map((id, i) => [id, i + 1]));
    await assertPrerequisiteGraph(tx, actor.teamId, { reorder: { positions, path: "rungIds" } });
    const cases = sql.join(
      rungIds.map((id, i) => sql`when ${id}::uuid then ${i + 1}::int`),
      sql` `,
    );
    await tx
      .update(rungs)
      .set({ position: sql`case ${rungs.id} ${cases} end`, updatedAt: new Date() })
      .where(and(eq(rungs.ladderId, ladderId), isNull(rungs.archivedAt)));
  });
  return loadLadder(db, actor.teamId, ladderId);
}
