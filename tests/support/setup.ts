// Per-worker set-up: integration tests point DATABASE_URL at this worker's own database. Top-level
// await rather than beforeAll, so the URL is set before a test file imports modules that read it.
if (process.env.TEST_PG_ADMIN_URL) {
  // Renamed on import: it is not a React hook, whatever the lint rule infers from "use".
  const { useWorkerDatabase: attachWorkerDatabase } = await import("./database");
  await attachWorkerDatabase();
}

export {};
