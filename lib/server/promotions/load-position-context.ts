import "server-only";
import { and, eq, sql } from "drizzle-orm";
import type { Db, Queryable } from "@/db/client";
import { preparedVariants } from "@/db/prepared";
import { athletePositions, athletes, ladders, rungs, standards, teams } from "@/db/schema";
import { addDays, defaultStandard, lookbackSessions, MEASURES, type Measure, type PrerequisiteState, type PromotionMode, type Session, type Standard } from "@/lib/engine";
import { standardOf } from "./standard-of";
import { standardColumns } from "@/lib/server/ladders/standard-columns";
import { keyOpen, type KeyPlaceholders } from "@/lib/server/http/idempotency";

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
  /** The proposal waiting for a coach on this position, if any (at most one). */
  pending: { id: string; direction: "up" | "down" } | null;
  /**
   * The live entries on the current rung since the athlete reached it, oldest first and not yet
   * merged into sessions (judgePosition merges them and drops dates after its "today"): those of
   * the most recent dates the engine can look at, or every one with `history: "all"`.
   */
  entries: Session[];
  /** The latest dates with pain on the rung (a few, newest first), however old: see judgePosition. */
  painDates: string[];
}

/**
 * How many dates can lie after a team's today yet not after the horizon (the UTC date of the
 * instant plus one): local dates run from the UTC date minus one to plus one, so at most two.
 */
export const PAST_TODAY = 2;

/**
 * The dates read for a verdict on a rung: the sessions its standard looks back over (the engine's
 * lookbackSessions), plus the dates past today.
 */
export function recentDatesOf(standard: Standard): number {
  return lookbackSessions(standard) + PAST_TODAY;
}

/** The last date whose entries a verdict as of `asOf` may read: the UTC date of the instant plus one. */
export function horizonOf(asOf: Date): string {
  return addDays(asOf.toISOString().slice(0, 10), 1);
}

/** The nearest live rung above the position's rung (archived rungs sit at ≤ 0). */
const nextRung = sql<RungRef | null>`(
  select json_build_object('id', r.id, 'name', r.name, 'position', r.position) from ${rungs} r
  where r.ladder_id = ${athletePositions.ladderId} and r.archived_at is null and r.position > ${rungs.position}
  order by r.position limit 1)`;

/** The nearest live rung below it: the target of a step down. */
const previousRung = sql<RungRef | null>`(
  select json_build_object('id', r.id, 'name', r.name, 'position', r.position) from ${rungs} r
  where r.ladder_id = ${athletePositions.ladderId} and r.archived_at is null and r.position < ${rungs.position} and r.position > 0
  order by r.position desc limit 1)`;

/**
 * The next rung's prerequisites. One is reached when the athlete stands on that rung or a later one
 * of its ladder, or has achieved that ladder's skill.
 */
const prerequisites = sql<PrerequisiteState[]>`(
  select coalesce(json_agg(json_build_object(
    'rungId', req.id, 'rungName', req.name, 'ladderName', l.name,
    'reached', coalesce(ap.achieved_at is not null or st.position >= req.position, false)
  ) order by l.name, req.position), '[]'::json)
  from rung_prerequisites rp
  join ${rungs} req on req.id = rp.requires_rung_id
  join ${ladders} l on l.id = req.ladder_id
  left join ${athletePositions} ap on ap.athlete_id = ${athletePositions.athleteId} and ap.ladder_id = req.ladder_id
  left join ${rungs} st on st.id = ap.rung_id
  where rp.rung_id = (
    select r.id from ${rungs} r
    where r.ladder_id = ${athletePositions.ladderId} and r.archived_at is null and r.position > ${rungs.position}
    order by r.position limit 1))`;

/**
 * recentDatesOf for the row's rung, in SQL: from its standard row (a null step-down rule is
 * switched off), or its measure's default standard when it has none. Pinned against the engine's
 * numbers by the context tests (tests/integration/logs-context-after-insert.test.ts).
 */
