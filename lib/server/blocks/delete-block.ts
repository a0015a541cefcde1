import "server-only";
import { and, eq } from "drizzle-orm";
import { db } from "@/db/client";
import { blocks, planDayBlocks } from "@/db/schema";
import { NotFound } from "@/lib/errors";
import type { Actor } from "@/lib/server/actor";

/**
 * Removes a block from the team's list. A block that any plan uses (archived plans included) is
 * archived instead of deleted, so those plans and their athletes' sessions keep it; an unused block
 * is deleted with its slots. Either way the answer is 204.
 */
export async function deleteBlock(actor: Actor, blockId: string): Promise<void> {
  await db.transaction(async (tx) => {
    const [block] = await tx
      .select({ id: blocks.id })
      .from(blocks)
      .where(and(eq(blocks.id, blockId), eq(blocks.teamId, actor.teamId)))
      .for("update");
    if (!block) throw new NotFound("block");
    const [used] = await tx
      .select({ planId: planDayBlocks.planId })
      .from(planDayBlocks)
      .where(and(eq(planDayBlocks.blockId, blockId), eq(planDayBlocks.teamId, actor.teamId)))
      .limit(1);
    if (used) await tx.update(blocks).set({ archivedAt: new Date() }).where(eq(blocks.id, blockId));
    else await tx.delete(blocks).where(eq(blocks.id, blockId));
  });
}
