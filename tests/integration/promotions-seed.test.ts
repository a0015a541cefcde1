// The demo's readiness stories: a proposal waiting on an approve ladder, a step-down after pain,
// a stalled athlete and one who is a session away, with every position's figures current.
import { and, eq } from "drizzle-orm";
import { describe, expect, it } from "vitest";
import { db } from "@/db/client";
import { athletePositions, promotions } from "@/db/schema";
import { demoTeam } from "@/db/seed/demo-team";
import { runSeed } from "@/db/seed/run-seed";

describe("seed step 005: readiness scenario", () => {
  it("leaves the demo club with the stories it tells", async () => {
    await runSeed(db);
    const team = await db.transaction((tx) => demoTeam(tx));
    const position = async (athlete: keyof typeof team.athleteIds, ladder: string) => {
      const [row] = await db
        .select()
        .from(athletePositions)
        .where(and(eq(athletePositions.athleteId, team.athleteIds[athlete]), eq(athletePositions.ladderId, team.ladderIds[ladder]!)));
      return row!;
    };
    const pendingOf = (positionId: string) =>
      db.select().from(promotions).where(and(eq(promotions.positionId, positionId), eq(promotions.status, "pending")));

    const ines = await position("ines", "press-to-handstand");
    expect(ines).toMatchObject({ status: "pending_approval", readiness: 100 });
    expect(await pendingOf(ines.id)).toMatchObject([{ direction: "up", toRungId: team.rungId("press-to-handstand", "straddle-stand-lean") }]);

    const felix = await position("felix", "handstand-push-up");
    expect(felix).toMatchObject({ status: "step_down", rungId: team.rungId("handstand-push-up", "wall-hspu-lowering") });
    expect(felix.lastPainOn).not.toBeNull();
    expect(await pendingOf(felix.id)).toMatchObject([{ direction: "down", toRungId: team.rungId("handstand-push-up", "high-box-pike-push-up") }]);

    const sol = await position("sol", "l-sit-to-v-sit");
    expect(sol).toMatchObject({ status: "not_yet", sessionsMet: 0, rungId: team.rungId("l-sit-to-v-sit", "high-l-sit") });

    const priya = await position("priya", "l-sit-to-v-sit");
    expect(priya).toMatchObject({ status: "not_yet", sessionsMet: 1, rungId: team.rungId("l-sit-to-v-sit", "l-sit-floor") });
    expect(priya.readiness).toBeGreaterThanOrEqual(50);

    // Every demo position was evaluated: someone placed days ago has days-based readiness.
    const all = await db.select().from(athletePositions).where(eq(athletePositions.teamId, team.teamId));
    expect(all.filter((p) => p.readiness > 0).length).toBe(all.length);
  });
});
