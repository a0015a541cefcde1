// Prepared by the test orchestrator (scripts/test.mjs): when TEST_PG_ADMIN_URL is set, integration
// tests get a migrated template database; unit tests need nothing from here.
export default async function setup() {
  if (!process.env.TEST_PG_ADMIN_URL) return;
  const { prepareTemplateDatabase } = await import("./database");
  await prepareTemplateDatabase();
}
