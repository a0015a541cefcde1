// Installs what a fresh machine lacks: npm dependencies and Debian packages (Postgres, Chromium).
import fs from "node:fs";
import path from "node:path";
import { spawnSync } from "node:child_process";
import { info } from "./log.mjs";
import { run } from "./proc.mjs";

const mtime = (file) => fs.statSync(file).mtimeMs;

/** `npm install` when node_modules is missing or older than package-lock.json. */
export async function ensureNodeModules(root) {
  // A linked node_modules (a second checkout sharing one install) is managed where it lives.
  if (fs.existsSync(path.join(root, "node_modules")) && fs.lstatSync(path.join(root, "node_modules")).isSymbolicLink()) return;
  const lock = path.join(root, "package-lock.json");
  // npm rewrites this hidden lockfile on every install, so it dates the installed tree.
  const marker = path.join(root, "node_modules", ".package-lock.json");
  const stale = !fs.existsSync(marker) || (fs.existsSync(lock) && mtime(marker) < mtime(lock));
  if (!stale) return;
  info("Installing npm dependencies (node_modules is missing or older than package-lock.json)…");
  const env = { ...process.env, PLAYWRIGHT_SKIP_BROWSER_DOWNLOAD: "1" };
  const result = await run("npm", "npm", ["install", "--no-audit", "--no-fund"], { cwd: root, env });
  if (result.code !== 0) throw new Error("npm install failed");
  // npm may leave package-lock.json untouched but newer; mark the tree current so we do not loop.
  if (fs.existsSync(marker)) {
    const now = new Date();
    fs.utimesSync(marker, now, now);
  }
}

const isRoot = () => process.getuid?.() === 0;
const hasCommand = (name) => spawnSync("sh", ["-c", `command -v ${name}`], { stdio: "ignore" }).status === 0;
let aptUpdated = false;

/** apt-get install (as root, or through passwordless sudo). */
export async function aptInstall(packages, why) {
  if (!hasCommand("apt-get")) {
    throw new Error(`${why}: install ${packages.join(", ")} yourself (no apt-get on this machine)`);
  }
  const prefix = isRoot() ? [] : hasCommand("sudo") ? ["sudo", "-n", "-E"] : null;
  if (!prefix) throw new Error(`${why}: run as root or install ${packages.join(", ")} yourself`);
  const env = { ...process.env, DEBIAN_FRONTEND: "noninteractive" };
  const apt = async (args) => {
    const [command, ...rest] = [...prefix, "apt-get", "-o", "DPkg::Lock::Timeout=300", ...args];
    const result = await run("apt", command, rest, { env });
    if (result.code !== 0) throw new Error(`apt-get ${args.join(" ")} failed`);
  };
  info(`${why}: installing ${packages.join(", ")} with apt-get…`);
  if (!aptUpdated) {
    await apt(["update"]);
    aptUpdated = true;
  }
  await apt(["install", "-y", ...packages]);
}

export const CHROMIUM = "/usr/bin/chromium";

/** Debian's Chromium for Playwright (never Playwright's own browser downloads). */
export async function ensureChromium() {
  if (fs.existsSync(CHROMIUM)) return;
  await aptInstall(["chromium"], "Chromium is needed for the browser tests");
  if (!fs.existsSync(CHROMIUM)) throw new Error(`${CHROMIUM} is still missing after apt-get install`);
}
