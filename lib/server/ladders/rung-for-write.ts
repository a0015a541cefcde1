import "server-only";
import { and, eq } from "drizzle-orm";
import type { Tx } from "@/db/client";
import { rungs } from "@/db/schema";
import { Conflict, NotFound } from "@/lib/errors";
import { ladderForWrite } from "./ladder-for-write";

/** A rung of the team, locked, on a ladder that is not archived (404 / 409 otherwise). */
export async function rungForWrite(tx: Tx, teamId: string, rungId: string, options: { allowArchived?: boolean } = {}) {
  const [rung] = await tx
    .select({ id: rungs.id, ladderId: rungs.ladderId, name: rungs.name, measure: rungs.measure, position: rungs.position, archivedAt: rungs.archivedAt })
    .from(rungs)
    .where(and(eq(rungs.id, rungId), eq(rungs.teamId, teamId)));
  if (!rung) throw new NotFound("rung");
  const ladder = await ladderForWrite(tx, teamId, rung.ladderId);
  const [locked] = await tx.select({ id: rungs.id }).from(rungs).where(eq(rungs.id, rungId)).for("update");
  if (!locked) throw new NotFound("rung");
  if (rung.archivedAt && !options.allowArchived) throw new Conflict("This rung is archived; it can no longer be changed.");
  return { ...rung, ladderName: ladder.name };
}
