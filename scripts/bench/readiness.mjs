#!/usr/bin/env node
// Benchmark of the coach's weekly readiness table: seeds 200 athletes × 8 ladders × one year of logs
// (bulk generate_series SQL), then times the first page sorted by readiness and a full-team CSV
// export, prints the query plans (EXPLAIN ANALYZE) and the ratio to a plain count(*) of the same
// log rows in the same run.
//
// Runs alone: `node scripts/bench/readiness.mjs` with BENCH_PG_ADMIN_URL (a superuser URL; a fresh
// database is created) or DATABASE_URL (an existing, migrated database; rows go to a new team).
// It re-runs itself under tsx so it can call the TypeScript server operations in-process (the HTTP
// layer and sign-in are left out: they cost the same for every route).
import { spawnSync } from "node:child_process";
import fs from "node:fs";
import path from "node:path";
import { fileURLToPath } from "node:url";

const ROOT = path.resolve(path.dirname(fileURLToPath(import.meta.url)), "../..");
const ATHLETES = Number(process.env.BENCH_ATHLETES ?? 200);
const LADDERS = 8;
const RUNGS = 6;
const ITERATIONS = Number(process.env.BENCH_ITERATIONS ?? 40);
const CSV_ITERATIONS = Number(process.env.BENCH_CSV_ITERATIONS ?? 5);
const GOAL_P95_MS = 200;

if (!process.env.RUNGWISE_BENCH_UNDER_TSX) {
  const tsx = path.join(ROOT, "node_modules/.bin/tsx");
  const result = spawnSync(tsx, ["--conditions=react-server", fileURLToPath(import.meta.url), ...process.argv.slice(2)], {
    stdio: "inherit",
    env: { ...process.env, RUNGWISE_BENCH_UNDER_TSX: "1" },
  });
  process.exit(result.status ?? 1);
}

const pg = (await import("pg")).default;

function withDatabase(url, database) {
  const u = new URL(url);
  u.pathname = `/${database}`;
  return u.toString();
}

async function prepareDatabase() {
  const admin = process.env.BENCH_PG_ADMIN_URL;
  if (!admin) {
    if (!process.env.DATABASE_URL) throw new Error("Set BENCH_PG_ADMIN_URL (preferred) or DATABASE_URL.");
    return process.env.DATABASE_URL;
  }
  const database = "rungwise_bench_readiness";
  const client = new pg.Client({ connectionString: admin });
  await client.connect();
  await client.query(`DROP DATABASE IF EXISTS ${database} WITH (FORCE)`);
  await client.query(`CREATE DATABASE ${database}`);
  await client.end();
  const url = withDatabase(admin, database);
  const { drizzle } = await import("drizzle-orm/node-postgres");
  const { migrate } = await import("drizzle-orm/node-postgres/migrator");
  const migrating = new pg.Client({ connectionString: url });
  await migrating.connect();
  await migrate(drizzle(migrating), { migrationsFolder: path.join(ROOT, "drizzle") });
  await migrating.end();
  return url;
}

