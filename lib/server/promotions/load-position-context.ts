import "server-only";
import { and, asc, desc, eq, gt, isNull, lt, sql } from "drizzle-orm";
import { alias } from "drizzle-orm/pg-core";
import type { Queryable } from "@/db/client";
import { athletePositions, athletes, ladders, rungPrerequisites, rungs, standards, teams } from "@/db/schema";
import type { Measure, PrerequisiteState, PromotionMode, Standard } from "@/lib/engine";
import { standardOf } from "./standard-of";

export interface RungRef {
  id: string;
  name: string;
  position: number;
}

/** Everything the engine needs about one position, read in one place for every caller. */
export interface PositionContext {
  position: {
    id: string;
    teamId: string;
    athleteId: string;
    athleteName: string;
    ladderId: string;
    rungId: string;
    since: string;
    status: typeof athletePositions.$inferSelect.status;
    achievedAt: Date | null;
  };
  ladder: { id: string; name: string; promotionMode: PromotionMode };
  rung: RungRef & { measure: Measure };
  standard: Standard;
  timeZone: string;
  /** The next live rung up; null on the last rung (reaching the standard there achieves the skill). */
  nextRung: RungRef | null;
  /** The live rung below, the target of a step down; null on the first rung. */
  previousRung: RungRef | null;
  /** Prerequisites of the next rung, with whether the athlete has reached each. */
  prerequisites: PrerequisiteState[];
}

/**
 * Reads one position with its ladder, rung, standard, neighbours and prerequisites. `teamId` scopes
 * the read for a caller acting for a team; the system (daily job, seed) passes none. With `lock`,
 * the position row is locked FOR UPDATE first, so the rest is read under the lock.
 */
export async function loadPositionContext(
  q: Queryable,
  options: { positionId: string; teamId?: string; lock?: boolean },
): Promise<PositionContext | null> {
  const scope = and(eq(athletePositions.id, options.positionId), options.teamId ? eq(athletePositions.teamId, options.teamId) : undefined);
  if (options.lock) {
    const [locked] = await q.select({ id: athletePositions.id }).from(athletePositions).where(scope).for("update");
    if (!locked) return null;
  }
  const [row] = await q
    .select({
      position: {
        id: athletePositions.id,
        teamId: athletePositions.teamId,
        athleteId: athletePositions.athleteId,
        athleteName: athletes.name,
        ladderId: athletePositions.ladderId,
        rungId: athletePositions.rungId,
        since: athletePositions.since,
        status: athletePositions.status,
        achievedAt: athletePositions.achievedAt,
      },
      ladder: { id: ladders.id, name: ladders.name, promotionMode: ladders.promotionMode },
      rung: { id: rungs.id, name: rungs.name, position: rungs.position, measure: rungs.measure },
      standard: {
        sets: standards.sets,
        minValue: standards.minValue,
        minReps: standards.minReps,
        maxRpe: standards.maxRpe,
        minRir: standards.minRir,
        sessionsRequired: standards.sessionsRequired,
        sessionsWindow: standards.sessionsWindow,
        minDaysOnRung: standards.minDaysOnRung,
        painFree: standards.painFree,
        stepDown: standards.stepDown,
      },
      timeZone: teams.timeZone,
    })
    .from(athletePositions)
    .innerJoin(athletes, eq(athletes.id, athletePositions.athleteId))
    .innerJoin(ladders, eq(ladders.id, athletePositions.ladderId))
    .innerJoin(rungs, eq(rungs.id, athletePositions.rungId))
    .innerJoin(teams, eq(teams.id, athletePositions.teamId))
    .leftJoin(standards, eq(standards.rungId, rungs.id))
    .where(scope);
  if (!row) return null;

  const [nextRung, previousRung] = await Promise.all([
    neighbour(q, row.ladder.id, row.rung.position, "up"),
    neighbour(q, row.ladder.id, row.rung.position, "down"),
  ]);
  const hasStandard = row.standard !== null && row.standard.sets !== null;
  return {
    position: row.position,
    ladder: row.ladder,
    rung: row.rung,
    standard: standardOf(row.rung.measure, hasStandard ? row.standard : null),
    timeZone: row.timeZone,
    nextRung,
    previousRung,
    prerequisites: nextRung ? await prerequisitesOf(q, nextRung.id, row.position.athleteId) : [],
  };
}

/** The nearest live rung above or below a position on the ladder (archived rungs sit at ≤ 0). */
async function neighbour(q: Queryable, ladderId: string, position: number, way: "up" | "down"): Promise<RungRef | null> {
  const [row] = await q
    .select({ id: rungs.id, name: rungs.name, position: rungs.position })
    .from(rungs)
    .where(
      and(
        eq(rungs.ladderId, ladderId),
        isNull(rungs.archivedAt),
        way === "up" ? gt(rungs.position, position) : and(lt(rungs.position, position), gt(rungs.position, 0)),
      ),
    )
    .orderBy(way === "up" ? asc(rungs.position) : desc(rungs.position))
    .limit(1);
  return row ?? null;
}

/**
 * A prerequisite is reached when the athlete stands on that rung or a later one of its ladder, or
 * has achieved that ladder's skill.
 */
async function prerequisitesOf(q: Queryable, rungId: string, athleteId: string): Promise<PrerequisiteState[]> {
  const required = alias(rungs, "required_rung");
  const standing = alias(rungs, "standing_rung");
  const rows = await q
    .select({
      rungId: required.id,
      rungName: required.name,
      ladderName: ladders.name,
      reached: sql<boolean>`coalesce(${athletePositions.achievedAt} is not null or ${standing.position} >= ${required.position}, false)`,
    })
    .from(rungPrerequisites)
    .innerJoin(required, eq(required.id, rungPrerequisites.requiresRungId))
    .innerJoin(ladders, eq(ladders.id, required.ladderId))
    .leftJoin(athletePositions, and(eq(athletePositions.athleteId, athleteId), eq(athletePositions.ladderId, required.ladderId)))
    .leftJoin(standing, eq(standing.id, athletePositions.rungId))
    .where(eq(rungPrerequisites.rungId, rungId))
    .orderBy(asc(ladders.name), asc(required.position));
  return rows.map((r) => ({ ...r, reached: r.reached === true }));
}
