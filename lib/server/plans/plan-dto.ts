import "server-only";
import { and, asc, eq, inArray } from "drizzle-orm";
import type { Queryable } from "@/db/client";
import { blocks, planDayBlocks, plans } from "@/db/schema";
import { toBlockDtos } from "@/lib/server/blocks/block-dto";
import { blockColumns } from "@/lib/server/blocks/block-dto";
import { estimateSessionSec } from "@/lib/training/block-estimate";
import type { BlockDto } from "@/lib/validation/blocks";
import type { PlanDto } from "@/lib/validation/plans";

export const planColumns = {
  id: plans.id,
  name: plans.name,
  weeks: plans.weeks,
  warmUp: plans.warmUp,
  coolDown: plans.coolDown,
  archivedAt: plans.archivedAt,
  createdAt: plans.createdAt,
  updatedAt: plans.updatedAt,
};

type PlanRow = {
  id: string;
  name: string;
  weeks: number;
  warmUp: string | null;
  coolDown: string | null;
  archivedAt: Date | null;
  createdAt: Date;
  updatedAt: Date;
};

const asEstimate = (block: BlockDto) => ({ ...block, slots: block.slots.map((s) => ({ sets: s.sets, rung: s.estimateRung })) });

/** Plan rows of one team as DTOs: each training day's blocks in order with the day's estimate. */
export async function toPlanDtos(q: Queryable, teamId: string, rows: PlanRow[]): Promise<PlanDto[]> {
  if (rows.length === 0) return [];
  const dayBlocks = await q
    .select({ planId: planDayBlocks.planId, weekday: planDayBlocks.weekday, blockId: planDayBlocks.blockId })
    .from(planDayBlocks)
    .where(and(eq(planDayBlocks.teamId, teamId), inArray(planDayBlocks.planId, rows.map((r) => r.id))))
    .orderBy(asc(planDayBlocks.planId), asc(planDayBlocks.weekday), asc(planDayBlocks.position));
  const blockRows = dayBlocks.length
    ? await q
        .select(blockColumns)
        .from(blocks)
        .where(and(eq(blocks.teamId, teamId), inArray(blocks.id, [...new Set(dayBlocks.map((d) => d.blockId))])))
    : [];
  const byId = new Map((await toBlockDtos(q, teamId, blockRows)).map((b) => [b.id, b]));
  return rows.map((row) => {
    const own = dayBlocks.filter((d) => d.planId === row.id);
    const weekdays = [...new Set(own.map((d) => d.weekday))];
    return {
      id: row.id,
      name: row.name,
      weeks: row.weeks,
      warmUp: row.warmUp,
      coolDown: row.coolDown,
      archived: row.archivedAt !== null,
      days: weekdays.map((weekday) => {
        const dayBlocksInOrder = own.filter((d) => d.weekday === weekday).map((d) => byId.get(d.blockId)!);
        return {
          weekday,
          blockIds: dayBlocksInOrder.map((b) => b.id),
          blocks: dayBlocksInOrder.map((b) => ({ id: b.id, name: b.name, durationSec: b.durationSec })),
          durationSec: estimateSessionSec(dayBlocksInOrder.map(asEstimate)),
        };
      }),
      createdAt: row.createdAt.toISOString(),
      updatedAt: row.updatedAt.toISOString(),
    };
  });
}
