import "server-only";
import { db } from "@/db/client";
import { blocks } from "@/db/schema";
import type { Actor } from "@/lib/server/actor";
import type { CreateBlockInput } from "@/lib/validation/blocks";
import { getBlock } from "./get-block";
import { writeSlots } from "./write-slots";

/** A new block with its slots, in one transaction; answers with the estimate and warnings. */
export async function createBlock(actor: Actor, input: CreateBlockInput) {
  return db.transaction(async (tx) => {
    const [row] = await tx
      .insert(blocks)
      .values({
        teamId: actor.teamId,
        name: input.name,
        rounds: input.rounds,
        restBetweenSlotsSec: input.restBetweenSlotsSec,
        restBetweenRoundsSec: input.restBetweenRoundsSec,
        notes: input.notes || null,
      })
      .returning({ id: blocks.id });
    await writeSlots(tx, actor.teamId, row!.id, input.slots);
    return getBlock(actor, row!.id, tx);
  });
}
