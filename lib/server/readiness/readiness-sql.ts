import "server-only";
import { sql, type SQL } from "drizzle-orm";
import type { ReadinessQuery, ReadinessSort } from "@/lib/validation/readiness";
import type { ReviewWeek } from "./readiness-week";
import { stalledBefore } from "./readiness-week";

/** The keyset position of the last row of a page: its sort key, then name and id as tie-breakers. */
export interface ReadinessCursor {
  s: ReadinessSort;
  k: string | number;
  n: string;
  id: string;
}

interface SortSpec {
  /** Aggregate over the athlete's positions (never null, so keyset comparison stays simple). */
  key: SQL;
  descending: boolean;
}

/**
 * readiness: lowest readiness first; -readiness: best readiness first; lastSession: longest ago first.
 * Athletes without positions get a key that sorts them last (readiness) or first (never logged).
 */
function sortSpec(sort: ReadinessSort): SortSpec {
  switch (sort) {
    case "name":
    case "-name":
      return { key: sql`a.name`, descending: sort === "-name" };
    case "readiness":
      return { key: sql`coalesce(min(p.readiness), 101)`, descending: false };
    case "-readiness":
      return { key: sql`coalesce(max(p.readiness), -1)`, descending: true };
    case "lastSession":
      return { key: sql`coalesce(max(p.last_session_on), '0001-01-01'::date)`, descending: false };
    case "-lastSession":
      return { key: sql`coalesce(max(p.last_session_on), '0001-01-01'::date)`, descending: true };
  }
}

function cursorCondition(sort: ReadinessSort, after: ReadinessCursor | undefined): SQL {
  if (!after) return sql`true`;
  if (sort === "name") return sql`(k, name, id) > (${after.n}, ${after.n}, ${after.id}::uuid)`;
  if (sort === "-name") return sql`(k, name, id) < (${after.n}, ${after.n}, ${after.id}::uuid)`;
  const key = sort.endsWith("lastSession") ? sql`${String(after.k)}::date` : sql`${Number(after.k)}::int`;
  if (sort.startsWith("-")) return sql`(k < ${key} or (k = ${key} and (name, id) > (${after.n}, ${after.id}::uuid)))`;
  return sql`(k, name, id) > (${key}, ${after.n}, ${after.id}::uuid)`;
}

function orderBy(sort: ReadinessSort): SQL {
  if (sort === "-name") return sql`name desc, id desc`;
  return sortSpec(sort).descending ? sql`k desc, name asc, id asc` : sql`k asc, name asc, id asc`;
}

/** Athlete-level status filter: an EXISTS over their positions or this week's log entries. */
function statusCondition(query: ReadinessQuery, week: ReviewWeek, teamId: string): SQL {
  const onLadder = (alias: string) => (query.ladder ? sql`and ${sql.raw(alias)}.ladder_id = ${query.ladder}::uuid` : sql``);
  const weekEntries = sql`e.team_id = ${teamId}::uuid and e.athlete_id = a.id and e.deleted_at is null
    and e.performed_on between ${week.start}::date and ${week.end}::date ${onLadder("e")}`;
  switch (query.status) {
    case undefined:
      return sql`true`;
    case "ready":
      return sql`exists (select 1 from athlete_positions sp where sp.team_id = ${teamId}::uuid and sp.athlete_id = a.id
        and sp.status in ('met', 'pending_approval') ${onLadder("sp")})`;
    case "stalled":
      return sql`exists (select 1 from athlete_positions sp where sp.team_id = ${teamId}::uuid and sp.athlete_id = a.id
        and sp.status <> 'achieved' and sp.since < ${stalledBefore(week.asOf, query.stalledWeeks)}::date ${onLadder("sp")})`;
    case "pain":
      return sql`exists (select 1 from log_entries e where ${weekEntries} and e.pain)`;
    case "none":
      return sql`not exists (select 1 from log_entries e where ${weekEntries})`;
  }
}