/** One team with ladders, rungs, standards, athletes, positions, a year of logs and entries, squads, proposals. */
const SEED_SQL = [
  `insert into teams (id, name, time_zone) values ($1::uuid, 'Bench club', 'Europe/Amsterdam')`,
  `insert into users (id, team_id, email, name, role, password_hash)
     values ($2::uuid, $1, 'bench-' || $2::text || '@example.test', 'Bench Owner', 'owner', 'not-a-login')`,
  `insert into ladders (team_id, name, target_skill) select $1, 'Ladder ' || l, 'Skill ' || l from generate_series(1, ${LADDERS}) l`,
  `insert into rungs (team_id, ladder_id, position, name, measure)
     select $1, l.id, r, l.name || ' rung ' || r, 'hold_seconds' from ladders l, generate_series(1, ${RUNGS}) r where l.team_id = $1`,
  `insert into standards (rung_id, team_id, sets, min_value, max_rpe, sessions_required, sessions_window, min_days_on_rung)
     select id, $1, 3, 20, 7, 2, 3, 7 from rungs where team_id = $1`,
  `insert into athletes (team_id, name, primary_coach_id)
     select $1, 'Athlete ' || lpad(i::text, 4, '0'), case when i % 2 = 0 then $2::uuid end from generate_series(1, ${ATHLETES}) i`,
  `insert into athlete_positions (team_id, athlete_id, ladder_id, rung_id, since, readiness, status, last_session_on)
     select $1, a.id, l.id,
       (select r.id from rungs r where r.ladder_id = l.id and r.position = 1 + abs(hashtext(a.id::text || l.id::text)) % ${RUNGS}),
       $3::date - abs(hashtext(l.id::text || a.id::text)) % 120,
       abs(hashtext(a.name || l.name)) % 101,
       (array['not_yet','not_yet','not_yet','met','pending_approval','blocked'])[1 + abs(hashtext(a.name || l.name || 's')) % 6]::position_status,
       $3::date - abs(hashtext(a.name)) % 10
     from athletes a cross join ladders l where a.team_id = $1 and l.team_id = $1`,
  // About three sessions a week per athlete for a year.
  `insert into logs (team_id, athlete_id, performed_on, duration_minutes, session_rpe)
     select $1, a.id, d::date, 45 + abs(hashtext(a.id::text || d::text)) % 30, 5 + abs(hashtext(d::text || a.id::text)) % 4
     from athletes a cross join generate_series($3::date - 364, $3::date, interval '1 day') d
     where a.team_id = $1 and (extract(doy from d)::int + abs(hashtext(a.id::text)) % 7) % 7 in (0, 2, 4)`,
  // One entry per ladder the athlete is on, in every log; one in fifty flags pain.
  `insert into log_entries (team_id, log_id, athlete_id, ladder_id, rung_id, performed_on, sets, best_value, pain)
     select $1, g.id, g.athlete_id, p.ladder_id, p.rung_id, g.performed_on,
       '[{"value":15},{"value":14},{"value":12}]'::jsonb, 10 + abs(hashtext(g.id::text || p.ladder_id::text)) % 15,
       abs(hashtext(p.ladder_id::text || g.id::text)) % 50 = 0
     from logs g join athlete_positions p on p.athlete_id = g.athlete_id where g.team_id = $1`,
  `insert into promotions (team_id, athlete_id, ladder_id, position_id, from_rung_id, to_rung_id, status, verdict, effective_on)
     select team_id, athlete_id, ladder_id, id, rung_id, rung_id, 'pending', '{}'::jsonb, $3::date - 1
     from athlete_positions where team_id = $1 and status = 'pending_approval'`,
  `insert into squads (team_id, name) select $1, 'Squad ' || s from generate_series(1, 4) s`,
  `insert into squad_members (team_id, squad_id, athlete_id)
     select $1, s.id, a.id from athletes a join squads s on s.team_id = a.team_id
     where a.team_id = $1 and abs(hashtext(a.id::text || s.id::text)) % 3 = 0`,
];

function percentile(sorted, p) {
  return sorted[Math.min(sorted.length - 1, Math.ceil((p / 100) * sorted.length) - 1)];
}

async function time(fn) {
  const start = process.hrtime.bigint();
  const result = await fn();
  return { ms: Number(process.hrtime.bigint() - start) / 1e6, result };
}

function summary(samples) {
  const sorted = [...samples].sort((a, b) => a - b);
  return { n: sorted.length, p50: percentile(sorted, 50), p95: percentile(sorted, 95), max: sorted.at(-1) };
}

