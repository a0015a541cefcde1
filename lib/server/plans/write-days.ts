import "server-only";
import { and, eq, inArray } from "drizzle-orm";
import type { Tx } from "@/db/client";
import { blocks, planDayBlocks } from "@/db/schema";
import { invalidField } from "@/lib/errors";
import type { CreatePlanInput } from "@/lib/validation/plans";

/**
 * Replaces a plan's week. Every block must be a live block of the team, or one this plan already
 * uses (an archived block stays where it was); blocks are locked against a concurrent delete. The
 * first that is neither is named as `days.N.blockIds.M` (422) and nothing is written.
 */
export async function writeDays(tx: Tx, teamId: string, planId: string, days: CreatePlanInput["days"]) {
  const ids = [...new Set(days.flatMap((d) => d.blockIds))];
  const found = ids.length
    ? await tx
        .select({ id: blocks.id, archivedAt: blocks.archivedAt })
        .from(blocks)
        .where(and(eq(blocks.teamId, teamId), inArray(blocks.id, ids)))
        .for("share")
    : [];
  const current = await tx
    .select({ blockId: planDayBlocks.blockId })
    .from(planDayBlocks)
    .where(and(eq(planDayBlocks.planId, planId), eq(planDayBlocks.teamId, teamId)));
  const inPlan = new Set(current.map((row) => row.blockId));
  const known = new Set(found.filter((row) => row.archivedAt === null || inPlan.has(row.id)).map((row) => row.id));
  days.forEach((day, d) =>
    day.blockIds.forEach((blockId, b) => {
      if (!known.has(blockId)) throw invalidField(`days.${d}.blockIds.${b}`, "No live block with this id in your team.");
    }),
  );
  await tx.delete(planDayBlocks).where(and(eq(planDayBlocks.planId, planId), eq(planDayBlocks.teamId, teamId)));
  const rows = days.flatMap((day) => day.blockIds.map((blockId, index) => ({ teamId, planId, weekday: day.weekday, position: index + 1, blockId })));
  if (rows.length) await tx.insert(planDayBlocks).values(rows);
}
