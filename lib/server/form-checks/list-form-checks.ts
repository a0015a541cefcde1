import "server-only";
import { and, desc, eq, lt, or, sql } from "drizzle-orm";
import { z } from "zod";
import { db } from "@/db/client";
import { formChecks } from "@/db/schema";
import type { Actor } from "@/lib/server/actor";
import { decodeCursor, pageOf, zPgTimestamp } from "@/lib/server/http/cursor";
import type { ZFormCheckListQuery } from "@/lib/validation/form-checks";
import { selectFormChecks, toFormCheckDto } from "./form-check-dto";
import { visibleFormChecks } from "./form-check-scope";

const zCursor = z.object({ at: zPgTimestamp, id: z.uuid() });

/** Newest first: the team's form checks for staff (optionally one athlete's), an athlete's own otherwise. */
export async function listFormChecks(actor: Actor, query: z.output<typeof ZFormCheckListQuery>) {
  const after = decodeCursor(zCursor, query.cursor);
  const rows = await selectFormChecks(db)
    .where(
      and(
        visibleFormChecks(actor),
        query.athleteId ? eq(formChecks.athleteId, query.athleteId) : undefined,
        after
          ? or(
              lt(formChecks.createdAt, sql`${after.at}::timestamptz`),
              and(eq(formChecks.createdAt, sql`${after.at}::timestamptz`), lt(formChecks.id, after.id)),
            )
          : undefined,
      ),
    )
    .orderBy(desc(formChecks.createdAt), desc(formChecks.id))
    .limit(query.limit + 1);
  const page = pageOf(rows, query.limit, (row) => ({ at: row.createdAtKey, id: row.id }));
  return { items: page.items.map(toFormCheckDto), nextCursor: page.nextCursor };
}
