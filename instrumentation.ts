// Runs once when a server instance starts: fail fast on a bad configuration.
export async function register() {
  if (process.env.NEXT_RUNTIME === "nodejs" && process.env.NEXT_PHASE !== "phase-production-build") {
    const { env } = await import("@/lib/env");
    env();
  }
}
