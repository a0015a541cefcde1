import "server-only";
import { and, eq, inArray, isNull } from "drizzle-orm";
import type { Tx } from "@/db/client";
import { blockSlots, ladders } from "@/db/schema";
import { invalidField } from "@/lib/errors";
import type { BlockSlotInput } from "@/lib/validation/blocks";

/**
 * Replaces a block's slots in the order given. Every ladder must be a live ladder of the team; the
 * first that is not is named as `slots.N.ladderId` (422) and nothing is written.
 */
export async function writeSlots(tx: Tx, teamId: string, blockId: string, slots: readonly BlockSlotInput[]) {
  const found = await tx
    .select({ id: ladders.id })
    .from(ladders)
    .where(and(eq(ladders.teamId, teamId), isNull(ladders.archivedAt), inArray(ladders.id, slots.map((s) => s.ladderId))));
  const known = new Set(found.map((row) => row.id));
  const missing = slots.findIndex((slot) => !known.has(slot.ladderId));
  if (missing >= 0) throw invalidField(`slots.${missing}.ladderId`, "No live ladder with this id in your team.");
  await tx.delete(blockSlots).where(and(eq(blockSlots.blockId, blockId), eq(blockSlots.teamId, teamId)));
  await tx.insert(blockSlots).values(
    slots.map((slot, index) => ({
      teamId,
      blockId,
      position: index + 1,
      ladderId: slot.ladderId,
      sets: slot.sets ?? null,
      target: slot.target || null,
      note: slot.note || null,
    })),
  );
}
