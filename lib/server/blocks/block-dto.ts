import "server-only";
import { and, asc, eq, inArray } from "drizzle-orm";
import type { Queryable } from "@/db/client";
import { blockSlots, blocks, ladders } from "@/db/schema";
import { blockWarnings, estimateBlockSec } from "@/lib/training/block-estimate";
import type { BlockDto } from "@/lib/validation/blocks";
import { firstLiveRungs } from "./rungs-for-estimate";

export const blockColumns = {
  id: blocks.id,
  name: blocks.name,
  rounds: blocks.rounds,
  restBetweenSlotsSec: blocks.restBetweenSlotsSec,
  restBetweenRoundsSec: blocks.restBetweenRoundsSec,
  notes: blocks.notes,
  archivedAt: blocks.archivedAt,
  createdAt: blocks.createdAt,
  updatedAt: blocks.updatedAt,
};

type BlockRow = {
  id: string;
  name: string;
  rounds: number;
  restBetweenSlotsSec: number;
  restBetweenRoundsSec: number;
  notes: string | null;
  archivedAt: Date | null;
  createdAt: Date;
  updatedAt: Date;
};

/** Block rows of one team as DTOs: slots in order, the estimate and the pairing warnings. */
export async function toBlockDtos(q: Queryable, teamId: string, rows: BlockRow[]): Promise<BlockDto[]> {
  if (rows.length === 0) return [];
  const slots = await q
    .select({
      blockId: blockSlots.blockId,
      position: blockSlots.position,
      ladderId: blockSlots.ladderId,
      ladderName: ladders.name,
      sets: blockSlots.sets,
      target: blockSlots.target,
      note: blockSlots.note,
    })
    .from(blockSlots)
    .innerJoin(ladders, eq(ladders.id, blockSlots.ladderId))
    .where(and(eq(blockSlots.teamId, teamId), inArray(blockSlots.blockId, rows.map((r) => r.id))))
    .orderBy(asc(blockSlots.blockId), asc(blockSlots.position));
  const firstRungs = await firstLiveRungs(q, teamId, slots.map((s) => s.ladderId));
  return rows.map((row) => {
    const own = slots
      .filter((s) => s.blockId === row.id)
      .map((s) => ({
        ladderId: s.ladderId,
        ladderName: s.ladderName,
        sets: s.sets,
        target: s.target,
        note: s.note,
        estimateRung: firstRungs.get(s.ladderId) ?? null,
      }));
    const forEstimate = { ...row, slots: own.map((s) => ({ sets: s.sets, rung: s.estimateRung })) };
    return {
      id: row.id,
      name: row.name,
      rounds: row.rounds,
      restBetweenSlotsSec: row.restBetweenSlotsSec,
      restBetweenRoundsSec: row.restBetweenRoundsSec,
      notes: row.notes,
      archived: row.archivedAt !== null,
      slots: own,
      durationSec: estimateBlockSec(forEstimate),
      warnings: blockWarnings(forEstimate),
      createdAt: row.createdAt.toISOString(),
      updatedAt: row.updatedAt.toISOString(),
    };
  });
}
