// Port helpers: the start script checks its fixed ports up front (a clear message beats a crash
// deep inside a child), the test script asks the kernel for free ones so it can run beside `npm start`.
import net from "node:net";

function canConnect(port, host) {
  return new Promise((resolve) => {
    const socket = net.connect({ port, host });
    const done = (result) => {
      socket.destroy();
      resolve(result);
    };
    socket.setTimeout(500, () => done(false));
    socket.once("connect", () => done(true));
    socket.once("error", () => done(false));
  });
}

function canListen(port, host) {
  return new Promise((resolve) => {
    const server = net.createServer();
    server.unref();
    server.once("error", () => resolve(false));
    server.listen({ port, host, exclusive: true }, () => server.close(() => resolve(true)));
  });
}

/** True when nothing listens on the port on loopback (IPv4 or a dual-stack wildcard). */
export async function isPortFree(port, host = "127.0.0.1") {
  if (await canConnect(port, host)) return false;
  return canListen(port, host);
}

const handedOut = new Set();

/** A currently free loopback port, never the same one twice in this process. */
export async function freePort() {
  for (let attempt = 0; attempt < 50; attempt += 1) {
    const port = await new Promise((resolve, reject) => {
      const server = net.createServer();
      server.unref();
      server.once("error", reject);
      server.listen({ port: 0, host: "127.0.0.1", exclusive: true }, () => {
        const { port: chosen } = server.address();
        server.close(() => resolve(chosen));
      });
    });
    if (!handedOut.has(port)) {
      handedOut.add(port);
      return port;
    }
  }
  throw new Error("could not find a free port");
}

/** Wait until a TCP port accepts connections. */
export async function waitForPort(port, { host = "127.0.0.1", timeoutMs = 30_000, isDead } = {}) {
  const deadline = Date.now() + timeoutMs;
  while (Date.now() < deadline) {
    if (await canConnect(port, host)) return true;
    if (isDead?.()) return false;
    await new Promise((resolve) => setTimeout(resolve, 200));
  }
  return false;
}

/**
 * Poll an HTTP URL until it answers. `ok` decides which status counts (default: any answer).
 * Returns the last status, or null on timeout / when isDead() says the server process has gone.
 */
export async function waitForHttp(url, { timeoutMs = 120_000, ok = () => true, isDead } = {}) {
  const deadline = Date.now() + timeoutMs;
  while (Date.now() < deadline) {
    try {
      const response = await fetch(url, { signal: AbortSignal.timeout(10_000), redirect: "manual" });
      await response.arrayBuffer().catch(() => undefined);
      if (ok(response.status)) return response.status;
    } catch {
      // Not listening yet.
    }
    if (isDead?.()) return null;
    await new Promise((resolve) => setTimeout(resolve, 500));
  }
  return null;
}