const defaultLookback = sql.join(
  [sql`case ${rungs.measure}`, ...MEASURES.map((m) => sql.raw(`when '${m}' then ${lookbackSessions(defaultStandard(m))}`)), sql`end`],
  sql` `,
);
const recentDates = sql`(case when ${standards.rungId} is null then ${defaultLookback}
  else greatest(1, ${standards.sessionsWindow}, coalesce((${standards.stepDown} ->> 'painWindow')::int, 0),
    coalesce((${standards.stepDown} ->> 'dropSessions')::int, 0)) end + ${sql.raw(String(PAST_TODAY))})`;

/**
 * The earliest date of the recent entries: the oldest of the last recentDates dates with entries
 * up to `horizon`, or the position's date when there are fewer. An entry is live while its own
 * `deleted_at` is null: deleting a log stamps its entries too (deleteLog), so no join to logs is
 * needed here.
 */
const recentFrom = sql`greatest(${athletePositions.since}, (
  select min(d.performed_on) from (
    select distinct e.performed_on from log_entries e
    where e.athlete_id = ${athletePositions.athleteId} and e.rung_id = ${athletePositions.rungId}
      and e.deleted_at is null and e.performed_on >= ${athletePositions.since}
      and e.performed_on <= ${sql.placeholder("horizon")}::date
    order by e.performed_on desc
    limit ${recentDates}) d))`;

type History = NonNullable<ContextOptions["history"]>;

/** The entries on the current rung, as the engine reads them: the recent ones, or all since the position's date. */
const rungEntries = (history: History) => sql<Session[]>`(
  select coalesce(json_agg(json_build_object('date', e.performed_on, 'sets', e.sets, 'pain', e.pain)
    order by e.performed_on, e.created_at), '[]'::json)
  from log_entries e
  where e.athlete_id = ${athletePositions.athleteId} and e.rung_id = ${athletePositions.rungId}
    and e.performed_on >= ${history === "all" ? athletePositions.since : recentFrom} and e.deleted_at is null)`;

/**
 * The latest dates with pain on the current rung since the position's date, up to `horizon`,
 * newest first: the first on or before the team's today is the last pain, however long ago.
 */
const painDates = sql<string[]>`(
  select coalesce(json_agg(p.performed_on order by p.performed_on desc), '[]'::json) from (
    select distinct e.performed_on from log_entries e
    where e.athlete_id = ${athletePositions.athleteId} and e.rung_id = ${athletePositions.rungId}
      and e.pain and e.deleted_at is null and e.performed_on >= ${athletePositions.since}
      and e.performed_on <= ${sql.placeholder("horizon")}::date
    order by e.performed_on desc
    limit ${PAST_TODAY + 1}) p)`;

const pendingProposal = sql<PositionContext["pending"]>`(
  select json_build_object('id', p.id, 'direction', p.direction) from promotions p
  where p.position_id = ${athletePositions.id} and p.status = 'pending' limit 1)`;

/**
 * Which positions a statement reads: one of the team when a person asks, one of any team for the
 * system (daily job, seed), or, for a log's first trip, the athlete's positions standing on one of
 * the logged rungs, read only while the request may write under its Idempotency-Key (see keyOpen).
 */
type Scope = "team" | "system" | "logged";

const positionScope = (scope: Scope) =>
  scope === "logged"
    ? and(
        eq(athletePositions.teamId, sql.placeholder("teamId")),
        eq(athletePositions.athleteId, sql.placeholder("athleteId")),
        sql`${athletePositions.rungId} = any(${sql.placeholder("rungIds")}::uuid[])`,
        keyOpen,
      )
    : and(eq(athletePositions.id, sql.placeholder("positionId")), scope === "team" ? eq(athletePositions.teamId, sql.placeholder("teamId")) : undefined);

const lockPosition = preparedVariants((database: Db, scope: Exclude<Scope, "logged">) =>
  database.select({ id: athletePositions.id }).from(athletePositions).where(positionScope(scope)).for("update").prepare(`lock_position_${scope}`),
);