/**
 * The whole table page in one statement: the filtered, sorted athletes (aggregates over the stored
 * position figures), then per athlete a lateral JSON array of their cells with this week's sessions,
 * pain, pending proposal and moves up. `limit` null returns every matching athlete (CSV export).
 */
export function readinessStatement(options: {
  teamId: string;
  userId: string;
  query: ReadinessQuery;
  week: ReviewWeek;
  after: ReadinessCursor | undefined;
  limit: number | null;
}): SQL {
  const { teamId, userId, query, week, after, limit } = options;
  const spec = sortSpec(query.sort);
  const ladderJoin = query.ladder ? sql`and p.ladder_id = ${query.ladder}::uuid` : sql``;
  const filters: SQL[] = [sql`a.team_id = ${teamId}::uuid`, sql`a.archived_at is null`, statusCondition(query, week, teamId)];
  if (query.mine) filters.push(sql`a.primary_coach_id = ${userId}::uuid`);
  if (query.squad) {
    filters.push(sql`exists (select 1 from squad_members sm where sm.team_id = ${teamId}::uuid
      and sm.squad_id = ${query.squad}::uuid and sm.athlete_id = a.id)`);
  }
  if (query.ladder) {
    filters.push(sql`exists (select 1 from athlete_positions lp where lp.team_id = ${teamId}::uuid
      and lp.athlete_id = a.id and lp.ladder_id = ${query.ladder}::uuid)`);
  }
  const limitClause = limit === null ? sql`` : sql`limit ${limit}`;
  return sql`
    with scope as (
      select a.id, a.name, ${spec.key} as k
      from athletes a
      left join athlete_positions p on p.athlete_id = a.id and p.team_id = ${teamId}::uuid ${ladderJoin}
      where ${sql.join(filters, sql` and `)}
      group by a.id, a.name
    ), page as (
      select id, name, k from scope where ${cursorCondition(query.sort, after)} order by ${orderBy(query.sort)} ${limitClause}
    )
    select page.id, page.name, page.k::text as k_text, cells.ladders
    from page
    left join lateral (
      select coalesce(json_agg(json_build_object(
        'ladderId', p.ladder_id, 'ladderName', l.name, 'rungId', p.rung_id, 'rungName', r.name,
        'readiness', p.readiness, 'status', p.status,
        'sessionsThisWeek', coalesce(w.sessions, 0),
        'daysOnRung', greatest(0, ${week.asOf}::date - p.since),
        'pain', coalesce(w.pain, false),
        'pendingPromotionId', pend.id,
        'promotionsThisWeek', coalesce(moved.n, 0)
      ) order by l.name, l.id), '[]'::json) as ladders
      from athlete_positions p
      join ladders l on l.id = p.ladder_id
      join rungs r on r.id = p.rung_id
      left join lateral (
        select count(distinct e.performed_on)::int as sessions, bool_or(e.pain) as pain
        from log_entries e
        where e.athlete_id = p.athlete_id and e.ladder_id = p.ladder_id and e.team_id = ${teamId}::uuid
          and e.performed_on between ${week.start}::date and ${week.end}::date and e.deleted_at is null
      ) w on true
      left join lateral (
        select pr.id from promotions pr where pr.position_id = p.id and pr.status = 'pending' limit 1
      ) pend on true
      left join lateral (
        select count(*)::int as n from promotions pr
        where pr.athlete_id = p.athlete_id and pr.ladder_id = p.ladder_id and pr.team_id = ${teamId}::uuid
          and pr.direction = 'up' and pr.status in ('auto', 'approved')
          and pr.effective_on between ${week.start}::date and ${week.end}::date
      ) moved on true
      where p.athlete_id = page.id and p.team_id = ${teamId}::uuid ${ladderJoin}
    ) cells on true
    order by ${orderBy(query.sort)}`;
}
