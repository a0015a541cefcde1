// Applies the committed SQL migrations in drizzle/ to DATABASE_URL.
import { migrate } from "drizzle-orm/node-postgres/migrator";
import { closeDb, db } from "./client";

async function main() {
  await migrate(db, { migrationsFolder: "drizzle" });
  await closeDb();
  console.log("migrations applied");
}

main().catch((error: unknown) => {
  console.error(error);
  process.exit(1);
});
