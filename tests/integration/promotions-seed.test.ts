// The demo's readiness stories after every seed step (history, then the readiness scenario): a
// proposal waiting on an approve ladder, a step-down proposal, a pain flag, someone part-way to the
// standard, with the positions' stored figures written by the engine. Which athlete tells which
// story depends on the seeded history, so the checks look for the stories, not for names.
import { and, eq } from "drizzle-orm";
import { describe, expect, it } from "vitest";
import { db } from "@/db/client";
import { athletePositions, ladders, promotions } from "@/db/schema";
import { demoTeam } from "@/db/seed/demo-team";
import { runSeed } from "@/db/seed/run-seed";

describe("demo seed: readiness scenario", () => {
  it("leaves the demo club with the stories it tells", async () => {
    await runSeed(db);
    const team = await db.transaction((tx) => demoTeam(tx));
    const positions = await db
      .select({ position: athletePositions, mode: ladders.promotionMode })
      .from(athletePositions)
      .innerJoin(ladders, eq(ladders.id, athletePositions.ladderId))
      .where(eq(athletePositions.teamId, team.teamId));
    const pending = await db
      .select()
      .from(promotions)
      .where(and(eq(promotions.teamId, team.teamId), eq(promotions.status, "pending")));
    const byId = new Map(positions.map((p) => [p.position.id, p]));

    const up = pending.filter((p) => p.direction === "up");
    expect(up.length).toBeGreaterThanOrEqual(1);
    for (const p of up) {
      expect(byId.get(p.positionId)).toMatchObject({ mode: "approve", position: { status: "pending_approval", readiness: 100 } });
    }
    const down = pending.filter((p) => p.direction === "down");
    expect(down.length).toBeGreaterThanOrEqual(1);
    for (const p of down) expect(byId.get(p.positionId)?.position.status).toBe("step_down");

    expect(positions.some((p) => p.position.lastPainOn !== null)).toBe(true);
    expect(positions.some((p) => p.position.status === "not_yet" && p.position.sessionsMet >= 1)).toBe(true);
    // The engine wrote the stored figures for positions with history.
    const withHistory = positions.filter((p) => p.position.lastSessionOn !== null);
    expect(withHistory.length).toBeGreaterThanOrEqual(10);
    expect(withHistory.every((p) => p.position.readiness > 0)).toBe(true);
  });
});
