// Child process management. Every child gets its own process group (detached) so that stopping it
// also stops whatever it spawned (npx → node, tsx → node, next → workers), and so a terminal Ctrl-C
// reaches only us: we then stop children in a deliberate order (app before database).
import { spawn } from "node:child_process";
import fs from "node:fs";
import readline from "node:readline";
import { dim, fail, notice } from "./log.mjs";

const tracked = new Map(); // pgid → { name, child }
const asyncCleanups = []; // run in reverse order on shutdown
const syncCleanups = []; // last resort in the 'exit' event, where nothing can be awaited
let stopping = false;
let shutdownPromise = null;
let groupsListener = null;

export const isStopping = () => stopping;

/** Called with the live process-group ids whenever they change (used to reap strays after a crash). */
export function onGroupsChanged(listener) {
  groupsListener = listener;
}

function groupsChanged() {
  groupsListener?.([...tracked.keys()]);
}

/** Register an async cleanup (e.g. stop Postgres) and a synchronous fallback for abrupt exits. */
export function onShutdown(asyncFn, syncFn) {
  if (asyncFn) asyncCleanups.push(asyncFn);
  if (syncFn) syncCleanups.push(syncFn);
}

/** Live, non-zombie members of a process group. /proc is used because a container's PID 1 may never
 *  reap zombies, and kill(-pgid, 0) would then report the group alive forever. */
export function groupMembers(pgid) {
  if (!fs.existsSync("/proc/self/stat")) {
    try {
      process.kill(-pgid, 0);
      return [pgid];
    } catch {
      return [];
    }
  }
  const members = [];
  for (const entry of fs.readdirSync("/proc")) {
    if (!/^\d+$/.test(entry)) continue;
    let stat;
    try {
      stat = fs.readFileSync(`/proc/${entry}/stat`, "utf8");
    } catch {
      continue;
    }
    // Fields after the command name, which may itself contain spaces and parentheses.
    const fields = stat.slice(stat.lastIndexOf(")") + 2).split(" ");
    const state = fields[0];
    if (Number(fields[2]) === pgid && state !== "Z" && state !== "X") members.push(Number(entry));
  }
  return members;
}

/**
 * SIGKILL the process groups an earlier run left behind when it was killed outright (SIGKILL, out of
 * memory). Only groups with a member working in `cwd`, in case a group id has been reused since.
 */
export function reapGroups(pgids, cwd) {
  for (const pgid of pgids ?? []) {
    const ours = groupMembers(pgid).some((pid) => {
      try {
        return fs.readlinkSync(`/proc/${pid}/cwd`) === cwd;
      } catch {
        return false;
      }
    });
    if (ours) {
      notice(`Stopping leftover processes (group ${pgid}) of an earlier run.`);
      signalGroup(pgid, "SIGKILL");
    }
  }
}

function signalGroup(pgid, signal) {
  try {
    process.kill(-pgid, signal);
  } catch {
    // ESRCH: already gone.
  }
}

const sleep = (ms) => new Promise((resolve) => setTimeout(resolve, ms));

/** SIGTERM a group, wait up to timeoutMs for every member to leave, then SIGKILL what remains. */
export async function stopGroup(pgid, { timeoutMs = 10_000, signal = "SIGTERM" } = {}) {
  if (groupMembers(pgid).length === 0) return;
  signalGroup(pgid, signal);
  const deadline = Date.now() + timeoutMs;
  while (Date.now() < deadline) {
    if (groupMembers(pgid).length === 0) return;
    await sleep(100);
  }
  signalGroup(pgid, "SIGKILL");
  await sleep(100);
}

function pipeWithPrefix(stream, target, prefix, keep) {
  const lines = readline.createInterface({ input: stream, crlfDelay: Infinity });
  lines.on("line", (line) => {
    keep.push(line);
    if (keep.length > 200) keep.shift();
    if (target) target.write(prefix ? `${dim(prefix)} ${line}\n` : `${line}\n`);
  });
}

/**
 * Start a child in its own process group.
 * output: "prefix" (default, lines labelled with the name), "inherit", or "capture" (kept, not shown).
 * Returns { name, pid, child, exited: Promise<{ code, signal }>, output(): string }.
 */