async function main() {
  const url = await prepareDatabase();
  process.env.DATABASE_URL = url;
  const { randomUUID } = await import("node:crypto");
  const { getPool, closeDb } = await import(path.join(ROOT, "db/client.ts"));
  const { listReadiness } = await import(path.join(ROOT, "lib/server/readiness/list-readiness.ts"));
  const { exportReadiness } = await import(path.join(ROOT, "lib/server/readiness/export-readiness.ts"));
  const { readinessStatement } = await import(path.join(ROOT, "lib/server/readiness/readiness-sql.ts"));
  const { reviewWeek } = await import(path.join(ROOT, "lib/server/readiness/readiness-week.ts"));
  const { ZReadinessQuery } = await import(path.join(ROOT, "lib/validation/readiness.ts"));
  const { localDateOf } = await import(path.join(ROOT, "lib/engine/local-date.ts"));
  const { PgDialect } = await import("drizzle-orm/pg-core");

  const pool = getPool();
  const teamId = randomUUID();
  const ownerId = randomUUID();
  const timeZone = "Europe/Amsterdam";
  const today = localDateOf(new Date(), timeZone);
  const seeded = await time(async () => {
    for (const template of SEED_SQL) {
      // The date is ours (YYYY-MM-DD), safe to inline; ids stay parameters.
      const statement = template.replaceAll("$3::date", `'${today}'::date`);
      const wanted = [teamId, ownerId, today].slice(0, Math.max(...[...statement.matchAll(/\$(\d)/g)].map((m) => Number(m[1])), 1));
      await pool.query(statement, wanted).catch((error) => {
        throw new Error(`seed statement failed: ${statement.slice(0, 80)}…: ${error.message}`);
      });
    }
    await pool.query("analyze");
  });
  const counts = (
    await pool.query(
      `select (select count(*) from athletes where team_id = $1) as athletes,
              (select count(*) from athlete_positions where team_id = $1) as positions,
              (select count(*) from logs where team_id = $1) as logs,
              (select count(*) from log_entries where team_id = $1) as entries`,
      [teamId],
    )
  ).rows[0];
  console.log(`seeded in ${(seeded.ms / 1000).toFixed(1)} s:`, counts);

  const actor = { userId: ownerId, teamId, role: "owner", athleteId: null, name: "Bench Owner", email: "bench@example.test", timeZone };
  const pageQuery = ZReadinessQuery.parse({ sort: "-readiness", limit: "50" });
  const csvQuery = ZReadinessQuery.parse({ format: "csv" });

  // Warm-up, then the measured runs.
  for (let i = 0; i < 3; i += 1) await listReadiness(actor, pageQuery);
  const pageTimes = [];
  let firstPage;
  for (let i = 0; i < ITERATIONS; i += 1) {
    const { ms, result } = await time(() => listReadiness(actor, pageQuery));
    pageTimes.push(ms);
    firstPage = result;
  }
  const csvTimes = [];
  let csvBytes = 0;
  for (let i = 0; i < CSV_ITERATIONS; i += 1) {
    const { ms, result } = await time(async () => (await exportReadiness(actor, csvQuery)).text());
    csvTimes.push(ms);
    csvBytes = result.length;
  }
  const countTimes = [];
  for (let i = 0; i < ITERATIONS; i += 1) {
    const { ms } = await time(() => pool.query("select count(*) from log_entries where team_id = $1", [teamId]));
    countTimes.push(ms);
  }

  const dialect = new PgDialect();
  const week = reviewWeek(undefined, timeZone);
  async function plan(label, query, limit) {
    const compiled = dialect.sqlToQuery(readinessStatement({ teamId, userId: ownerId, query, week, after: undefined, limit }));
    const rows = (await pool.query(`explain (analyze, buffers) ${compiled.sql}`, compiled.params)).rows;
    const text = rows.map((r) => r["QUERY PLAN"]).join("\n");
    const indexes = [...new Set([...text.matchAll(/using (\w+)/gi)].map((m) => m[1]))];
    console.log(`\n--- EXPLAIN ANALYZE: ${label} ---\n${text}`);
    return { label, indexes };
  }
  const plans = [
    await plan("first page, sort -readiness, limit 50", pageQuery, 51),
    await plan("full-team export", csvQuery, null),
    await plan("first page, status=pain", ZReadinessQuery.parse({ status: "pain" }), 51),
  ];

  const page = summary(pageTimes);
  const csv = summary(csvTimes);
  const count = summary(countTimes);
  const report = {
    rows: counts,
    firstPage: { ...page, items: firstPage.items.length, goalP95Ms: GOAL_P95_MS, met: page.p95 < GOAL_P95_MS },
    csvExport: { ...csv, bytes: csvBytes },
    plainCount: count,
    ratioToCount: { firstPage: page.p50 / count.p50, csvExport: csv.p50 / count.p50 },
    indexesUsed: plans,
  };
  console.log("\n--- readiness benchmark ---");
  console.log(`first page (sort -readiness, 50 rows): p50 ${page.p50.toFixed(1)} ms, p95 ${page.p95.toFixed(1)} ms (goal < ${GOAL_P95_MS} ms: ${report.firstPage.met ? "met" : "NOT met"})`);
  console.log(`full-team CSV (${csvBytes} bytes): p50 ${csv.p50.toFixed(1)} ms, p95 ${csv.p95.toFixed(1)} ms`);
  console.log(`plain count(*) of the team's ${counts.entries} log entries: p50 ${count.p50.toFixed(2)} ms`);
  console.log(`ratio to count(*): first page ×${report.ratioToCount.firstPage.toFixed(2)}, CSV ×${report.ratioToCount.csvExport.toFixed(2)}`);
  const out = path.join(ROOT, "scripts/bench/results");
  fs.mkdirSync(out, { recursive: true });
  fs.writeFileSync(path.join(out, "readiness.json"), `${JSON.stringify(report, null, 2)}\n`);
  await closeDb();
  if (!report.firstPage.met) process.exitCode = 1;
}

main().catch((error) => {
  console.error(error);
  process.exit(1);
});
