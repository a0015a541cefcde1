import "server-only";
import { db } from "@/db/client";
import type { Actor } from "@/lib/server/actor";
import type { RungInput } from "@/lib/validation/ladders";
import { ladderForWrite, liveRungCount } from "./ladder-for-write";
import { loadRung } from "./ladder-dto";
import { assertPrerequisiteGraph, lockTeamLadders } from "./prerequisite-graph";
import { insertRungs } from "./rung-rows";

/** Adds a rung at the top of a ladder (the hardest end); answers the new rung. */
export async function addRung(actor: Actor, ladderId: string, input: RungInput) {
  const rungId = await db.transaction(async (tx) => {
    await lockTeamLadders(tx, actor.teamId);
    const ladder = await ladderForWrite(tx, actor.teamId, ladderId);
    const position = (await liveRungCount(tx, ladderId)) + 1;
    await assertPrerequisiteGraph(tx, actor.teamId, {
      upsert: [{ id: "new:0", ladderId, ladderName: ladder.name, name: input.name, position, prerequisites: input.prerequisites ?? [], path: "prerequisites" }],
    });
    const [id] = await insertRungs(tx, actor.teamId, ladderId, position, [input]);
    return id!;
  });
  return loadRung(db, actor.teamId, rungId);
}
