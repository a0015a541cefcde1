import "server-only";
import { and, asc, eq, gt, isNotNull, isNull, or } from "drizzle-orm";
import type { z } from "zod";
import { db } from "@/db/client";
import { plans } from "@/db/schema";
import type { Actor } from "@/lib/server/actor";
import { decodeCursor, pageOf, zNameIdCursor } from "@/lib/server/http/cursor";
import type { ZPlanListQuery } from "@/lib/validation/plans";
import { planColumns, toPlanDtos } from "./plan-dto";

/** The team's plans by name (live ones, or archived ones with `archived=true`), a page at a time. */
export async function listPlans(actor: Actor, query: z.output<typeof ZPlanListQuery>) {
  const after = decodeCursor(zNameIdCursor, query.cursor);
  const rows = await db
    .select(planColumns)
    .from(plans)
    .where(
      and(
        eq(plans.teamId, actor.teamId),
        query.archived ? isNotNull(plans.archivedAt) : isNull(plans.archivedAt),
        after ? or(gt(plans.name, after.name), and(eq(plans.name, after.name), gt(plans.id, after.id))) : undefined,
      ),
    )
    .orderBy(asc(plans.name), asc(plans.id))
    .limit(query.limit + 1);
  const page = pageOf(rows, query.limit, (row) => ({ name: row.name, id: row.id }));
  return { items: await toPlanDtos(db, actor.teamId, page.items), nextCursor: page.nextCursor };
}
