import "server-only";
import { eq, or, sql } from "drizzle-orm";
import type { Tx } from "@/db/client";
import { db } from "@/db/client";
import { athletePositions, logEntries, positionMoves, promotions, rungPrerequisites, rungs } from "@/db/schema";
import type { Actor } from "@/lib/server/actor";
import { compactPositions, nextArchivedPosition } from "./ladder-for-write";
import { lockTeamLadders } from "./prerequisite-graph";
import { rungForWrite } from "./rung-for-write";

/** Whether anything with history points at the rung: a position, a logged set, a promotion or a move. */
async function rungInUse(tx: Tx, rungId: string): Promise<boolean> {
  const [row] = await tx.execute<{ used: boolean }>(sql`select (
       exists (select 1 from ${athletePositions} where ${athletePositions.rungId} = ${rungId})
    or exists (select 1 from ${logEntries} where ${logEntries.rungId} = ${rungId})
    or exists (select 1 from ${promotions} where ${or(eq(promotions.fromRungId, rungId), eq(promotions.toRungId, rungId))})
    or exists (select 1 from ${positionMoves} where ${or(eq(positionMoves.fromRungId, rungId), eq(positionMoves.toRungId, rungId))})
  ) as used`).then((r) => r.rows);
  return Boolean(row?.used);
}

/**
 * DELETE of a rung. A rung with history (athletes on it, logs, promotions, moves) is archived: it
 * keeps its row and id, moves to a negative position, and athletes on it keep their place. A rung
 * nobody used is deleted with its standard. Either way the live rungs close up to 1..n, and other
 * rungs stop requiring it (nobody could reach it any more). Answers 204 in both cases.
 */
export async function removeRung(actor: Actor, rungId: string): Promise<{ archived: boolean }> {
  return db.transaction(async (tx) => {
    await lockTeamLadders(tx, actor.teamId);
    const rung = await rungForWrite(tx, actor.teamId, rungId, { allowArchived: true });
    if (rung.archivedAt) return { archived: true };
    await tx.delete(rungPrerequisites).where(eq(rungPrerequisites.requiresRungId, rungId));
    const archived = await rungInUse(tx, rungId);
    if (archived) {
      const position = await nextArchivedPosition(tx, rung.ladderId);
      await tx.update(rungs).set({ archivedAt: new Date(), position }).where(eq(rungs.id, rungId));
    } else {
      await tx.delete(rungs).where(eq(rungs.id, rungId));
    }
    await compactPositions(tx, rung.ladderId);
    return { archived };
  });
}
