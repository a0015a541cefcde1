import "server-only";
import { and, eq, isNull, sql } from "drizzle-orm";
import type { Tx } from "@/db/client";
import { ladders, rungs } from "@/db/schema";
import { Conflict, NotFound } from "@/lib/errors";

/**
 * Takes the team's ladder lock, then the ladder row (404 for another team's). Archived ladders are
 * read-only until restored (409), so nobody edits a ladder they cannot see in the list.
 */
export async function ladderForWrite(tx: Tx, teamId: string, ladderId: string) {
  const [ladder] = await tx
    .select({ id: ladders.id, name: ladders.name, archivedAt: ladders.archivedAt })
    .from(ladders)
    .where(and(eq(ladders.id, ladderId), eq(ladders.teamId, teamId)))
    .for("update");
  if (!ladder) throw new NotFound("ladder");
  if (ladder.archivedAt) throw new Conflict("This ladder is archived. Restore it before changing it.");
  return ladder;
}

/** The number of live rungs on a ladder (their positions are 1..n). */
export async function liveRungCount(tx: Tx, ladderId: string): Promise<number> {
  const [row] = await tx
    .select({ n: sql<number>`count(*)::int` })
    .from(rungs)
    .where(and(eq(rungs.ladderId, ladderId), isNull(rungs.archivedAt)));
  return row?.n ?? 0;
}

/** The next free archived slot (archived rungs count down from -1). */
export async function nextArchivedPosition(tx: Tx, ladderId: string): Promise<number> {
  const [row] = await tx
    .select({ lowest: sql<number>`coalesce(max(-${rungs.position}), 0)::int` })
    .from(rungs)
    .where(and(eq(rungs.ladderId, ladderId), sql`${rungs.position} < 0`));
  return -(Number(row?.lowest ?? 0) + 1);
}

/** Renumbers a ladder's live rungs 1..n in their current order (after one left the live list). */
export async function compactPositions(tx: Tx, ladderId: string): Promise<void> {
  await tx.execute(sql`
    update ${rungs} set position = ordered.n
    from (select id, row_number() over (order by position) as n from ${rungs}
          where ladder_id = ${ladderId} and archived_at is null) as ordered
    where ${rungs.id} = ordered.id and ${rungs.position} <> ordered.n`);
}
