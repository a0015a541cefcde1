// The app's own processes: migrations, demo seed, background worker, Next build and server.
// Each step tolerates a file that does not exist yet, so the scripts work while the app grows.
import crypto from "node:crypto";
import fs from "node:fs";
import path from "node:path";
import { header, notice } from "./log.mjs";
import { run, spawnTracked } from "./proc.mjs";

export const bin = (root, name) => path.join(root, "node_modules", ".bin", name);

/** tsx with `server-only` stubbed out (see server-only-stub.mjs). */
const SERVER_ONLY_STUB = new URL("./server-only-stub.mjs", import.meta.url).href;
const tsxArgs = (file) => ["--import", SERVER_ONLY_STUB, file];

/** Environment for every Node child: no telemetry calls (no network here) and no browser downloads. */
export function baseChildEnv() {
  return { NEXT_TELEMETRY_DISABLED: "1", PLAYWRIGHT_SKIP_BROWSER_DOWNLOAD: "1" };
}

/** AUTH_SECRET generated once per data directory, so sessions survive restarts. */
export function authSecret(dataDir) {
  const file = path.join(dataDir, "auth-secret");
  if (fs.existsSync(file)) {
    const value = fs.readFileSync(file, "utf8").trim();
    if (value) return value;
  }
  const value = crypto.randomBytes(32).toString("base64url");
  fs.mkdirSync(dataDir, { recursive: true });
  fs.writeFileSync(file, `${value}\n`, { mode: 0o600 });
  return value;
}

/** Run a TypeScript entry point with tsx when it exists. Returns "skipped", "ok" or "failed". */
export async function runTsIfPresent(root, file, env, { title }) {
  if (!fs.existsSync(path.join(root, file))) {
    notice(`${file} does not exist yet; skipping ${title.toLowerCase()}.`);
    return "skipped";
  }
  header(title);
  const result = await run(title, bin(root, "tsx"), tsxArgs(file), { cwd: root, env });
  return result.code === 0 ? "ok" : "failed";
}

/** Apply migrations, then the missing demo seed steps (the seed itself knows which are applied). */
export async function migrateAndSeed(root, env) {
  const migrated = await runTsIfPresent(root, "db/migrate.ts", env, { title: "Database migrations" });
  if (migrated === "failed") return { ok: false, seeded: false, step: "db/migrate.ts" };
  const seeded = await runTsIfPresent(root, "db/seed/index.ts", env, { title: "Demo seed" });
  if (seeded === "failed") return { ok: false, seeded: false, step: "db/seed/index.ts" };
  return { ok: true, seeded: seeded === "ok" };
}

export function startWorker(root, env) {
  if (!fs.existsSync(path.join(root, "worker/index.ts"))) {
    notice("worker/index.ts does not exist yet; no background worker.");
    return null;
  }
  return spawnTracked("worker", bin(root, "tsx"), tsxArgs("worker/index.ts"), { cwd: root, env });
}

// What a Next build does not depend on; everything else in the checkout does (app/, components/,
// lib/, db/, public/, next.config.*, package-lock.json, .env*, new top-level folders…).
const NOT_BUILD_INPUTS = new Set(["node_modules", "tests", "scripts", "drizzle", "worker", "docs", "test-results", "playwright-report"]);
const NOT_BUILD_FILES = new Set(["next-env.d.ts", "README.md"]);

function newestInput(dir, since, depth = 0) {
  for (const entry of fs.readdirSync(dir, { withFileTypes: true })) {
    const full = path.join(dir, entry.name);
    if (entry.isDirectory()) {
      if (entry.name.startsWith(".") || (depth === 0 && NOT_BUILD_INPUTS.has(entry.name))) continue;
      if (newestInput(full, since, depth + 1)) return true;
    } else if (entry.isFile()) {
      if (NOT_BUILD_FILES.has(entry.name) || entry.name.endsWith(".tsbuildinfo") || entry.name.endsWith(".md")) continue;
      if (fs.statSync(full).mtimeMs > since) return true;
    }
  }
  return false;
}

/** True when <distDir>/BUILD_ID is missing or any build input is newer than it. */
export function needsBuild(root, distDir) {
  const buildId = path.join(root, distDir, "BUILD_ID");
  if (!fs.existsSync(buildId)) return true;
  return newestInput(root, fs.statSync(buildId).mtimeMs);
}

/** The e2e build must not overwrite the .next of a running `npm start`. */
export function configHonoursDistDir(root) {
  const config = ["next.config.mjs", "next.config.ts", "next.config.js"].map((f) => path.join(root, f)).find((f) => fs.existsSync(f));
  return Boolean(config && fs.readFileSync(config, "utf8").includes("NEXT_DIST_DIR"));
}

export async function buildApp(root, env, { title = "Next build" } = {}) {
  header(title);
  const result = await run("build", bin(root, "next"), ["build"], { cwd: root, env });
  return result.code === 0;
}

/**
 * Node options for the production server: a larger young generation, so a busy server collects
 * short-lived request garbage less often ("may improve throughput … at the cost of more memory",
 * Node.js CLI docs on --max-semi-space-size). The bench starts the app with the same options.
 */
export const SERVER_NODE_OPTIONS = "--max-semi-space-size=32";

export function serverEnv(env) {
  return { ...env, NODE_OPTIONS: [env.NODE_OPTIONS, SERVER_NODE_OPTIONS].filter(Boolean).join(" ") };
}

export function startNext(root, env, { dev = false, port, output = "prefix" }) {
  const args = [dev ? "dev" : "start", "-p", String(port), "-H", "127.0.0.1"];
  return spawnTracked("app", bin(root, "next"), args, { cwd: root, env: dev ? env : serverEnv(env), output });
}
