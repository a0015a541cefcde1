import "server-only";
import { and, eq } from "drizzle-orm";
import type { Queryable } from "@/db/client";
import { athletePositions, athletes } from "@/db/schema";
import { NotFound } from "@/lib/errors";
import type { Actor } from "@/lib/server/actor";
import { visibleAthletes } from "@/lib/server/athletes/athlete-scope";

/** The id of an athlete's position on a ladder, if the actor may see that athlete; else 404. */
export async function findVisiblePosition(q: Queryable, actor: Actor, athleteId: string, ladderId: string): Promise<string> {
  const [row] = await q
    .select({ id: athletePositions.id })
    .from(athletePositions)
    .innerJoin(athletes, eq(athletes.id, athletePositions.athleteId))
    .where(and(eq(athletePositions.athleteId, athleteId), eq(athletePositions.ladderId, ladderId), visibleAthletes(actor)));
  if (!row) throw new NotFound("position");
  return row.id;
}
