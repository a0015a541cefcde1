import "server-only";
import { and, asc, eq, inArray, sql } from "drizzle-orm";
import { alias } from "drizzle-orm/pg-core";
import type { Queryable } from "@/db/client";
import { athletePositions, ladders, rungPrerequisites, rungs, standards } from "@/db/schema";
import { describeStandard, type Measure } from "@/lib/engine";
import { NotFound } from "@/lib/errors";
import type { LadderDto, RungDto } from "@/lib/validation/ladders";
import { standardColumns } from "@/lib/server/ladders/standard-columns";

const requiredRung = alias(rungs, "required_rung");
const requiredLadder = alias(ladders, "required_ladder");

/** The rungs of some ladders (live and archived) with standards, prerequisites and athlete counts. */
export async function loadRungs(q: Queryable, teamId: string, ladderIds: string[]): Promise<RungDto[]> {
  if (ladderIds.length === 0) return [];
  const rows = await q
    .select({
      id: rungs.id,
      ladderId: rungs.ladderId,
      position: rungs.position,
      name: rungs.name,
      measure: rungs.measure,
      setting: rungs.setting,
      cues: rungs.cues,
      caution: rungs.caution,
      demoVideoUrl: rungs.demoVideoUrl,
      tags: rungs.tags,
      archivedAt: rungs.archivedAt,
      athleteCount: sql<number>`(select count(*)::int from ${athletePositions} where ${athletePositions.rungId} = ${rungs.id})`,
      standard: standardColumns,
    })
    .from(rungs)
    .innerJoin(standards, eq(standards.rungId, rungs.id))
    .where(and(eq(rungs.teamId, teamId), inArray(rungs.ladderId, ladderIds)))
    .orderBy(asc(rungs.ladderId), asc(rungs.position));
  const ids = rows.map((r) => r.id);
  const prereqs = ids.length
    ? await q
        .select({
          rungId: rungPrerequisites.rungId,
          requiresRungId: requiredRung.id,
          rungName: requiredRung.name,
          ladderId: requiredLadder.id,
          ladderName: requiredLadder.name,
        })
        .from(rungPrerequisites)
        .innerJoin(requiredRung, eq(requiredRung.id, rungPrerequisites.requiresRungId))
        .innerJoin(requiredLadder, eq(requiredLadder.id, requiredRung.ladderId))
        .where(and(eq(rungPrerequisites.teamId, teamId), inArray(rungPrerequisites.rungId, ids)))
        .orderBy(asc(requiredLadder.name), asc(requiredRung.position))
    : [];
  return rows.map(({ archivedAt, standard, ...row }) => ({
    ...row,
    tags: row.tags as RungDto["tags"],
    archived: archivedAt !== null,
    prerequisites: prereqs
      .filter((p) => p.rungId === row.id)
      .map((p) => ({ rungId: p.requiresRungId, rungName: p.rungName, ladderId: p.ladderId, ladderName: p.ladderName })),
    standard,
    standardText: describeStandard(row.measure as Measure, standard),
  }));
}

/** One ladder of the team with its rungs in order (404 for another team's). */
export async function loadLadder(q: Queryable, teamId: string, ladderId: string): Promise<LadderDto> {
  const [ladder] = await q
    .select({
      id: ladders.id,
      name: ladders.name,
      targetSkill: ladders.targetSkill,
      notes: ladders.notes,
      promotionMode: ladders.promotionMode,
      starterKey: ladders.starterKey,
      archivedAt: ladders.archivedAt,
      createdAt: ladders.createdAt,
      updatedAt: ladders.updatedAt,
    })
    .from(ladders)
    .where(and(eq(ladders.id, ladderId), eq(ladders.teamId, teamId)));
  if (!ladder) throw new NotFound("ladder");
  const all = await loadRungs(q, teamId, [ladderId]);
  const { starterKey, archivedAt, createdAt, updatedAt, ...rest } = ladder;
  return {
    ...rest,
    starter: starterKey !== null,
    archived: archivedAt !== null,
    rungs: all.filter((r) => !r.archived),
    archivedRungs: all.filter((r) => r.archived).sort((a, b) => b.position - a.position),
    createdAt: createdAt.toISOString(),
    updatedAt: updatedAt.toISOString(),
  };
}

/** One rung of the team (live or archived), 404 for another team's. */
export async function loadRung(q: Queryable, teamId: string, rungId: string): Promise<RungDto> {
  const [row] = await q
    .select({ ladderId: rungs.ladderId })
    .from(rungs)
    .where(and(eq(rungs.id, rungId), eq(rungs.teamId, teamId)));
  if (!row) throw new NotFound("rung");
  const found = (await loadRungs(q, teamId, [row.ladderId])).find((r) => r.id === rungId);
  if (!found) throw new NotFound("rung");
  return found;
}
