import "server-only";
import { and, eq, inArray, isNull } from "drizzle-orm";
import type { Tx } from "@/db/client";
import { assignments, athletePositions, blockSlots, planDayBlocks, plans } from "@/db/schema";
import { localDateOf } from "@/lib/engine";
import { assertCanReceiveAssignment } from "@/lib/server/billing/assert-can-receive-assignment";
import { invalidField } from "@/lib/errors";
import type { Actor } from "@/lib/server/actor";
import { firstLiveRungs } from "@/lib/server/blocks/rungs-for-estimate";
import { writePlacement } from "@/lib/server/positions/write-placement";
import type { AssignmentDto, CreateAssignmentInput } from "@/lib/validation/plans";
import { selectAssignments, toAssignmentDto } from "./assignment-dto";

/**
 * Gives a plan to athletes of the team (already checked by the caller), inside the caller's
 * transaction: one assignment each, and a first placement on every ladder the plan's blocks use
 * where the athlete has no position yet. Existing positions are never touched.
 *
 * The placement's `since` (the day evidence on the rung counts from) is the later of the start date
 * and today in the team's zone: a plan starting next month starts the clock next month, and a plan
 * back-dated to last week does not pretend the athlete has been on the rung for a week. The coach
 * can move anyone afterwards.
 */
export async function assignPlan(
  tx: Tx,
  actor: Actor,
  athleteIds: readonly string[],
  input: CreateAssignmentInput,
  squadId: string | null,
  /** Team-local today; the clock's by default (the seed passes its own `now`). */
  today = localDateOf(new Date(), actor.timeZone),
): Promise<AssignmentDto[]> {
  const [plan] = await tx
    .select({ id: plans.id })
    .from(plans)
    .where(and(eq(plans.id, input.planId), eq(plans.teamId, actor.teamId), isNull(plans.archivedAt)))
    .for("share");
  if (!plan) throw invalidField("planId", "No live plan with this id in your team.");
  for (const athleteId of athleteIds) await assertCanReceiveAssignment(tx, actor.teamId, athleteId);

  const ladderRows = await tx
    .selectDistinct({ ladderId: blockSlots.ladderId })
    .from(planDayBlocks)
    .innerJoin(blockSlots, eq(blockSlots.blockId, planDayBlocks.blockId))
    .where(and(eq(planDayBlocks.planId, plan.id), eq(planDayBlocks.teamId, actor.teamId)));
  // A stable order, so concurrent assignments lock position rows in the same sequence.
  const ladderIds = ladderRows.map((r) => r.ladderId).sort();
  const firstRungs = await firstLiveRungs(tx, actor.teamId, ladderIds);
  const since = input.startsOn > today ? input.startsOn : today;

  const existing = ladderIds.length
    ? await tx
        .select({ athleteId: athletePositions.athleteId, ladderId: athletePositions.ladderId })
        .from(athletePositions)
        .where(
          and(
            eq(athletePositions.teamId, actor.teamId),
            inArray(athletePositions.athleteId, [...athleteIds]),
            inArray(athletePositions.ladderId, ladderIds),
          ),
        )
    : [];
  const placedAlready = new Set(existing.map((p) => `${p.athleteId}/${p.ladderId}`));

  const placedBy = new Map<string, { ladderId: string; rungId: string }[]>();
  for (const athleteId of athleteIds) {
    const placed: { ladderId: string; rungId: string }[] = [];
    for (const ladderId of ladderIds) {
      const rung = firstRungs.get(ladderId);
      if (!rung || placedAlready.has(`${athleteId}/${ladderId}`)) continue;
      await writePlacement(tx, { teamId: actor.teamId, athleteId, ladderId, rungId: rung.id, since, actorUserId: actor.userId });
      placed.push({ ladderId, rungId: rung.id });
    }
    placedBy.set(athleteId, placed);
  }

  const inserted = await tx
    .insert(assignments)
    .values(
      athleteIds.map((athleteId) => ({
        teamId: actor.teamId,
        athleteId,
        planId: plan.id,
        squadId,
        startsOn: input.startsOn,
        endsOn: input.endsOn ?? null,
        createdById: actor.userId,
      })),
    )
    .returning({ id: assignments.id });
  const rows = await selectAssignments(tx, actor.teamId).where(inArray(assignments.id, inserted.map((r) => r.id)));
  const order = new Map(athleteIds.map((id, index) => [id, index]));
  return rows
    .sort((a, b) => order.get(a.athleteId)! - order.get(b.athleteId)!)
    .map((row) => ({ ...toAssignmentDto(row), placed: placedBy.get(row.athleteId) ?? [] }));
}
