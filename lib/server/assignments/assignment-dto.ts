import "server-only";
import { and, eq } from "drizzle-orm";
import type { Queryable } from "@/db/client";
import { assignments, athletes, plans } from "@/db/schema";
import { addDays } from "@/lib/engine";
import type { AssignmentDto } from "@/lib/validation/plans";

/** The last day an assignment runs: its end date, or the plan's last week's Sunday-equivalent if sooner. */
export function lastDayOf(startsOn: string, endsOn: string | null, weeks: number): string {
  const planEnd = addDays(startsOn, weeks * 7 - 1);
  return endsOn && endsOn < planEnd ? endsOn : planEnd;
}

export function selectAssignments(q: Queryable, teamId: string) {
  return q
    .select({
      id: assignments.id,
      athleteId: assignments.athleteId,
      athleteName: athletes.name,
      planId: assignments.planId,
      planName: plans.name,
      weeks: plans.weeks,
      squadId: assignments.squadId,
      startsOn: assignments.startsOn,
      endsOn: assignments.endsOn,
      cancelledAt: assignments.cancelledAt,
      createdAt: assignments.createdAt,
    })
    .from(assignments)
    .innerJoin(athletes, and(eq(athletes.id, assignments.athleteId), eq(athletes.teamId, teamId)))
    .innerJoin(plans, and(eq(plans.id, assignments.planId), eq(plans.teamId, teamId)));
}

type Row = Awaited<ReturnType<ReturnType<typeof selectAssignments>["execute"]>>[number];

export function toAssignmentDto(row: Row): AssignmentDto {
  return {
    id: row.id,
    athleteId: row.athleteId,
    athleteName: row.athleteName,
    planId: row.planId,
    planName: row.planName,
    squadId: row.squadId,
    startsOn: row.startsOn,
    endsOn: row.endsOn,
    lastDay: lastDayOf(row.startsOn, row.endsOn, row.weeks),
    cancelled: row.cancelledAt !== null,
    createdAt: row.createdAt.toISOString(),
  };
}
