import "server-only";
import { db } from "@/db/client";
import type { Actor } from "@/lib/server/actor";
import { insertLadder } from "./create-ladder";
import { loadLadder } from "./ladder-dto";
import { rungInputOf } from "./rung-rows";

/**
 * A copy of a ladder (archived or not) with its live rungs, standards and prerequisites, as a new
 * live ladder of the same team. Athletes and history stay with the original.
 */
export async function duplicateLadder(actor: Actor, ladderId: string, input: { name?: string }) {
  const newId = await db.transaction(async (tx) => {
    const source = await loadLadder(tx, actor.teamId, ladderId);
    return insertLadder(tx, actor.teamId, {
      name: input.name ?? `${source.name} (copy)`.slice(0, 100),
      targetSkill: source.targetSkill,
      promotionMode: source.promotionMode,
      notes: source.notes,
      rungs: source.rungs.map(rungInputOf),
    });
  });
  return loadLadder(db, actor.teamId, newId);
}
