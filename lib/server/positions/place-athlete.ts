import "server-only";
import { and, eq } from "drizzle-orm";
import { db } from "@/db/client";
import { athletes, ladders, rungs } from "@/db/schema";
import { localDateOf } from "@/lib/engine";
import { invalidField, NotFound } from "@/lib/errors";
import type { Actor } from "@/lib/server/actor";
import type { PlacementInput, PositionDto } from "@/lib/validation/ladders";
import { listPositions } from "./list-positions";
import { writePlacement } from "./write-placement";

/**
 * Puts an athlete of the team on a live rung of a live ladder (first placement or a manual move),
 * with the audit row. `since` (default: today in the team's zone, never later) is the date the
 * rung's evidence counts from, so a coach can bring in earlier progress.
 */
export async function placeAthlete(actor: Actor, athleteId: string, ladderId: string, input: PlacementInput): Promise<PositionDto> {
  const today = localDateOf(new Date(), actor.timeZone);
  const since = input.since ?? today;
  if (since > today) throw invalidField("since", "The date cannot be in the future.");
  await db.transaction(async (tx) => {
    const [athlete] = await tx
      .select({ id: athletes.id })
      .from(athletes)
      .where(and(eq(athletes.id, athleteId), eq(athletes.teamId, actor.teamId)));
    if (!athlete) throw new NotFound("athlete");
    const [ladder] = await tx
      .select({ id: ladders.id, archivedAt: ladders.archivedAt })
      .from(ladders)
      .where(and(eq(ladders.id, ladderId), eq(ladders.teamId, actor.teamId)));
    if (!ladder) throw new NotFound("ladder");
    if (ladder.archivedAt) throw invalidField("ladderId", "This ladder is archived; restore it to place athletes on it.");
    const [rung] = await tx
      .select({ id: rungs.id, archivedAt: rungs.archivedAt })
      .from(rungs)
      .where(and(eq(rungs.id, input.rungId), eq(rungs.ladderId, ladderId), eq(rungs.teamId, actor.teamId)));
    if (!rung) throw invalidField("rungId", "Choose a rung of this ladder.");
    if (rung.archivedAt) throw invalidField("rungId", "This rung is archived; choose a live rung.");
    await writePlacement(tx, { teamId: actor.teamId, athleteId, ladderId, rungId: rung.id, since, actorUserId: actor.userId });
  });
  const { items } = await listPositions(actor, athleteId);
  const placed = items.find((p) => p.ladderId === ladderId);
  if (!placed) throw new NotFound("position");
  return placed;
}