export function spawnTracked(name, command, args, options = {}) {
  const { env = process.env, cwd, output = "prefix", uid, gid, duringShutdown = false } = options;
  // Cleanups (pg_ctl stop) may still spawn; nothing else may start once we are stopping.
  if (stopping && !duringShutdown) throw new Error(`not starting ${name}: shutting down`);
  const stdio = output === "inherit" ? ["ignore", "inherit", "inherit"] : ["ignore", "pipe", "pipe"];
  const child = spawn(command, args, { env, cwd, stdio, detached: true, uid, gid });
  const kept = [];
  if (output !== "inherit") {
    const show = output === "prefix";
    pipeWithPrefix(child.stdout, show ? process.stdout : null, show ? `[${name}]` : "", kept);
    pipeWithPrefix(child.stderr, show ? process.stderr : null, show ? `[${name}]` : "", kept);
  }
  const exited = new Promise((resolve) => {
    child.once("error", (error) => {
      kept.push(String(error.message));
      resolve({ code: 127, signal: null, error });
    });
    child.once("close", (code, signal) => resolve({ code, signal }));
  });
  if (child.pid) {
    tracked.set(child.pid, { name, child });
    groupsChanged();
    exited.then(async () => {
      // The leader is gone; make sure nothing it left behind in its group lingers.
      await stopGroup(child.pid, { timeoutMs: 2_000 });
      tracked.delete(child.pid);
      groupsChanged();
    });
  }
  return { name, pid: child.pid, child, exited, output: () => kept.join("\n") };
}

/** Run a command to completion (stdout/stderr streamed unless output says otherwise). */
export async function run(name, command, args, options = {}) {
  const handle = spawnTracked(name, command, args, { output: "inherit", ...options });
  const result = await handle.exited;
  if (handle.pid) await stopGroup(handle.pid, { timeoutMs: 2_000 });
  return { ...result, output: handle.output() };
}

/** Stop one tracked child (and its group). */
export async function stop(handle, options) {
  if (handle?.pid) await stopGroup(handle.pid, options);
  if (handle) await handle.exited;
}

/** Stop every child (newest first), then run the registered cleanups (newest first). Idempotent. */
export function shutdown() {
  if (shutdownPromise) return shutdownPromise;
  stopping = true;
  shutdownPromise = (async () => {
    const groups = [...tracked.keys()].reverse();
    await Promise.all(groups.map((pgid) => stopGroup(pgid)));
    for (const cleanup of asyncCleanups.reverse()) {
      try {
        await cleanup();
      } catch (error) {
        fail(`cleanup failed: ${error instanceof Error ? error.message : error}`);
      }
    }
    asyncCleanups.length = 0;
    syncCleanups.length = 0;
  })();
  return shutdownPromise;
}

function hardStop() {
  for (const pgid of tracked.keys()) signalGroup(pgid, "SIGKILL");
  for (const cleanup of syncCleanups.reverse()) {
    try {
      cleanup();
    } catch {
      // Nothing more can be done while the process exits.
    }
  }
  syncCleanups.length = 0;
}

/**
 * Ctrl-C / SIGTERM / SIGHUP stop everything cleanly, then exit. `npm start` forwards the signal the
 * terminal already sent us, so a second signal within 2 s is the same keypress; a later one forces.
 */
export function installSignalHandlers({ onSignal } = {}) {
  let firstSignalAt = 0;
  const codes = { SIGINT: 130, SIGTERM: 143, SIGHUP: 129 };
  for (const signal of Object.keys(codes)) {
    process.on(signal, () => {
      const now = Date.now();
      if (firstSignalAt) {
        if (now - firstSignalAt < 2_000) return;
        notice("Forced stop.");
        hardStop();
        process.exit(codes[signal]);
      }
      firstSignalAt = now;
      onSignal?.(signal);
      shutdown().finally(() => process.exit(codes[signal]));
    });
  }
  process.on("exit", hardStop);
  const crash = (error) => {
    fail(error instanceof Error ? (error.stack ?? error.message) : String(error));
    shutdown().finally(() => process.exit(1));
  };
  process.on("uncaughtException", crash);
  process.on("unhandledRejection", crash);
}
