import "server-only";
import { and, asc, eq, isNull } from "drizzle-orm";
import { db } from "@/db/client";
import { ladders } from "@/db/schema";
import type { Actor } from "@/lib/server/actor";
import type { LadderChoice } from "@/lib/validation/blocks";
import { firstLiveRungs } from "./rungs-for-estimate";

/** The team's live ladders by name, each with its first live rung, for the block editor's pickers. */
export async function listLadderChoices(actor: Actor): Promise<LadderChoice[]> {
  const rows = await db
    .select({ id: ladders.id, name: ladders.name })
    .from(ladders)
    .where(and(eq(ladders.teamId, actor.teamId), isNull(ladders.archivedAt)))
    .orderBy(asc(ladders.name), asc(ladders.id));
  const first = await firstLiveRungs(db, actor.teamId, rows.map((r) => r.id));
  return rows.map((row) => ({ ...row, firstRung: first.get(row.id) ?? null }));
}
