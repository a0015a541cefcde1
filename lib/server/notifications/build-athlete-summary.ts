import "server-only";
import { and, asc, between, countDistinct, eq, inArray, isNull, sql } from "drizzle-orm";
import { alias } from "drizzle-orm/pg-core";
import type { Queryable } from "@/db/client";
import { athletePositions, athletes, ladders, logEntries, promotions, rungs } from "@/db/schema";
import type { AthleteSummary } from "@/emails/athlete-summary-email";
import { parseIsoWeek } from "@/lib/engine";
import { invalidField } from "@/lib/errors";

/** An athlete's own week: training days, pain flags, moves up, and where each ladder stands now. */
export async function buildAthleteSummary(
  q: Queryable,
  input: { teamId: string; athleteId: string; week: string },
): Promise<AthleteSummary | null> {
  const week = parseIsoWeek(input.week);
  if (!week) throw invalidField("week", "Use an ISO week like 2026-W49.");
  const [athlete] = await q
    .select({ name: athletes.name })
    .from(athletes)
    .where(and(eq(athletes.id, input.athleteId), eq(athletes.teamId, input.teamId)));
  if (!athlete) return null;
  const inWeek = and(
    eq(logEntries.athleteId, input.athleteId),
    eq(logEntries.teamId, input.teamId),
    isNull(logEntries.deletedAt),
    between(logEntries.performedOn, week.start, week.end),
  );
  const toRung = alias(rungs, "to_rung");
  const [[days], moved, positions] = await Promise.all([
    q
      .select({
        sessions: countDistinct(logEntries.performedOn),
        pain: sql<number>`count(*) filter (where ${logEntries.pain})::int`,
      })
      .from(logEntries)
      .where(inWeek),
    q
      .select({ ladderName: ladders.name, rungName: toRung.name, on: promotions.effectiveOn })
      .from(promotions)
      .innerJoin(ladders, eq(ladders.id, promotions.ladderId))
      .leftJoin(toRung, eq(toRung.id, promotions.toRungId))
      .where(
        and(
          eq(promotions.teamId, input.teamId),
          eq(promotions.athleteId, input.athleteId),
          inArray(promotions.status, ["auto", "approved"]),
          eq(promotions.direction, "up"),
          between(promotions.effectiveOn, week.start, week.end),
        ),
      )
      .orderBy(asc(promotions.effectiveOn)),
    q
      .select({ ladderName: ladders.name, rungName: rungs.name, readiness: athletePositions.readiness })
      .from(athletePositions)
      .innerJoin(ladders, eq(ladders.id, athletePositions.ladderId))
      .innerJoin(rungs, eq(rungs.id, athletePositions.rungId))
      .where(and(eq(athletePositions.teamId, input.teamId), eq(athletePositions.athleteId, input.athleteId)))
      .orderBy(asc(ladders.name)),
  ]);
  return {
    athleteName: athlete.name,
    week: input.week,
    from: week.start,
    to: week.end,
    sessions: Number(days?.sessions ?? 0),
    painFlags: Number(days?.pain ?? 0),
    promotions: moved,
    positions,
  };
}
