import "server-only";
import { and, eq } from "drizzle-orm";
import { db } from "@/db/client";
import { ladders, rungs, standards } from "@/db/schema";
import type { Measure } from "@/lib/engine";
import { NotFound } from "@/lib/errors";
import type { Actor } from "@/lib/server/actor";
import type { BacktestStandard } from "@/lib/validation/backtest";
import { standardOf } from "./standard-of";
import { standardColumns } from "@/lib/server/ladders/standard-columns";

/** A rung of the actor's team with its current standard, as the what-if page starts from. */
export async function getRungStandard(actor: Actor, ladderId: string, rungId: string) {
  const [row] = await db
    .select({
      ladderName: ladders.name,
      rungName: rungs.name,
      measure: rungs.measure,
      standard: standardColumns,
    })
    .from(rungs)
    .innerJoin(ladders, eq(ladders.id, rungs.ladderId))
    .leftJoin(standards, eq(standards.rungId, rungs.id))
    .where(and(eq(rungs.id, rungId), eq(rungs.ladderId, ladderId), eq(rungs.teamId, actor.teamId)));
  if (!row) throw new NotFound("rung");
  const measure: Measure = row.measure;
  const standard: BacktestStandard = { ...standardOf(measure, row.standard?.sets != null ? row.standard : null), painFree: row.standard?.painFree ?? true };
  return { ladderName: row.ladderName, rungName: row.rungName, measure, standard };
}
