import "server-only";
import { and, asc, eq } from "drizzle-orm";
import { db, type Queryable } from "@/db/client";
import { athletePositions, athletes, ladders, rungs } from "@/db/schema";
import { NotFound } from "@/lib/errors";
import type { Actor } from "@/lib/server/actor";
import { visibleAthletes } from "@/lib/server/athletes/athlete-scope";
import type { PositionDto } from "@/lib/validation/ladders";

/** The rung an athlete stands on for every ladder they are placed on (athletes: their own only). */
export async function listPositions(actor: Actor, athleteId: string, q: Queryable = db): Promise<{ items: PositionDto[]; nextCursor: null }> {
  const [athlete] = await q.select({ id: athletes.id }).from(athletes).where(and(eq(athletes.id, athleteId), visibleAthletes(actor)));
  if (!athlete) throw new NotFound("athlete");
  const rows = await q
    .select({
      ladderId: athletePositions.ladderId,
      ladderName: ladders.name,
      rungId: athletePositions.rungId,
      rungName: rungs.name,
      rungPosition: rungs.position,
      rungArchivedAt: rungs.archivedAt,
      since: athletePositions.since,
      readiness: athletePositions.readiness,
      status: athletePositions.status,
    })
    .from(athletePositions)
    .innerJoin(ladders, eq(ladders.id, athletePositions.ladderId))
    .innerJoin(rungs, eq(rungs.id, athletePositions.rungId))
    .where(and(eq(athletePositions.athleteId, athleteId), eq(athletePositions.teamId, actor.teamId)))
    .orderBy(asc(ladders.name), asc(ladders.id));
  return { items: rows.map(({ rungArchivedAt, ...row }) => ({ ...row, rungArchived: rungArchivedAt !== null })), nextCursor: null };
}
