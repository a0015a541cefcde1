#!/usr/bin/env node
// `npm test`: typecheck, lint, vitest (unit + integration against a real PostgreSQL) and Playwright
// against a production build. Every stage runs even when an earlier one failed; the last line is
// "<passed> passed, <failed> failed" summed over all stages, and the exit code is 1 on any failure.
//
// It runs beside `npm start` and beside other `npm test` runs of the same checkout: each run has its
// own throwaway cluster in ./.data-test/run-<pid>, its own free ports, and builds the app into
// .next-e2e (one e2e build at a time per checkout, guarded by a lock).
//
//   npm test -- --only=unit        (or typecheck, lint, e2e; comma-separated for several)
import fs from "node:fs";
import path from "node:path";
import { fileURLToPath } from "node:url";
import { baseChildEnv, bin, buildApp, configHonoursDistDir, migrateAndSeed, startNext, startWorker } from "./lib/app.mjs";
import { ensureChromium, ensureNodeModules } from "./lib/install.mjs";
import { fail, green, header, info, notice, red } from "./lib/log.mjs";
import { freePort, waitForHttp } from "./lib/ports.mjs";
import { PgCluster } from "./lib/postgres.mjs";
import { installSignalHandlers, isStopping, onGroupsChanged, onShutdown, reapGroups, run, shutdown, stop } from "./lib/proc.mjs";
import { APP_DB, startServices } from "./lib/services.mjs";

const root = path.resolve(path.dirname(fileURLToPath(import.meta.url)), "..");
const testDataRoot = path.join(root, ".data-test");
const runDir = path.join(testDataRoot, `run-${process.pid}`);
const E2E_DIST_DIR = ".next-e2e";
const E2E_DATABASE = "rungwise_e2e";
const ALL_STAGES = ["typecheck", "lint", "unit", "e2e"];
const results = []; // { stage, passed, failed, note? }

function selectedStages() {
  const argv = process.argv.slice(2);
  const index = argv.findIndex((arg) => arg === "--only" || arg.startsWith("--only="));
  if (index === -1) return ALL_STAGES;
  const value = argv[index].includes("=") ? argv[index].split("=")[1] : argv[index + 1];
  const wanted = (value ?? "").split(",").map((s) => s.trim()).filter(Boolean);
  const unknown = wanted.filter((stage) => !ALL_STAGES.includes(stage));
  if (unknown.length || wanted.length === 0) {
    fail(`--only takes ${ALL_STAGES.join(", ")} (comma-separated); got "${value ?? ""}"`);
    process.exit(2);
  }
  return ALL_STAGES.filter((stage) => wanted.includes(stage));
}

const isLiveTestRun = (pid) => {
  try {
    return fs.readFileSync(`/proc/${pid}/cmdline`, "utf8").includes("test.mjs");
  } catch {
    return false;
  }
};

/** Remove the clusters of earlier runs that did not get to clean up (killed, machine rebooted). */
function reapStaleRuns() {
  if (!fs.existsSync(testDataRoot)) return;
  for (const entry of fs.readdirSync(testDataRoot)) {
    const match = /^run-(\d+)$/.exec(entry);
    if (!match || Number(match[1]) === process.pid || isLiveTestRun(Number(match[1]))) continue;
    const dir = path.join(testDataRoot, entry);
    let groups = [];
    try {
      groups = JSON.parse(fs.readFileSync(path.join(dir, "run.json"), "utf8")).groups ?? [];
    } catch {
      // No record: only the cluster can be cleaned up.
    }
    reapGroups(groups, root);
    new PgCluster({ link: path.join(dir, "pg"), port: 0 }).discard();
    fs.rmSync(dir, { recursive: true, force: true });
  }
}

