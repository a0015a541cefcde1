import "server-only";
import { and, eq } from "drizzle-orm";
import { db } from "@/db/client";
import { blocks } from "@/db/schema";
import { NotFound } from "@/lib/errors";
import type { Actor } from "@/lib/server/actor";
import type { UpdateBlockInput } from "@/lib/validation/blocks";
import { getBlock } from "./get-block";
import { writeSlots } from "./write-slots";

/** Changes a block of the actor's team; `slots`, when sent, replaces the list. One transaction. */
export async function updateBlock(actor: Actor, blockId: string, input: UpdateBlockInput) {
  return db.transaction(async (tx) => {
    const updated = await tx
      .update(blocks)
      .set({
        name: input.name,
        rounds: input.rounds,
        restBetweenSlotsSec: input.restBetweenSlotsSec,
        restBetweenRoundsSec: input.restBetweenRoundsSec,
        notes: input.notes === undefined ? undefined : input.notes || null,
        updatedAt: new Date(),
      })
      .where(and(eq(blocks.id, blockId), eq(blocks.teamId, actor.teamId)))
      .returning({ id: blocks.id });
    if (updated.length === 0) throw new NotFound("block");
    if (input.slots) await writeSlots(tx, actor.teamId, blockId, input.slots);
    return getBlock(actor, blockId, tx);
  });
}
