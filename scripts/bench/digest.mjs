#!/usr/bin/env node
// Benchmark of the weekly digest: 1,000 coaches × 20 athletes each (bulk generate_series SQL), one
// digest job per coach queued through the outbox, then the real worker (worker/index.ts) renders and
// sends them all into an SMTP catcher. Prints wall time until the 1,000th delivery row and the
// worker's peak RSS (VmHWM) sampled during the run, and the heap it keeps after a full GC (reported
// by the worker every 2 s): flat there means no leak. Goal: under 60 s, memory flat.
//
// Runs alone: `node scripts/bench/digest.mjs` with BENCH_PG_ADMIN_URL (a superuser URL; a fresh
// database is created and migrated) or DATABASE_URL (an existing migrated database; rows go to new
// teams, removed afterwards). SMTP_HOST/SMTP_PORT name a catcher; without them a maildev is started
// on free ports. BENCH_COACHES / BENCH_ATHLETES_PER_COACH change the size.
import { spawn } from "node:child_process";
import fs from "node:fs";
import net from "node:net";
import os from "node:os";
import path from "node:path";
import { fileURLToPath, pathToFileURL } from "node:url";
import { createRequire } from "node:module";

const ROOT = path.resolve(path.dirname(fileURLToPath(import.meta.url)), "../..");
const require = createRequire(path.join(ROOT, "package.json"));
const pg = require("pg");
const COACHES = Number(process.env.BENCH_COACHES ?? 1000);
const PER_COACH = Number(process.env.BENCH_ATHLETES_PER_COACH ?? 20);
const COACHES_PER_TEAM = 10;
const WEEK = "2026-W48";
const WEEK_START = "2026-11-23";
const GOAL_SECONDS = 60;
const children = [];

function freePort() {
  return new Promise((resolve, reject) => {
    const server = net.createServer();
    server.listen(0, "127.0.0.1", () => {
      const { port } = server.address();
      server.close(() => resolve(port));
    });
    server.on("error", reject);
  });
}

async function waitFor(check, timeoutMs, what) {
  const deadline = Date.now() + timeoutMs;
  for (;;) {
    if (await check().catch(() => false)) return;
    if (Date.now() > deadline) throw new Error(`timed out waiting for ${what}`);
    await new Promise((r) => setTimeout(r, 200));
  }
}

async function prepareDatabase() {
  const admin = process.env.BENCH_PG_ADMIN_URL;
  if (!admin) {
    if (!process.env.DATABASE_URL) throw new Error("Set BENCH_PG_ADMIN_URL (preferred) or DATABASE_URL.");
    return process.env.DATABASE_URL;
  }
  const database = "rungwise_bench_digest";
  const client = new pg.Client({ connectionString: admin });
  await client.connect();
  await client.query(`DROP DATABASE IF EXISTS ${database} WITH (FORCE)`);
  await client.query(`CREATE DATABASE ${database}`);
  await client.end();
  const url = new URL(admin);
  url.pathname = `/${database}`;
  const { drizzle } = require("drizzle-orm/node-postgres");
  const { migrate } = require("drizzle-orm/node-postgres/migrator");
  const migrating = new pg.Client({ connectionString: url.toString() });
  await migrating.connect();
  await migrate(drizzle(migrating), { migrationsFolder: path.join(ROOT, "drizzle") });
  await migrating.end();
  return url.toString();
}

async function mailCatcher() {
  if (process.env.SMTP_HOST && process.env.SMTP_PORT) return { host: process.env.SMTP_HOST, port: process.env.SMTP_PORT };
  const smtp = await freePort();
  const web = await freePort();
  const child = spawn(path.join(ROOT, "node_modules/.bin/maildev"), ["--smtp", String(smtp), "--web", String(web), "--ip", "127.0.0.1"], {
    stdio: "ignore",
  });
  children.push(child);
  await waitFor(async () => (await fetch(`http://127.0.0.1:${web}/email`)).ok, 60_000, "maildev");
  return { host: "127.0.0.1", port: String(smtp) };
}

