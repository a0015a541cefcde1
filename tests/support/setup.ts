// Per-worker set-up: integration tests point DATABASE_URL at this worker's own database.
import { beforeAll } from "vitest";

beforeAll(async () => {
  if (!process.env.TEST_PG_ADMIN_URL) return;
  const { useWorkerDatabase } = await import("./database");
  await useWorkerDatabase();
});