/** One e2e build/serve per checkout at a time: .next-e2e is shared. */
async function lockE2e() {
  const lockFile = path.join(testDataRoot, "e2e.lock");
  let told = false;
  for (;;) {
    try {
      fs.writeFileSync(lockFile, String(process.pid), { flag: "wx" });
      onShutdown(
        () => fs.rmSync(lockFile, { force: true }),
        () => fs.rmSync(lockFile, { force: true }),
      );
      return () => fs.rmSync(lockFile, { force: true });
    } catch {
      const holder = Number(fs.readFileSync(lockFile, "utf8").trim() || 0);
      if (!isLiveTestRun(holder)) {
        fs.rmSync(lockFile, { force: true });
        continue;
      }
      if (!told) info(`Waiting for the e2e stage of another test run (pid ${holder}) to finish…`);
      told = true;
      await new Promise((resolve) => setTimeout(resolve, 2_000));
    }
  }
}

function readJson(file) {
  try {
    return JSON.parse(fs.readFileSync(file, "utf8"));
  } catch {
    return null;
  }
}

function vitestCounts(report, exitCode) {
  if (!report) return { passed: 0, failed: 1, note: "vitest wrote no JSON report (crashed before running tests)" };
  const passed = report.numPassedTests ?? 0;
  let failed = report.numFailedTests ?? 0;
  // A file that fails to load (or whose hooks throw) fails no individual test; count it once.
  for (const file of report.testResults ?? []) {
    if (file.status === "failed" && !(file.assertionResults ?? []).some((test) => test.status === "failed")) failed += 1;
  }
  if (exitCode !== 0 && failed === 0) return { passed, failed: 1, note: `vitest exited with code ${exitCode}` };
  return { passed, failed };
}

function playwrightCounts(report, exitCode) {
  if (!report) return { passed: 0, failed: 1, note: "Playwright wrote no JSON report" };
  const stats = report.stats ?? {};
  const passed = (stats.expected ?? 0) + (stats.flaky ?? 0);
  let failed = stats.unexpected ?? 0;
  if (failed === 0 && (report.errors ?? []).length > 0) failed = 1; // e.g. a spec file that does not load
  if (exitCode !== 0 && failed === 0) return { passed, failed: 1, note: `Playwright exited with code ${exitCode}` };
  return { passed, failed };
}

function findSpecs(dir) {
  if (!fs.existsSync(dir)) return [];
  return fs.readdirSync(dir, { withFileTypes: true, recursive: true })
    .filter((entry) => entry.isFile() && /\.spec\.[cm]?[jt]sx?$/.test(entry.name))
    .map((entry) => path.join(entry.parentPath ?? entry.path, entry.name));
}

