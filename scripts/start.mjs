#!/usr/bin/env node
// `npm start` (build + serve) and `npm run dev` (next dev): everything Rungwise needs on one machine.
// Plain JavaScript with no dependencies until `npm install` has run (a fresh clone has no tsx).
// State lives in ./.data (database cluster or a link to it, auth secret, caught mail, uploads).
import fs from "node:fs";
import path from "node:path";
import { fileURLToPath } from "node:url";
import { authSecret, baseChildEnv, buildApp, migrateAndSeed, needsBuild, startNext, startWorker } from "./lib/app.mjs";
import { ensureNodeModules } from "./lib/install.mjs";
import { bold, cyan, fail, header, info, notice } from "./lib/log.mjs";
import { isPortFree, waitForHttp } from "./lib/ports.mjs";
import { installSignalHandlers, isStopping, onGroupsChanged, onShutdown, reapGroups, shutdown } from "./lib/proc.mjs";
import { startServices } from "./lib/services.mjs";

const root = path.resolve(path.dirname(fileURLToPath(import.meta.url)), "..");
const dataDir = path.join(root, ".data");
const dev = process.argv.includes("--dev");
const userEnv = { ...process.env };
function numberFrom(name, fallback) {
  const value = Number(userEnv[name] || fallback);
  if (!Number.isInteger(value) || value < 1 || value > 65535) throw new Error(`${name} must be a port number (got "${userEnv[name]}")`);
  return value;
}

/**
 * One `npm start` per checkout. The lock file also lists our children's process groups, so a run
 * that was killed outright (SIGKILL, out of memory) has its strays reaped by the next one.
 */
function takeLock() {
  const lockFile = path.join(dataDir, "start.json");
  fs.mkdirSync(dataDir, { recursive: true });
  let previous = null;
  try {
    previous = JSON.parse(fs.readFileSync(lockFile, "utf8"));
  } catch {
    // No previous run, or an unreadable lock: nothing to reap.
  }
  if (previous?.pid && previous.pid !== process.pid) {
    let alive = false;
    try {
      alive = fs.readFileSync(`/proc/${previous.pid}/cmdline`, "utf8").includes("start.mjs");
    } catch {
      alive = false;
    }
    if (alive) throw new Error(`Rungwise is already running from this checkout (pid ${previous.pid}).`);
    reapGroups(previous.groups, root);
  }
  const write = (groups) => fs.writeFileSync(lockFile, JSON.stringify({ pid: process.pid, groups }));
  write([]);
  onGroupsChanged(write);
  onShutdown(() => fs.rmSync(lockFile, { force: true }), () => fs.rmSync(lockFile, { force: true }));
}

/** Our values fill in only what the user did not set. */
function withUserPrecedence(computed) {
  const env = { ...computed };
  for (const key of Object.keys(env)) if (userEnv[key]) env[key] = userEnv[key];
  return env;
}

/** A shell-sourceable copy for running tools by hand: `set -a; . .data/env; set +a`. */
function writeEnvFile(env) {
  const quote = (value) => `'${String(value).replaceAll("'", "'\\''")}'`;
  const body = Object.entries(env).map(([key, value]) => `${key}=${quote(value)}`).join("\n");
  fs.writeFileSync(path.join(dataDir, "env"), `# Written by scripts/start.mjs on every start.\n${body}\n`, { mode: 0o600 });
}

async function main() {
  installSignalHandlers({ onSignal: () => info("Stopping…") });
  takeLock();
  await ensureNodeModules(root);

  const port = numberFrom("PORT", 3000);
  const ports = {
    pg: numberFrom("PGPORT", 5433),
    smtp: numberFrom("SMTP_PORT", 1025),
    mailUi: numberFrom("MAIL_UI_PORT", 1080),
    s3: numberFrom("S3_PORT", 4569),
    payments: numberFrom("PAYMENTS_API_PORT", 12111),
  };
  if (!(await isPortFree(port))) throw new Error(`Port ${port} is already in use; set PORT to another port.`);

  header("Services");
  const serviceEnv = await startServices({ root, dataDir, mode: "start", ports, userEnv, state: {}, appUrl: userEnv.APP_URL || `http://localhost:${port}` });
  const appEnv = withUserPrecedence({
    ...serviceEnv,
    PORT: String(port),
    AUTH_SECRET: authSecret(dataDir),
    AUTH_TRUST_HOST: "true",
    APP_URL: `http://localhost:${port}`,
  });
  writeEnvFile(appEnv);
  const env = { ...process.env, ...baseChildEnv(), ...appEnv };

  const prepared = await migrateAndSeed(root, env);
  if (!prepared.ok) throw new Error(`${prepared.step} failed; see its output above.`);

  const worker = startWorker(root, env);
  worker?.exited.then(({ code }) => {
    if (!isStopping()) notice(`The background worker exited (code ${code}); the app keeps running without it.`);
  });

  if (!dev && needsBuild(root, ".next")) {
    if (!(await buildApp(root, env))) throw new Error("next build failed; see its output above.");
  } else if (!dev) {
    info("The build in .next is up to date.");
  }

  header(dev ? "next dev" : "next start");
  const app = startNext(root, env, { dev, port });
  let appGone = false;
  const appExit = app.exited.then((result) => {
    appGone = true;
    return result;
  });
  const ready = await waitForHttp(`http://127.0.0.1:${port}/api/health`, { timeoutMs: 180_000, isDead: () => appGone });
  if (ready === null && !appGone) notice("The app has not answered yet; it may still be starting.");
  if (!appGone) {
    const mailUi = serviceEnv.MAIL_UI_PORT ? `http://localhost:${env.MAIL_UI_PORT}` : `(mail goes to ${env.SMTP_HOST})`;
    const lines = [
      "",
      bold(`Rungwise is running${dev ? " (development)" : ""}`),
      `  App            ${cyan(env.APP_URL)}`,
      `  Mail catcher   ${cyan(mailUi)}`,
      "  Demo sign-ins  coach@rungwise.test · athlete@rungwise.test  password: rungwise-demo (demo data only)",
    ];
    if (!prepared.seeded) lines.push("                 (no demo data yet: db/seed/index.ts does not exist)");
    lines.push("  Press Ctrl-C to stop.", "");
    console.log(lines.join("\n"));
  }

  const { code, signal } = await appExit;
  if (isStopping()) return; // Ctrl-C: the signal handler finishes the shutdown and exits.
  fail(`The app exited (${signal ?? `code ${code}`}); stopping everything.`);
  await shutdown();
  process.exit(1);
}

main().catch(async (error) => {
  if (isStopping()) return;
  fail(error instanceof Error ? error.message : String(error));
  await shutdown();
  process.exit(1);
});
