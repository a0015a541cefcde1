import { eq, sql } from "drizzle-orm";
import type { Db } from "../client";
import { seedSteps } from "../schema";
import { SEED_STEPS } from "./steps";

/** Applies the seed steps this database has not seen yet; returns their names. */
export async function runSeed(db: Db, now = new Date()): Promise<string[]> {
  const applied: string[] = [];
  for (const step of SEED_STEPS) {
    const done = await db.transaction(async (tx) => {
      // A lock per step, so two concurrent starts never apply the same step twice.
      await tx.execute(sql`select pg_advisory_xact_lock(hashtext(${step.name}))`);
      const [seen] = await tx.select().from(seedSteps).where(eq(seedSteps.name, step.name));
      if (seen) return false;
      await step.run(tx, { now });
      await tx.insert(seedSteps).values({ name: step.name });
      return true;
    });
    if (done) applied.push(step.name);
  }
  return applied;
}