async function main() {
  installSignalHandlers({ onSignal: () => info("Stopping the test run…") });
  const stages = selectedStages();
  await ensureNodeModules(root);

  reapStaleRuns();
  fs.mkdirSync(runDir, { recursive: true });
  // The run's process groups are recorded so that a later run can reap them if this one is killed.
  const writeRunFile = (groups) => fs.writeFileSync(path.join(runDir, "run.json"), JSON.stringify({ pid: process.pid, groups }));
  writeRunFile([]);
  onGroupsChanged(writeRunFile);
  const state = {};
  onShutdown(
    async () => {
      state.cluster?.discard();
      fs.rmSync(runDir, { recursive: true, force: true });
    },
    () => fs.rmSync(runDir, { recursive: true, force: true }),
  );

  const record = (stage, counts) => {
    if (isStopping()) return;
    results.push({ stage, ...counts });
    const line = `${stage}: ${counts.passed} passed, ${counts.failed} failed${counts.note ? ` (${counts.note})` : ""}`;
    console.log(counts.failed ? red(line) : green(line));
  };
  const base = { ...process.env, ...baseChildEnv() };
  // A DATABASE_URL exported for `npm start` must never reach the tests.
  delete base.DATABASE_URL;

  const appPort = await freePort();
  const ports = { pg: await freePort(), smtp: await freePort(), mailUi: await freePort(), s3: await freePort(), payments: await freePort() };
  const commonEnv = {
    AUTH_SECRET: "rungwise-test-secret-not-for-production-0123456789",
    AUTH_TRUST_HOST: "true",
    APP_URL: `http://127.0.0.1:${appPort}`,
  };

  // Services start once, when the first stage that needs them runs.
  let services = null;
  const needServices = async () => {
    if (!services) {
      services = (async () => {
        header("Test services (PostgreSQL, mail catcher, object storage, payments fake)");
        return startServices({ root, dataDir: runDir, mode: "test", ports, userEnv: {}, state, appUrl: commonEnv.APP_URL });
      })().then(
        (env) => ({ env }),
        (error) => ({ error: error instanceof Error ? error.message : String(error) }),
      );
    }
    const result = await services;
    if (result.error) fail(`Test services did not start: ${result.error}`);
    return result;
  };

  // A stage that throws (rather than failing its checks) counts as one failure; the next still runs.
  // After Ctrl-C nothing new starts: the signal handler is already stopping everything.
  const attempt = async (stage, fn) => {
    if (isStopping()) return;
    try {
      await fn();
    } catch (error) {
      if (isStopping()) return;
      fail(error instanceof Error ? (error.stack ?? error.message) : String(error));
      record(stage, { passed: 0, failed: 1, note: "the stage itself crashed" });
    }
  };

  if (stages.includes("typecheck")) await attempt("typecheck", async () => {
    header("typecheck: tsc --noEmit");
    if (fs.existsSync(path.join(root, "app"))) {
      // Route and page prop types (and next-env.d.ts) come from Next's generator, not from git.
      const typegen = await run("typegen", bin(root, "next"), ["typegen"], { cwd: root, env: base, output: "capture" });
      if (typegen.code !== 0) notice(`next typegen failed; type errors below may follow from it:\n${typegen.output}`);
    }
    const result = await run("tsc", bin(root, "tsc"), ["--noEmit"], { cwd: root, env: base });
    record("typecheck", result.code === 0 ? { passed: 1, failed: 0 } : { passed: 0, failed: 1 });
  });

  if (stages.includes("lint")) await attempt("lint", async () => {
    header("lint: eslint .");
    // Build output and test data are never linted, whatever the config says.
    const ignores = [".next/**", `${E2E_DIST_DIR}/**`, ".data/**", ".data-test/**", "test-results/**", "playwright-report/**"];
    const args = [".", ...ignores.flatMap((pattern) => ["--ignore-pattern", pattern])];
    const result = await run("eslint", bin(root, "eslint"), args, { cwd: root, env: base });
    record("lint", result.code === 0 ? { passed: 1, failed: 0 } : { passed: 0, failed: 1 });
  });

  if (stages.includes("unit")) await attempt("unit", async () => {
    const { env: serviceEnv, error } = await needServices();
    header("unit + integration: vitest run");
    if (error) {
      record("unit", { passed: 0, failed: 1, note: "test services did not start" });
    } else {
      const reportFile = path.join(runDir, "vitest.json");
      const env = { ...base, ...serviceEnv, ...commonEnv };
      const args = ["run", "--reporter=default", "--reporter=json", `--outputFile.json=${reportFile}`, "--passWithNoTests"];
      // VITEST_FILTER="billing-" narrows the run to matching test files (a local shortcut).
      if (process.env.VITEST_FILTER) args.push(...process.env.VITEST_FILTER.split(/\s+/).filter(Boolean));
      const result = await run("vitest", bin(root, "vitest"), args, { cwd: root, env });
      record("unit", vitestCounts(readJson(reportFile), result.code));
    }
  });

  if (stages.includes("e2e")) await attempt("e2e", async () => {
    record("e2e", await e2eStage({ needServices, state, base, commonEnv, appPort }));
  });

  if (isStopping()) return;
  await shutdown();

  const passed = results.reduce((sum, r) => sum + r.passed, 0);
  const failed = results.reduce((sum, r) => sum + r.failed, 0);
  header("Summary");
  for (const r of results) {
    console.log(`  ${r.stage.padEnd(10)} ${String(r.passed).padStart(4)} passed ${String(r.failed).padStart(4)} failed${r.note ? `  ${r.note}` : ""}`);
  }
  // The last line is plain (no colour) so CI and people can read the totals the same way.
  process.stdout.write(`${passed} passed, ${failed} failed\n`);
  process.exit(failed > 0 ? 1 : 0);
}