/** Teams of 10 coaches; each coach has 20 athletes on one rung; half trained in the week, some with pain. */
async function seed(client) {
  const run = Date.now().toString(36);
  const teams = Math.ceil(COACHES / COACHES_PER_TEAM);
  await client.query("BEGIN");
  const { rows: teamRows } = await client.query(
    `INSERT INTO teams (name, time_zone) SELECT 'Bench digest ' || $1 || ' ' || g, 'Europe/Amsterdam' FROM generate_series(1, $2) g RETURNING id`,
    [run, teams],
  );
  const teamIds = teamRows.map((r) => r.id);
  await client.query(
    `INSERT INTO ladders (team_id, name, target_skill) SELECT t, 'Bench press line', 'Press' FROM unnest($1::uuid[]) t`,
    [teamIds],
  );
  await client.query(
    `INSERT INTO rungs (team_id, ladder_id, position, name, measure, cues, caution)
     SELECT l.team_id, l.id, p, 'Bench rung ' || p, 'hold_seconds', 'Stack the shoulders', 'Use a wall'
       FROM ladders l, generate_series(1, 3) p WHERE l.team_id = ANY($1::uuid[])`,
    [teamIds],
  );
  await client.query(
    `INSERT INTO users (team_id, email, name, role, password_hash)
     SELECT t.id, 'bench-' || $1 || '-' || t.n || '-' || c || '@bench.test', 'Coach ' || t.n || '-' || c, 'coach', 'x'
       FROM (SELECT id, row_number() OVER () n FROM unnest($2::uuid[]) id) t, generate_series(1, $3) c
      WHERE (t.n - 1) * $3 + c <= $4`,
    [run, teamIds, COACHES_PER_TEAM, COACHES],
  );
  // Not due by the clock during the run (Sunday 23:00), so only the queued week is sent.
  await client.query(
    `INSERT INTO notification_preferences (email, team_id, digest_weekday, digest_hour)
     SELECT email, team_id, 7, 23 FROM users WHERE team_id = ANY($1::uuid[])`,
    [teamIds],
  );
  await client.query(
    `INSERT INTO athletes (team_id, name, primary_coach_id)
     SELECT u.team_id, u.name || ' athlete ' || a, u.id FROM users u, generate_series(1, $2) a WHERE u.team_id = ANY($1::uuid[])`,
    [teamIds, PER_COACH],
  );
  await client.query(
    `INSERT INTO athlete_positions (team_id, athlete_id, ladder_id, rung_id, since)
     SELECT a.team_id, a.id, r.ladder_id, r.id, ($2::date - ((abs(hashtext(a.id::text)) % 60) || ' days')::interval)::date
       FROM athletes a JOIN rungs r ON r.team_id = a.team_id AND r.position = 1 WHERE a.team_id = ANY($1::uuid[])`,
    [teamIds, WEEK_START],
  );
  await client.query(
    `WITH trained AS (
       SELECT a.id, a.team_id, p.ladder_id, p.rung_id, abs(hashtext(a.id::text)) h FROM athletes a
       JOIN athlete_positions p ON p.athlete_id = a.id WHERE a.team_id = ANY($1::uuid[]) AND abs(hashtext(a.id::text)) % 2 = 0
     ), l AS (
       INSERT INTO logs (team_id, athlete_id, performed_on) SELECT team_id, id, $2::date + (h % 7) FROM trained RETURNING id, athlete_id, performed_on
     )
     INSERT INTO log_entries (team_id, log_id, athlete_id, ladder_id, rung_id, performed_on, sets, best_value, pain)
     SELECT t.team_id, l.id, t.id, t.ladder_id, t.rung_id, l.performed_on, '[{"value":20,"rpe":7}]', 20, t.h % 10 = 0
       FROM l JOIN trained t ON t.id = l.athlete_id`,
    [teamIds, WEEK_START],
  );
  await client.query(
    `INSERT INTO promotions (team_id, athlete_id, ladder_id, position_id, from_rung_id, to_rung_id, status, verdict, effective_on)
     SELECT p.team_id, p.athlete_id, p.ladder_id, p.id, p.rung_id, r2.id,
            CASE WHEN abs(hashtext(p.id::text)) % 2 = 0 THEN 'auto'::promotion_status ELSE 'pending'::promotion_status END,
            '{}'::jsonb, $2::date + 2
       FROM athlete_positions p JOIN rungs r2 ON r2.ladder_id = p.ladder_id AND r2.position = 2
      WHERE p.team_id = ANY($1::uuid[]) AND abs(hashtext(p.athlete_id::text)) % 5 = 0`,
    [teamIds, WEEK_START],
  );
  await client.query("COMMIT");
  return teamIds;
}

