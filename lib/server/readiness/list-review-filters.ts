import "server-only";
import { and, asc, eq, isNull, sql } from "drizzle-orm";
import { db } from "@/db/client";
import { ladders, squads } from "@/db/schema";
import type { Actor } from "@/lib/server/actor";

/** The choices the readiness table filters and columns offer: the team's live ladders and squads. */
export async function listReviewFilters(actor: Actor) {
  const [ladderRows, squadRows] = await Promise.all([
    db
      .select({
        id: ladders.id,
        name: ladders.name,
        // Written out in full: drizzle renders a lone column unqualified, which the subquery would resolve to p.id.
        placed: sql<boolean>`exists (select 1 from athlete_positions p where p.ladder_id = "ladders"."id" and p.team_id = ${actor.teamId}::uuid)`,
      })
      .from(ladders)
      .where(and(eq(ladders.teamId, actor.teamId), isNull(ladders.archivedAt)))
      .orderBy(asc(ladders.name), asc(ladders.id)),
    db
      .select({ id: squads.id, name: squads.name })
      .from(squads)
      .where(and(eq(squads.teamId, actor.teamId), isNull(squads.archivedAt)))
      .orderBy(asc(squads.name)),
  ]);
  return { ladders: ladderRows, squads: squadRows };
}
