import "server-only";
import { and, asc, eq, gt, inArray, isNull } from "drizzle-orm";
import type { Queryable } from "@/db/client";
import { rungs, standards } from "@/db/schema";
import type { RungTag } from "@/lib/engine";
import type { EstimateRung } from "@/lib/validation/blocks";

const rungColumns = {
  id: rungs.id,
  ladderId: rungs.ladderId,
  name: rungs.name,
  measure: rungs.measure,
  tags: rungs.tags,
  target: standards.minValue,
  lowerings: standards.minReps,
};

type Row = { id: string; ladderId: string; name: string; measure: EstimateRung["measure"]; tags: string[]; target: number | null; lowerings: number | null };

function toEstimateRung(row: Row): EstimateRung {
  return {
    id: row.id,
    name: row.name,
    measure: row.measure,
    target: row.target ?? 0,
    lowerings: row.measure === "eccentric_seconds" ? row.lowerings : null,
    tags: row.tags as RungTag[],
  };
}

/** The first live rung of each ladder (lowest positive position), with its standard's value per set. */
export async function firstLiveRungs(q: Queryable, teamId: string, ladderIds: readonly string[]) {
  const result = new Map<string, EstimateRung>();
  if (ladderIds.length === 0) return result;
  const rows = await q
    .selectDistinctOn([rungs.ladderId], rungColumns)
    .from(rungs)
    .leftJoin(standards, eq(standards.rungId, rungs.id))
    .where(and(eq(rungs.teamId, teamId), inArray(rungs.ladderId, [...new Set(ladderIds)]), isNull(rungs.archivedAt), gt(rungs.position, 0)))
    .orderBy(asc(rungs.ladderId), asc(rungs.position));
  for (const row of rows) result.set(row.ladderId, toEstimateRung(row));
  return result;
}

/** Specific rungs by id (an athlete's current rungs), keyed by ladder. */
export async function rungsById(q: Queryable, teamId: string, rungIds: readonly string[]) {
  const result = new Map<string, EstimateRung>();
  if (rungIds.length === 0) return result;
  const rows = await q
    .select(rungColumns)
    .from(rungs)
    .leftJoin(standards, eq(standards.rungId, rungs.id))
    .where(and(eq(rungs.teamId, teamId), inArray(rungs.id, [...new Set(rungIds)])));
  for (const row of rows) result.set(row.ladderId, toEstimateRung(row));
  return result;
}