function peakRssMb(pid) {
  try {
    const status = fs.readFileSync(`/proc/${pid}/status`, "utf8");
    const kb = Number(/VmHWM:\s+(\d+)/.exec(status)?.[1] ?? 0);
    const now = Number(/VmRSS:\s+(\d+)/.exec(status)?.[1] ?? 0);
    return { peak: kb / 1024, now: now / 1024 };
  } catch {
    return null;
  }
}

/** CPU seconds (user + system) a process has used so far. */
function cpuSeconds(pid) {
  try {
    const fields = fs.readFileSync(`/proc/${pid}/stat`, "utf8").split(") ")[1].split(" ");
    return (Number(fields[11]) + Number(fields[12])) / 100; // clock ticks, 100 per second on Linux
  } catch {
    return 0;
  }
}

function serverOnlyPreload() {
  const shared = path.join(ROOT, "scripts/lib/server-only-stub.mjs");
  if (fs.existsSync(shared)) return pathToFileURL(shared).href;
  // Standalone: resolve `server-only` to its empty module (as the test and start scripts do).
  const empty = path.join(path.dirname(require.resolve("server-only")), "empty.js");
  const file = path.join(os.tmpdir(), `rungwise-server-only-${process.pid}.mjs`);
  fs.writeFileSync(
    file,
    `import { register } from "node:module";
import Module from "node:module";
const hooks = 'export async function resolve(s, c, n) { return s === "server-only" ? { url: ${JSON.stringify(pathToFileURL(empty).href)}, shortCircuit: true } : n(s, c); }';
register("data:text/javascript," + encodeURIComponent(hooks));
const original = Module._resolveFilename;
Module._resolveFilename = function (request, ...rest) { return request === "server-only" ? ${JSON.stringify(empty)} : original.call(this, request, ...rest); };
`,
  );
  return pathToFileURL(file).href;
}

