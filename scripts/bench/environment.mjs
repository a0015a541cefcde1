// The bench's own world: a private PostgreSQL cluster, migrations, a production build in its own
// distDir and `next start` on loopback, all on free ports, all stopped on exit.
// Self-contained until the shared scripts/lib helpers are on main; then swap these for them.
import { spawn, spawnSync } from "node:child_process";
import crypto from "node:crypto";
import fs from "node:fs";
import net from "node:net";
import os from "node:os";
import path from "node:path";
import { serverEnv } from "../lib/app.mjs";

const stoppers = [];
export async function shutdown() {
  while (stoppers.length) await stoppers.pop()().catch(() => undefined);
}

export function freePort() {
  return new Promise((resolve, reject) => {
    const server = net.createServer();
    server.unref();
    server.on("error", reject);
    server.listen(0, "127.0.0.1", () => {
      const { port } = server.address();
      server.close(() => resolve(port));
    });
  });
}

function pgBinDir() {
  const base = "/usr/lib/postgresql";
  if (fs.existsSync(base)) {
    const versions = fs.readdirSync(base).sort((a, b) => Number(b) - Number(a));
    for (const v of versions) if (fs.existsSync(path.join(base, v, "bin", "initdb"))) return path.join(base, v, "bin");
  }
  const which = spawnSync("sh", ["-c", "dirname $(command -v initdb)"], { encoding: "utf8" });
  if (which.status === 0 && which.stdout.trim()) return which.stdout.trim();
  throw new Error("PostgreSQL server binaries (initdb, pg_ctl) not found");
}

/** PostgreSQL refuses to run as root: run its tools as `postgres` then, from a folder it can reach. */
function asPg(bin, args) {
  const isRoot = process.getuid?.() === 0;
  const result = isRoot ? spawnSync("runuser", ["-u", "postgres", "--", bin, ...args], { encoding: "utf8" }) : spawnSync(bin, args, { encoding: "utf8" });
  if (result.status !== 0) throw new Error(`${path.basename(bin)} failed:\n${result.stdout}\n${result.stderr}`);
}

export async function startPostgres() {
  const bin = pgBinDir();
  const dir = fs.mkdtempSync(path.join(os.tmpdir(), "rungwise-bench-"));
  fs.chmodSync(dir, 0o755);
  if (process.getuid?.() === 0) spawnSync("chown", ["postgres", dir]);
  const data = path.join(dir, "pg");
  const port = await freePort();
  asPg(path.join(bin, "initdb"), ["-D", data, "-A", "trust", "-U", "postgres", "--no-sync"]);
  // fsync stays on: the floor and the endpoint pay the same commit cost. More clients than the bench opens.
  asPg(path.join(bin, "pg_ctl"), [
    "-D", data, "-w", "-l", path.join(data, "log"),
    "-o", `-p ${port} -k ${data} -c listen_addresses=127.0.0.1 -c max_connections=300 -c shared_buffers=256MB${process.env.BENCH_PGSS ? " -c shared_preload_libraries=pg_stat_statements -c pg_stat_statements.track_planning=on" : ""}`,
    "start",
  ]);
  stoppers.push(async () => {
    asPg(path.join(bin, "pg_ctl"), ["-D", data, "-m", "fast", "stop"]);
    fs.rmSync(dir, { recursive: true, force: true });
  });
  return { url: `postgres://postgres@127.0.0.1:${port}/postgres`, port };
}

function run(command, args, options) {
  return new Promise((resolve, reject) => {
    const child = spawn(command, args, { stdio: ["ignore", "inherit", "inherit"], ...options });
    child.on("exit", (code) => (code === 0 ? resolve() : reject(new Error(`${command} ${args.join(" ")} exited with ${code}`))));
  });
}

const bin = (root, name) => path.join(root, "node_modules", ".bin", name);

export async function migrate(root, env) {
  await run(bin(root, "tsx"), ["--conditions=react-server", "db/migrate.ts"], { cwd: root, env });
}

export async function build(root, env) {
  await run(bin(root, "next"), ["build"], { cwd: root, env });
}

/** `next start` on loopback; resolves when /api/health answers. */
export async function startApp(root, env, port) {
  const child = spawn(bin(root, "next"), ["start", "-H", "127.0.0.1", "-p", String(port)], {
    cwd: root,
    env: serverEnv(env),
    stdio: ["ignore", "ignore", "inherit"],
    detached: true,
  });
  stoppers.push(async () => {
    try {
      process.kill(-child.pid, "SIGTERM");
    } catch {
      // already gone
    }
  });
  const base = `http://127.0.0.1:${port}`;
  for (let i = 0; i < 120; i += 1) {
    try {
      const res = await fetch(`${base}/api/health`);
      if (res.ok) return base;
    } catch {
      // not up yet
    }
    await new Promise((r) => setTimeout(r, 500));
  }
  throw new Error("the app did not answer /api/health within 60 s");
}

export function secret() {
  return crypto.randomBytes(32).toString("base64url");
}