async function e2eStage({ needServices, state, base, commonEnv, appPort }) {
  header("e2e: Playwright against a production build");
  const specs = findSpecs(path.join(root, "tests/e2e"));
  if (specs.length === 0) {
    notice("No e2e specs in tests/e2e yet.");
    return { passed: 0, failed: 0 };
  }
  if (!configHonoursDistDir(root)) {
    return {
      passed: 0,
      failed: 1,
      note: `next.config must set distDir from NEXT_DIST_DIR; not building (it would overwrite .next)`,
    };
  }
  try {
    await ensureChromium();
  } catch (error) {
    return { passed: 0, failed: 1, note: error instanceof Error ? error.message : String(error) };
  }
  const { env: serviceEnv, error } = await needServices();
  if (error) return { passed: 0, failed: 1, note: "test services did not start" };

  const { TEST_PG_ADMIN_URL: _admin, ...appServiceEnv } = serviceEnv;
  await state.cluster.ensureDatabase(E2E_DATABASE, APP_DB.user, { recreate: true });
  const appEnv = {
    ...appServiceEnv,
    ...commonEnv,
    DATABASE_URL: state.cluster.url(APP_DB.user, APP_DB.password, E2E_DATABASE),
    NEXT_DIST_DIR: E2E_DIST_DIR,
    PORT: String(appPort),
  };
  const env = { ...base, ...appEnv };

  const prepared = await migrateAndSeed(root, env);
  if (!prepared.ok) return { passed: 0, failed: 1, note: `${prepared.step} failed` };

  const unlock = await lockE2e();
  const worker = startWorker(root, env);
  let app = null;
  try {
    if (!(await buildApp(root, env, { title: `next build (distDir ${E2E_DIST_DIR})` }))) {
      return { passed: 0, failed: 1, note: "next build failed" };
    }
    if (!fs.existsSync(path.join(root, E2E_DIST_DIR, "BUILD_ID"))) {
      return { passed: 0, failed: 1, note: `the build did not land in ${E2E_DIST_DIR}: check distDir in next.config` };
    }
    header(`next start on port ${appPort}`);
    app = startNext(root, env, { port: appPort });
    let appGone = false;
    app.exited.then(() => (appGone = true));
    const health = `http://127.0.0.1:${appPort}/api/health`;
    const status = await waitForHttp(health, { timeoutMs: 120_000, ok: (s) => s === 200, isDead: () => appGone });
    if (status !== 200) {
      return { passed: 0, failed: 1, note: appGone ? "next start exited" : `${health} did not answer 200 within 120 s` };
    }
    info(`App ready at ${appEnv.APP_URL}`);

    header("playwright test");
    const reportFile = path.join(runDir, "playwright.json");
    const pwEnv = {
      ...env,
      E2E_BASE_URL: appEnv.APP_URL,
      PLAYWRIGHT_JSON_OUTPUT_NAME: reportFile,
    };
    // E2E_FILTER="billing" runs only matching spec files (a local shortcut).
    const filters = (process.env.E2E_FILTER ?? "").split(/\s+/).filter(Boolean);
    const result = await run("playwright", bin(root, "playwright"), ["test", "--reporter=list,json", ...filters], { cwd: root, env: pwEnv });
    return playwrightCounts(readJson(reportFile), result.code);
  } finally {
    await stop(app, { timeoutMs: 10_000 });
    await stop(worker, { timeoutMs: 10_000 });
    unlock();
  }
}

main().catch(async (error) => {
  if (isStopping()) return;
  // An error in the orchestration itself counts as one more failure on top of what already ran.
  fail(error instanceof Error ? (error.stack ?? error.message) : String(error));
  await shutdown();
  const passed = results.reduce((sum, r) => sum + r.passed, 0);
  const failed = results.reduce((sum, r) => sum + r.failed, 0) + 1;
  process.stdout.write(`${passed} passed, ${failed} failed\n`);
  process.exit(1);
});
