import "server-only";
import { and, asc, eq, gte, inArray, isNull, lte, or } from "drizzle-orm";
import { db } from "@/db/client";
import { assignments, athletePositions, athletes, blockSlots, blocks, ladders, planDayBlocks, plans } from "@/db/schema";
import { daysBetween, isValidDate, isoWeekday, localDateOf } from "@/lib/engine";
import { NotFound, invalidField } from "@/lib/errors";
import type { Actor } from "@/lib/server/actor";
import { visibleAthletes } from "@/lib/server/athletes/athlete-scope";
import { firstLiveRungs, rungsById } from "@/lib/server/blocks/rungs-for-estimate";
import { estimateBlockSec, estimateSessionSec } from "@/lib/training/block-estimate";
import type { PlanForDay, PlannedBlock, PlannedSession } from "@/lib/validation/plans";

/**
 * What an athlete has planned on one day: every active assignment (started, not ended, not
 * cancelled, within the plan's weeks) whose plan has blocks on that ISO weekday, with the blocks in
 * order and each slot's ladder and the athlete's current rung on it. `date` is a team-local
 * YYYY-MM-DD, or an instant that is turned into the team-local date. Nothing planned → `items: []`.
 * Staff may ask about any athlete of the team; an athlete only about themselves (else 404).
 */
export async function planForDay(actor: Actor, athleteId: string, date: string | Date): Promise<PlanForDay> {
  const day = typeof date === "string" ? date : localDateOf(date, actor.timeZone);
  if (!isValidDate(day)) throw invalidField("date", "Use a real calendar date (YYYY-MM-DD).");
  const [athlete] = await db.select({ id: athletes.id }).from(athletes).where(and(eq(athletes.id, athleteId), visibleAthletes(actor)));
  if (!athlete) throw new NotFound("athlete");
  const weekday = isoWeekday(day);

  const active = (
    await db
      .select({
        id: assignments.id,
        planId: plans.id,
        planName: plans.name,
        weeks: plans.weeks,
        warmUp: plans.warmUp,
        coolDown: plans.coolDown,
        startsOn: assignments.startsOn,
      })
      .from(assignments)
      .innerJoin(plans, and(eq(plans.id, assignments.planId), eq(plans.teamId, actor.teamId)))
      .where(
        and(
          eq(assignments.teamId, actor.teamId),
          eq(assignments.athleteId, athlete.id),
          isNull(assignments.cancelledAt),
          lte(assignments.startsOn, day),
          or(isNull(assignments.endsOn), gte(assignments.endsOn, day)),
        ),
      )
      .orderBy(asc(assignments.startsOn), asc(assignments.createdAt))
  ).filter((a) => daysBetween(a.startsOn, day) < a.weeks * 7);
  if (active.length === 0) return { date: day, weekday, items: [] };

  const dayBlocks = await db
    .select({
      planId: planDayBlocks.planId,
      blockId: blocks.id,
      name: blocks.name,
      rounds: blocks.rounds,
      restBetweenSlotsSec: blocks.restBetweenSlotsSec,
      restBetweenRoundsSec: blocks.restBetweenRoundsSec,
      notes: blocks.notes,
    })
    .from(planDayBlocks)
    .innerJoin(blocks, and(eq(blocks.id, planDayBlocks.blockId), eq(blocks.teamId, actor.teamId)))
    .where(
      and(
        eq(planDayBlocks.teamId, actor.teamId),
        inArray(planDayBlocks.planId, [...new Set(active.map((a) => a.planId))]),
        eq(planDayBlocks.weekday, weekday),
      ),
    )
    .orderBy(asc(planDayBlocks.planId), asc(planDayBlocks.position));
  if (dayBlocks.length === 0) return { date: day, weekday, items: [] };

  const slots = await db
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
    .where(and(eq(blockSlots.teamId, actor.teamId), inArray(blockSlots.blockId, [...new Set(dayBlocks.map((b) => b.blockId))])))
    .orderBy(asc(blockSlots.blockId), asc(blockSlots.position));
  const ladderIds = [...new Set(slots.map((s) => s.ladderId))];
  const positions = await db
    .select({ rungId: athletePositions.rungId })
    .from(athletePositions)
    .where(and(eq(athletePositions.teamId, actor.teamId), eq(athletePositions.athleteId, athlete.id), inArray(athletePositions.ladderId, ladderIds)));
  const current = await rungsById(db, actor.teamId, positions.map((p) => p.rungId));
  const first = await firstLiveRungs(db, actor.teamId, ladderIds);

  const blocksOf = (planId: string): PlannedBlock[] =>
    dayBlocks
      .filter((b) => b.planId === planId)
      .map(({ planId: _planId, ...block }) => {
        const own = slots.filter((s) => s.blockId === block.blockId);
        const estimate = {
          ...block,
          slots: own.map((s) => ({ sets: s.sets, rung: current.get(s.ladderId) ?? first.get(s.ladderId) ?? null })),
        };
        return {
          ...block,
          slots: own.map(({ blockId: _blockId, ...slot }) => {
            const rung = current.get(slot.ladderId);
            return { ...slot, rung: rung ? { id: rung.id, name: rung.name, measure: rung.measure } : null };
          }),
          durationSec: estimateBlockSec(estimate),
        };
      });

  const items: PlannedSession[] = [];
  for (const a of active) {
    const planned = blocksOf(a.planId);
    if (planned.length === 0) continue;
    const estimates = planned.map((b) => ({
      ...b,
      slots: b.slots.map((s) => ({ sets: s.sets, rung: current.get(s.ladderId) ?? first.get(s.ladderId) ?? null })),
    }));
    items.push({
      assignmentId: a.id,
      planId: a.planId,
      planName: a.planName,
      week: Math.floor(daysBetween(a.startsOn, day) / 7) + 1,
      weeks: a.weeks,
      warmUp: a.warmUp,
      coolDown: a.coolDown,
      blocks: planned,
      durationSec: estimateSessionSec(estimates),
    });
  }
  return { date: day, weekday, items };
}
