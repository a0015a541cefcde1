import "server-only";
import { and, asc, between, eq, inArray, isNull, max, ne, sql } from "drizzle-orm";
import { alias } from "drizzle-orm/pg-core";
import type { Queryable } from "@/db/client";
import { athletePositions, ladders, logEntries, promotions, rungs } from "@/db/schema";
import type { CoachDigest } from "@/emails/coach-digest-email";
import { addDays, parseIsoWeek } from "@/lib/engine";
import { invalidField } from "@/lib/errors";
import { digestAthletes } from "./digest-scope";

/** An athlete counts as stalled when none of their rungs moved up for this many weeks. */
export const STALL_WEEKS = 4; // common practice, no source

/**
 * The figures of one coach's digest for one ISO week (Monday–Sunday, local dates of the team's zone):
 * promotions that took effect in the week, approvals waiting now, pain flags logged in the week,
 * athletes whose newest rung is older than STALL_WEEKS at the week's end, and athletes with no session
 * in the week. Null when the person is not in the team.
 */
export async function buildCoachDigest(q: Queryable, input: { teamId: string; userId: string; week: string }): Promise<CoachDigest | null> {
  const week = parseIsoWeek(input.week);
  if (!week) throw invalidField("week", "Use an ISO week like 2026-W49.");
  const scope = await digestAthletes(q, input.teamId, input.userId);
  if (!scope) return null;
  const digest: CoachDigest = {
    coachName: scope.person.name,
    teamName: scope.person.teamName,
    week: input.week,
    from: week.start,
    to: week.end,
    stallWeeks: STALL_WEEKS,
    promotions: [],
    pendingApprovals: [],
    stalled: [],
    painFlags: [],
    noSessions: [],
  };
  if (scope.athletes.length === 0) return digest;
  const ids = scope.athletes.map((a) => a.id);
  const nameOf = new Map(scope.athletes.map((a) => [a.id, a.name]));
  const toRung = alias(rungs, "to_rung");
  const inTeam = eq(promotions.teamId, input.teamId);

  const [moved, pending, pain, trained, newest] = await Promise.all([
    q
      .select({ athleteId: promotions.athleteId, ladderName: ladders.name, rungName: toRung.name, on: promotions.effectiveOn })
      .from(promotions)
      .innerJoin(ladders, eq(ladders.id, promotions.ladderId))
      .leftJoin(toRung, eq(toRung.id, promotions.toRungId))
      .where(
        and(
          inTeam,
          inArray(promotions.athleteId, ids),
          inArray(promotions.status, ["auto", "approved"]),
          eq(promotions.direction, "up"),
          between(promotions.effectiveOn, week.start, week.end),
        ),
      )
      .orderBy(asc(promotions.effectiveOn), asc(ladders.name)),
    q
      .select({ athleteId: promotions.athleteId, ladderName: ladders.name, rungName: toRung.name, direction: promotions.direction })
      .from(promotions)
      .innerJoin(ladders, eq(ladders.id, promotions.ladderId))
      .leftJoin(toRung, eq(toRung.id, promotions.toRungId))
      .where(and(inTeam, inArray(promotions.athleteId, ids), eq(promotions.status, "pending")))
      .orderBy(asc(promotions.createdAt)),
    q
      .select({ athleteId: logEntries.athleteId, rungName: rungs.name, on: logEntries.performedOn })
      .from(logEntries)
      .innerJoin(rungs, eq(rungs.id, logEntries.rungId))
      .where(
        and(
          eq(logEntries.teamId, input.teamId),
          inArray(logEntries.athleteId, ids),
          eq(logEntries.pain, true),
          isNull(logEntries.deletedAt),
          between(logEntries.performedOn, week.start, week.end),
        ),
      )
      .orderBy(asc(logEntries.performedOn)),
    q
      .selectDistinct({ athleteId: logEntries.athleteId })
      .from(logEntries)
      .where(
        and(
          eq(logEntries.teamId, input.teamId),
          inArray(logEntries.athleteId, ids),
          isNull(logEntries.deletedAt),
          between(logEntries.performedOn, week.start, week.end),
        ),
      ),
    q
      .select({ athleteId: athletePositions.athleteId, since: max(athletePositions.since) })
      .from(athletePositions)
      .where(and(eq(athletePositions.teamId, input.teamId), inArray(athletePositions.athleteId, ids), ne(athletePositions.status, "achieved")))
      .groupBy(athletePositions.athleteId)
      .having(sql`max(${athletePositions.since}) <= ${addDays(week.end, -7 * STALL_WEEKS)}`),
  ]);

  const name = (id: string) => nameOf.get(id) ?? "An athlete";
  digest.promotions = moved.map((m) => ({ athleteName: name(m.athleteId), ladderName: m.ladderName, rungName: m.rungName, on: m.on }));
  digest.pendingApprovals = pending.map((p) => ({ athleteName: name(p.athleteId), ladderName: p.ladderName, rungName: p.rungName, direction: p.direction }));
  digest.painFlags = pain.map((p) => ({ athleteName: name(p.athleteId), rungName: p.rungName, on: p.on }));
  digest.stalled = newest.map((n) => ({ athleteName: name(n.athleteId), since: n.since ?? week.start }));
  const trainedIds = new Set(trained.map((t) => t.athleteId));
  digest.noSessions = scope.athletes.filter((a) => !trainedIds.has(a.id)).map((a) => ({ athleteName: a.name }));
  return digest;
}