async function main() {
  const databaseUrl = await prepareDatabase();
  const smtp = await mailCatcher();
  const client = new pg.Client({ connectionString: databaseUrl });
  await client.connect();
  console.log(`seeding ${COACHES} coaches × ${PER_COACH} athletes…`);
  const seedStart = Date.now();
  const teamIds = await seed(client);
  console.log(`seeded in ${((Date.now() - seedStart) / 1000).toFixed(1)} s`);

  const env = {
    ...process.env,
    DATABASE_URL: databaseUrl,
    SMTP_HOST: smtp.host,
    SMTP_PORT: smtp.port,
    AUTH_SECRET: process.env.AUTH_SECRET ?? "bench-secret-bench-secret-bench-secret-0",
    APP_URL: process.env.APP_URL ?? "http://127.0.0.1:3000",
    // The worker reports the heap it retains after a full collection: flat means no leak.
    WORKER_MEMORY_REPORT_MS: "2000",
  };
  const worker = spawn(process.execPath, ["--expose-gc", "--import", "tsx", "--import", serverOnlyPreload(), "worker/index.ts"], {
    cwd: ROOT,
    env,
    stdio: ["ignore", "pipe", "inherit"],
  });
  children.push(worker);
  let ready = false;
  let counting = false;
  const retained = [];
  worker.stdout.on("data", (chunk) => {
    const text = String(chunk);
    if (text.includes("ready")) ready = true;
    for (const match of text.matchAll(/retained-heap-mb=([\d.]+)/g)) if (counting) retained.push(Number(match[1]));
  });
  await waitFor(async () => ready, 60_000, "the worker to start");
  const idleRss = peakRssMb(worker.pid);

  const cpuBefore = cpuSeconds(worker.pid);
  const started = Date.now();
  await client.query(
    `INSERT INTO mail_outbox (job)
     SELECT jsonb_build_object('kind', 'digest', 'teamId', team_id, 'userId', id, 'week', $2::text)
       FROM users WHERE team_id = ANY($1::uuid[]) AND role = 'coach'`,
    [teamIds, WEEK],
  );
  const samples = [];
  let delivered = 0;
  counting = true;
  while (delivered < COACHES) {
    await new Promise((r) => setTimeout(r, 500));
    const { rows } = await client.query(
      "SELECT count(*)::int AS n FROM mail_deliveries WHERE kind = 'digest' AND team_id = ANY($1::uuid[])",
      [teamIds],
    );
    delivered = rows[0].n;
    const rss = peakRssMb(worker.pid);
    if (rss) samples.push(rss.now);
    if (Date.now() - started > 10 * 60_000) throw new Error(`only ${delivered} of ${COACHES} digests after 10 minutes`);
  }
  const seconds = (Date.now() - started) / 1000;
  const final = peakRssMb(worker.pid);
  const cpu = cpuSeconds(worker.pid) - cpuBefore;
  const { rows: failed } = await client.query("SELECT count(*)::int AS n FROM pgboss.job WHERE name = 'mail' AND state IN ('retry', 'failed')");
  const third = Math.max(1, Math.floor(samples.length / 3));
  const avg = (list) => list.reduce((s, v) => s + v, 0) / Math.max(1, list.length);
  console.log(`digests delivered: ${delivered} in ${seconds.toFixed(1)} s (${(delivered / seconds).toFixed(1)}/s); goal < ${GOAL_SECONDS} s: ${seconds < GOAL_SECONDS ? "met" : "NOT met"}`);
  console.log(`jobs retrying or failed: ${failed[0].n}`);
  console.log(`worker CPU: ${cpu.toFixed(1)} s (${((cpu / delivered) * 1000).toFixed(1)} ms per digest); load average ${os.loadavg()[0].toFixed(1)} on ${os.cpus().length} cores`);
  console.log(
    `worker RSS: idle ${idleRss?.now.toFixed(0)} MB, peak ${final?.peak.toFixed(0)} MB; mean first third ${avg(samples.slice(0, third)).toFixed(0)} MB, last third ${avg(samples.slice(-third)).toFixed(0)} MB`,
  );
  // RSS drifts up while V8 lets the heap grow; what a leak would show is the heap kept after a GC.
  const heapThird = Math.max(1, Math.floor(retained.length / 3));
  const [early, late] = [avg(retained.slice(0, heapThird)), avg(retained.slice(-heapThird))];
  console.log(
    `worker heap kept after a full GC (${retained.length} samples): first third ${early.toFixed(1)} MB, last third ${late.toFixed(1)} MB; flat (< 10 % growth): ${retained.length > 2 && late < early * 1.1 ? "yes" : "NO"}`,
  );

  worker.kill("SIGTERM");
  await new Promise((r) => worker.once("exit", r));
  if (!process.env.BENCH_PG_ADMIN_URL) await client.query("DELETE FROM teams WHERE id = ANY($1::uuid[])", [teamIds]);
  await client.end();
}

main()
  .catch((error) => {
    console.error(error instanceof Error ? error.message : error);
    process.exitCode = 1;
  })
  .finally(() => {
    for (const child of children) if (child.exitCode === null) child.kill("SIGTERM");
  });
