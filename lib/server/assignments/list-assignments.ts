import "server-only";
import { and, desc, eq, lt, or } from "drizzle-orm";
import { z } from "zod";
import { db } from "@/db/client";
import { assignments, athletes } from "@/db/schema";
import { NotFound } from "@/lib/errors";
import type { Actor } from "@/lib/server/actor";
import { visibleAthletes } from "@/lib/server/athletes/athlete-scope";
import { zDate } from "@/lib/validation/common";
import { decodeCursor, pageOf } from "@/lib/server/http/cursor";
import type { ZAssignmentListQuery } from "@/lib/validation/plans";
import { selectAssignments, toAssignmentDto } from "./assignment-dto";

const zCursor = z.object({ startsOn: zDate, id: z.uuid() });

/** An athlete's assignments, latest start first. Staff see any athlete of the team; an athlete only their own. */
export async function listAssignments(actor: Actor, athleteId: string, query: z.output<typeof ZAssignmentListQuery>) {
  const [athlete] = await db.select({ id: athletes.id }).from(athletes).where(and(eq(athletes.id, athleteId), visibleAthletes(actor)));
  if (!athlete) throw new NotFound("athlete");
  const after = decodeCursor(zCursor, query.cursor);
  const rows = await selectAssignments(db, actor.teamId)
    .where(
      and(
        eq(assignments.teamId, actor.teamId),
        eq(assignments.athleteId, athlete.id),
        after
          ? or(lt(assignments.startsOn, after.startsOn), and(eq(assignments.startsOn, after.startsOn), lt(assignments.id, after.id)))
          : undefined,
      ),
    )
    .orderBy(desc(assignments.startsOn), desc(assignments.id))
    .limit(query.limit + 1);
  const page = pageOf(rows, query.limit, (row) => ({ startsOn: row.startsOn, id: row.id }));
  return { items: page.items.map(toAssignmentDto), nextCursor: page.nextCursor };
}