/** One statement per scope and history, each built once (variant "team:recent", "system:all", …). */
const contextOf = preparedVariants((database: Db, variant: `${Scope}:${History}`) => {
  const [scope, history] = variant.split(":") as [Scope, History];
  return database
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
      standard: standardColumns,
      timeZone: teams.timeZone,
      nextRung,
      previousRung,
      prerequisites,
      pending: pendingProposal,
      entries: rungEntries(history),
      painDates,
    })
    .from(athletePositions)
    .innerJoin(athletes, eq(athletes.id, athletePositions.athleteId))
    .innerJoin(ladders, eq(ladders.id, athletePositions.ladderId))
    .innerJoin(rungs, eq(rungs.id, athletePositions.rungId))
    .innerJoin(teams, eq(teams.id, athletePositions.teamId))
    .leftJoin(standards, eq(standards.rungId, rungs.id))
    .where(positionScope(scope))
    .prepare(`position_context_${scope}_${history}`);
});

export interface ContextOptions {
  positionId: string;
  /** Scopes the read to a team (a caller acting for one); the system (daily job, seed) passes none. */
  teamId?: string;
  /** Lock the position row FOR UPDATE first. */
  lock?: boolean;
  /** The instant the verdict is for (default now): entries after the team's date of it never count. */
  asOf?: Date;
  /** "recent" (default): the entries a verdict can use; "all": the rung's whole history (trends). */
  history?: "recent" | "all";
}

/**
 * Reads one position with its ladder, rung, standard, neighbours, prerequisites, pending proposal
 * and the entries on its rung in one named statement, built once (the logging path runs it on every
 * log). For a verdict it reads the entries of the most recent dates the standard can look at, so a
 * log costs the same after years on a rung as on the first day. With `lock`, the position row is
 * locked FOR UPDATE first, in its own statement, so this read (a fresh snapshot) sees every move
 * committed before the lock was granted; without, it submits synchronously, so it can travel in a
 * oneTrip.
 */
export async function loadPositionContext(q: Queryable, options: ContextOptions): Promise<PositionContext | null> {
  const scope = options.teamId ? "team" : "system";
  const values = { positionId: options.positionId, teamId: options.teamId };
  if (options.lock) {
    const [locked] = await lockPosition(q, scope).execute(values);
    if (!locked) return null;
  }
  const [row] = await contextOf(q, `${scope}:${options.history ?? "recent"}`).execute({ ...values, horizon: horizonOf(options.asOf ?? new Date()) });
  return row ? contextOfRow(row) : null;
}

/**
 * The contexts (for a verdict as of `asOf`) of an athlete's positions whose current rung is one of
 * `rungIds`, by position id, in one statement that submits synchronously. A log sends it in its
 * first trip right after the statement that locks those positions, so it reads them as the lock
 * holds them; while another request holds the key, or for a replay, it reads nothing.
 */
export async function loadLoggedContexts(
  q: Queryable,
  input: { teamId: string; athleteId: string; rungIds: readonly string[]; asOf: Date; key: KeyPlaceholders },
): Promise<Map<string, PositionContext>> {
  const rows = await contextOf(q, "logged:recent").execute({
    teamId: input.teamId,
    athleteId: input.athleteId,
    rungIds: [...new Set(input.rungIds)],
    horizon: horizonOf(input.asOf),
    ...input.key,
  });
  return new Map(rows.map((row) => [row.position.id, contextOfRow(row)]));
}

type ContextRow = Awaited<ReturnType<ReturnType<typeof contextOf>["execute"]>>[number];

function contextOfRow(row: ContextRow): PositionContext {
  const hasStandard = row.standard !== null && row.standard.sets !== null;
  return {
    position: row.position,
    ladder: row.ladder,
    rung: row.rung,
    standard: standardOf(row.rung.measure, hasStandard ? row.standard : null),
    timeZone: row.timeZone,
    nextRung: row.nextRung,
    previousRung: row.previousRung,
    prerequisites: row.nextRung ? row.prerequisites : [],
    pending: row.pending,
    entries: row.entries,
    painDates: row.painDates,
  };
}
