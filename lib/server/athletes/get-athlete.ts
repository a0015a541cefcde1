import "server-only";
import { and, eq } from "drizzle-orm";
import { db, type Queryable } from "@/db/client";
import { athletes } from "@/db/schema";
import { NotFound } from "@/lib/errors";
import type { Actor } from "@/lib/server/actor";
import { toAthleteDto, selectAthletes } from "./athlete-dto";
import { visibleAthletes } from "./athlete-scope";

/** One athlete the actor may see; 404 for another team's or someone else's record. */
export async function getAthlete(actor: Actor, athleteId: string, q: Queryable = db) {
  const [row] = await selectAthletes(q).where(and(eq(athletes.id, athleteId), visibleAthletes(actor)));
  if (!row) throw new NotFound("athlete");
  return toAthleteDto(row);
}
