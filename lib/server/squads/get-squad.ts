import "server-only";
import { and, eq, isNull } from "drizzle-orm";
import { db, type Queryable } from "@/db/client";
import { squads } from "@/db/schema";
import { NotFound } from "@/lib/errors";
import type { Actor } from "@/lib/server/actor";
import { squadColumns, withMembers } from "./squad-dto";

/** One squad of the actor's team with its members; 404 for another team's. */
export async function getSquad(actor: Actor, squadId: string, q: Queryable = db) {
  const rows = await q
    .select(squadColumns)
    .from(squads)
    .where(and(eq(squads.id, squadId), eq(squads.teamId, actor.teamId), isNull(squads.archivedAt)));
  const [squad] = await withMembers(q, actor.teamId, rows);
  if (!squad) throw new NotFound("squad");
  return squad;
}
