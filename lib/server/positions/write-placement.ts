import "server-only";
import { and, eq } from "drizzle-orm";
import type { Tx } from "@/db/client";
import { athletePositions, positionMoves } from "@/db/schema";

export interface Placement {
  teamId: string;
  athleteId: string;
  ladderId: string;
  rungId: string;
  /** The date evidence on the rung counts from (YYYY-MM-DD, team-local). */
  since: string;
  actorUserId: string | null;
}

/**
 * Puts an athlete on a rung (first placement, or a coach's manual move) and writes the audit row.
 * Callers have already checked that the rung is a live rung of the ladder in the same team. The
 * position's derived figures restart with the new rung.
 */
export async function writePlacement(tx: Tx, placement: Placement): Promise<{ positionId: string; moved: boolean }> {
  const [current] = await tx
    .select({ id: athletePositions.id, rungId: athletePositions.rungId, since: athletePositions.since })
    .from(athletePositions)
    .where(
      and(
        eq(athletePositions.athleteId, placement.athleteId),
        eq(athletePositions.ladderId, placement.ladderId),
        eq(athletePositions.teamId, placement.teamId),
      ),
    )
    .for("update");
  if (current && current.rungId === placement.rungId && current.since === placement.since) {
    return { positionId: current.id, moved: false };
  }
  const fresh = { rungId: placement.rungId, since: placement.since, readiness: 0, status: "not_yet" as const, sessionsMet: 0, lastSessionOn: null, lastPainOn: null, achievedAt: null };
  const [row] = current
    ? await tx.update(athletePositions).set(fresh).where(eq(athletePositions.id, current.id)).returning({ id: athletePositions.id })
    : await tx
        .insert(athletePositions)
        .values({ teamId: placement.teamId, athleteId: placement.athleteId, ladderId: placement.ladderId, ...fresh })
        .returning({ id: athletePositions.id });
  await tx.insert(positionMoves).values({
    teamId: placement.teamId,
    athleteId: placement.athleteId,
    ladderId: placement.ladderId,
    fromRungId: current?.rungId ?? null,
    toRungId: placement.rungId,
    cause: current ? "manual" : "placement",
    actorUserId: placement.actorUserId,
    actorKind: placement.actorUserId ? "user" : "system",
    effectiveOn: placement.since,
  });
  return { positionId: row!.id, moved: true };
}
