import "server-only";
import { db, type Tx } from "@/db/client";
import { ladders } from "@/db/schema";
import type { Actor } from "@/lib/server/actor";
import type { CreateLadderInput } from "@/lib/validation/ladders";
import { loadLadder } from "./ladder-dto";
import { assertPrerequisiteGraph, lockTeamLadders } from "./prerequisite-graph";
import { insertRungs } from "./rung-rows";

/**
 * Writes a ladder with its rungs, standards and prerequisites inside the caller's transaction after
 * checking the team's prerequisite graph with the new rungs in it (so a bad rung writes nothing).
 */
export async function insertLadder(tx: Tx, teamId: string, input: CreateLadderInput): Promise<string> {
  await lockTeamLadders(tx, teamId);
  const [ladder] = await tx
    .insert(ladders)
    .values({
      teamId,
      name: input.name,
      targetSkill: input.targetSkill,
      promotionMode: input.promotionMode,
      notes: input.notes ?? null,
    })
    .returning({ id: ladders.id });
  const ladderId = ladder!.id;
  await assertPrerequisiteGraph(tx, teamId, {
    upsert: input.rungs.map((rung, i) => ({
      id: `new:${i}`,
      ladderId,
      ladderName: input.name,
      name: rung.name,
      position: i + 1,
      prerequisites: rung.prerequisites ?? [],
      path: `rungs.${i}.prerequisites`,
    })),
  });
  await insertRungs(tx, teamId, ladderId, 1, input.rungs);
  return ladderId;
}

/** A new ladder of the actor's team, in one transaction; answers the ladder with rungs in order. */
export async function createLadder(actor: Actor, input: CreateLadderInput) {
  const ladderId = await db.transaction((tx) => insertLadder(tx, actor.teamId, input));
  return loadLadder(db, actor.teamId, ladderId);
}
