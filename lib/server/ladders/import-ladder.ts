import "server-only";
import { and, eq, isNull } from "drizzle-orm";
import type { Tx } from "@/db/client";
import { db } from "@/db/client";
import { ladders, rungs } from "@/db/schema";
import type { FieldIssue } from "@/lib/errors";
import type { Actor } from "@/lib/server/actor";
import type { LadderDocument } from "@/lib/validation/ladder-document";
import { insertLadder } from "./create-ladder";
import { loadLadder } from "./ladder-dto";

/** Live rungs of the team's live ladders, by "ladder name\0rung name" (ambiguous names map to null). */
async function rungsByName(tx: Tx, teamId: string): Promise<Map<string, string | null>> {
  const rows = await tx
    .select({ id: rungs.id, rungName: rungs.name, ladderName: ladders.name })
    .from(rungs)
    .innerJoin(ladders, eq(ladders.id, rungs.ladderId))
    .where(and(eq(rungs.teamId, teamId), isNull(rungs.archivedAt), isNull(ladders.archivedAt)));
  const byName = new Map<string, string | null>();
  for (const row of rows) {
    const key = `${row.ladderName.toLowerCase()}\u0000${row.rungName.toLowerCase()}`;
    byName.set(key, byName.has(key) ? null : row.id);
  }
  return byName;
}

/**
 * Creates a new ladder from a validated `rungwise.ladder` document in one transaction. Prerequisites
 * point outside the document by ladder and rung name: when the team has exactly one such live rung the
 * link is kept (so an export → import round trip in one team is identical); otherwise it is dropped
 * with a warning. Nothing else is guessed.
 */
export async function importLadder(actor: Actor, doc: LadderDocument) {
  const warnings: FieldIssue[] = [];
  const ladderId = await db.transaction(async (tx) => {
    const known = await rungsByName(tx, actor.teamId);
    const rungInputs = doc.rungs.map((rung, i) => {
      const prerequisites: string[] = [];
      (rung.prerequisites ?? []).forEach((ref, j) => {
        if (!("ladder" in ref)) return; // in-document references were rejected by the schema
        const id = known.get(`${ref.ladder.toLowerCase()}\u0000${ref.rung.toLowerCase()}`);
        if (id && !prerequisites.includes(id)) prerequisites.push(id);
        else if (!id) {
          warnings.push({
            path: `rungs.${i}.prerequisites.${j}`,
            message: `Dropped the prerequisite "${ref.ladder} › ${ref.rung}": ${id === null ? "several rungs of your team have that name" : "your team has no such rung"}.`,
          });
        }
      });
      const { key: _key, prerequisites: _refs, ...fields } = rung;
      return { ...fields, prerequisites };
    });
    const [sameName] = await tx
      .select({ id: ladders.id })
      .from(ladders)
      .where(and(eq(ladders.teamId, actor.teamId), eq(ladders.name, doc.ladder.name), isNull(ladders.archivedAt)))
      .limit(1);
    if (sameName) warnings.push({ path: "ladder.name", message: "Your team already has a ladder with this name; both are kept." });
    return insertLadder(tx, actor.teamId, { ...doc.ladder, rungs: rungInputs });
  });
  return { ladder: await loadLadder(db, actor.teamId, ladderId), warnings };
}
