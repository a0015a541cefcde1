// Runs the demo seed steps not yet applied to DATABASE_URL (called by `npm start` and the e2e set-up).
import { closeDb, db } from "../client";
import { runSeed } from "./run-seed";

async function main() {
  const applied = await runSeed(db);
  console.log(applied.length ? `seed steps applied: ${applied.join(", ")}` : "seed: nothing new to apply");
  await closeDb();
}

main().catch((error: unknown) => {
  console.error(error);
  process.exit(1);
});
