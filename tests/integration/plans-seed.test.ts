import { eq } from "drizzle-orm";
import { describe, expect, it } from "vitest";
import { db } from "@/db/client";
import { users } from "@/db/schema";
import { DEMO_ATHLETES } from "@/db/seed/demo-cast";
import { runSeed } from "@/db/seed/run-seed";
import { addDays, localDateOf } from "@/lib/engine";
import { listAssignments } from "@/lib/server/assignments/list-assignments";
import { planForDay } from "@/lib/server/plans/plan-for-day";
import { actorOf } from "../support/factories";

describe("demo seed: squads and plans", () => {
  it("gives the athlete demo a planned session on every day of the coming week", async () => {
    const now = new Date();
    await runSeed(db, now);
    const priyaEmail = DEMO_ATHLETES.find((a) => a.key === "priya")!.email;
    const [user] = await db.select({ id: users.id }).from(users).where(eq(users.email, priyaEmail));
    const priya = await actorOf(user!.id);
    const today = localDateOf(now, priya.timeZone);
    for (let offset = 0; offset < 7; offset += 1) {
      const day = await planForDay(priya, priya.athleteId!, addDays(today, offset));
      expect(day.items.length, `day ${addDays(today, offset)}`).toBeGreaterThan(0);
      expect(day.items[0]!.blocks[0]!.slots.every((s) => s.rung !== null)).toBe(true);
    }
    const assigned = await listAssignments(priya, priya.athleteId!, { limit: 50 });
    expect(assigned.items.map((a) => a.planName).sort()).toEqual(["Foundations 6 weeks", "Off-day skill practice"]);
    expect(assigned.items.every((a) => a.startsOn === addDays(today, -21))).toBe(true);
  });
});
