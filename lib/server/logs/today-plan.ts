import "server-only";
import type { Actor } from "@/lib/server/actor";
import { planForDay } from "@/lib/server/plans/plan-for-day";

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
 * The one integration point with plans: the athlete's blocks for a date, from every active
 * assignment in order (planForDay), reduced to what Today shows. Current rungs are joined in by
 * getToday from the positions it already reads.
 */
export async function plannedBlocksFor(actor: Actor, athleteId: string, date: string): Promise<PlannedBlock[]> {
  const plan = await planForDay(actor, athleteId, date);
  return plan.items.flatMap((session) =>
    session.blocks.map((block) => ({
      id: `${session.assignmentId}:${block.blockId}`,
      name: block.name,
      rounds: block.rounds,
      restBetweenSlotsSec: block.restBetweenSlotsSec,
      restBetweenRoundsSec: block.restBetweenRoundsSec,
      slots: block.slots.map((slot) => ({
        ladderId: slot.ladderId,
        ladderName: slot.ladderName,
        sets: slot.sets,
        target: slot.target,
        note: slot.note,
      })),
    })),
  );
}
