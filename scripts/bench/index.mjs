#!/usr/bin/env node
// `npm run bench`: benchmarks against a production build on loopback, in one run. Starts its own
// PostgreSQL cluster and `next start`, seeds its own data, prints a table per bench and writes
// scripts/bench/results/<bench>-<time>.json. Options: --only=log,promotion, --seconds=20, --skip-build.
// BENCH_PGSS=1 also prints the statements PostgreSQL spent the most time on (pg_stat_statements).
// Later issues add a file per bench and one line to BENCHES.
import { spawnSync } from "node:child_process";
import fs from "node:fs";
import path from "node:path";
import { fileURLToPath } from "node:url";
import { build, freePort, migrate, secret, shutdown, startApp, startPostgres } from "./environment.mjs";
import { logBench } from "./log-bench.mjs";
import { promotionBench } from "./promotion-bench.mjs";
import { printStatementStats } from "./statement-stats.mjs";
import { printTable } from "./stats.mjs";

const BENCHES = { log: logBench, promotion: promotionBench };
/** Benches that run as their own process against this run's database (they print their own tables). */
const STANDALONE = {
  engine: ["tsx", ["scripts/bench/engine.ts"]],
  readiness: ["node", ["scripts/bench/readiness.mjs"]],
  digest: ["node", ["scripts/bench/digest.mjs"]],
};

const root = path.resolve(path.dirname(fileURLToPath(import.meta.url)), "../..");
const args = Object.fromEntries(process.argv.slice(2).map((a) => a.replace(/^--/, "").split("=")).map(([k, v]) => [k, v ?? "true"]));
const seconds = Number(args.seconds ?? 20);
const only = args.only ? args.only.split(",") : [...Object.keys(BENCHES), ...Object.keys(STANDALONE)];
const DIST_DIR = ".next-bench";

async function main() {
  const pgInfo = await startPostgres();
  const port = await freePort();
  const env = {
    ...process.env,
    NODE_ENV: "production",
    NEXT_TELEMETRY_DISABLED: "1",
    NEXT_DIST_DIR: DIST_DIR,
    DATABASE_URL: pgInfo.url,
    AUTH_SECRET: secret(),
    AUTH_TRUST_HOST: "true",
    APP_URL: `http://127.0.0.1:${port}`,
    PASSWORD_HASH_COST: "4",
  };
  console.log(`[bench] PostgreSQL on ${pgInfo.port}; migrating`);
  await migrate(root, env);
  if (args["skip-build"] !== "true" || !fs.existsSync(path.join(root, DIST_DIR, "BUILD_ID"))) {
    console.log(`[bench] next build (distDir ${DIST_DIR})`);
    await build(root, env);
  }
  const baseUrl = await startApp(root, env, port);
  console.log(`[bench] app on ${baseUrl}`);
  fs.mkdirSync(path.join(root, "scripts/bench/results"), { recursive: true });
  for (const name of only.filter((n) => STANDALONE[n])) {
    const [command, commandArgs] = STANDALONE[name];
    console.log(`\n[bench] ${name}`);
    const bin = command === "tsx" ? path.join(root, "node_modules/.bin/tsx") : process.execPath;
    const result = spawnSync(bin, commandArgs, { cwd: root, env: { ...env, DATABASE_URL: pgInfo.url }, stdio: "inherit" });
    if (result.status !== 0) console.error(`[bench] ${name} exited with ${result.status}`);
  }
  for (const name of only.filter((n) => !STANDALONE[n])) {
    const bench = BENCHES[name];
    if (!bench) throw new Error(`unknown bench "${name}" (have: ${Object.keys(BENCHES).join(", ")})`);
    console.log(`\n[bench] ${name} (${seconds} s per run)`);
    const result = await bench({ baseUrl, dbUrl: pgInfo.url, seconds });
    printTable(result.table);
    console.log(JSON.stringify(result.summary, null, 2));
    const file = path.join(root, "scripts/bench/results", `${name}-${new Date().toISOString().replace(/[:.]/g, "-")}.json`);
    fs.writeFileSync(file, JSON.stringify({ ...result, at: new Date().toISOString(), seconds, cpus: (await import("node:os")).cpus().length }, null, 2));
    console.log(`[bench] results: ${path.relative(root, file)}`);
  }
  if (process.env.BENCH_PGSS) await printStatementStats(pgInfo.url);
}

main()
  .catch((error) => {
    console.error(error);
    process.exitCode = 1;
  })
  .finally(shutdown);
