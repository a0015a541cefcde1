import "server-only";
import { and, asc, eq, gte, inArray, isNull, lte, or } from "drizzle-orm";
import { db } from "@/db/client";
import { assignments, blockSlots, blocks, ladders, planDayBlocks, plans } from "@/db/schema";
import { addDays } from "@/lib/engine/calendar-date";
import { isoWeekday } from "@/lib/engine/iso-week";
import type { Actor } from "@/lib/server/actor";

export interface PlannedSlot {
  ladderId: string;
  ladderName: string;
  sets: number | null;
  target: string | null;
  note: string | null;
}

export interface PlannedBlock {
  id: string;
  name: string;
  rounds: number;
  restBetweenSlotsSec: number;
  restBetweenRoundsSec: number;
  slots: PlannedSlot[];
}

/**
 * THE ONE INTEGRATION POINT with plans: the athlete's blocks for a date. Until
 * `lib/server/plans/plan-for-day.ts` (planForDay) lands, this reads the plan tables directly in the
 * simplest way (active assignments, the plan's blocks on that ISO weekday, in order). When it lands,
 * replace the body with a call to planForDay(actor, athleteId, date) mapped to PlannedBlock[].
 */
export async function plannedBlocksFor(actor: Actor, athleteId: string, date: string): Promise<PlannedBlock[]> {
  const active = await db
    .select({ planId: assignments.planId, startsOn: assignments.startsOn, weeks: plans.weeks })
    .from(assignments)
    .innerJoin(plans, eq(plans.id, assignments.planId))
    .where(
      and(
        eq(assignments.teamId, actor.teamId),
        eq(assignments.athleteId, athleteId),
        isNull(assignments.cancelledAt),
        isNull(plans.archivedAt),
        lte(assignments.startsOn, date),
        or(isNull(assignments.endsOn), gte(assignments.endsOn, date)),
      ),
    )
    .orderBy(asc(assignments.startsOn));
  const planIds = active.filter((a) => addDays(a.startsOn, a.weeks * 7) > date).map((a) => a.planId);
  if (planIds.length === 0) return [];
  const dayBlocks = await db
    .select({
      planId: planDayBlocks.planId,
      id: blocks.id,
      name: blocks.name,
      rounds: blocks.rounds,
      restBetweenSlotsSec: blocks.restBetweenSlotsSec,
      restBetweenRoundsSec: blocks.restBetweenRoundsSec,
    })
    .from(planDayBlocks)
    .innerJoin(blocks, eq(blocks.id, planDayBlocks.blockId))
    .where(
      and(
        eq(planDayBlocks.teamId, actor.teamId),
        inArray(planDayBlocks.planId, planIds),
        eq(planDayBlocks.weekday, isoWeekday(date)),
      ),
    )
    .orderBy(asc(planDayBlocks.position));
  if (dayBlocks.length === 0) return [];
  const slots = await db
    .select({
      blockId: blockSlots.blockId,
      ladderId: blockSlots.ladderId,
      ladderName: ladders.name,
      sets: blockSlots.sets,
      target: blockSlots.target,
      note: blockSlots.note,
    })
    .from(blockSlots)
    .innerJoin(ladders, eq(ladders.id, blockSlots.ladderId))
    .where(inArray(blockSlots.blockId, dayBlocks.map((b) => b.id)))
    .orderBy(asc(blockSlots.position));
  const ordered = planIds.flatMap((planId) => dayBlocks.filter((b) => b.planId === planId));
  return ordered.map(({ planId: _planId, ...block }) => ({
    ...block,
    slots: slots.filter((s) => s.blockId === block.id).map(({ blockId: _blockId, ...slot }) => slot),
  }));
}
