// Stints on a rung from the audit of moves (our own rule: a move onto the rung opens a stint, the
// athlete's next move on the ladder closes it; moving to a later rung or finishing counts as up).
import { describe, expect, it } from "vitest";
import { stintsOn } from "@/lib/server/promotions/backtest-rung";

const rungs = [
  { id: "r1", position: 1 },
  { id: "r2", position: 2 },
  { id: "r3", position: 3 },
];
const move = (athleteId: string, toRungId: string | null, effectiveOn: string) => ({ athleteId, athleteName: athleteId, toRungId, effectiveOn });

describe("stintsOn", () => {
  it("opens on the move onto the rung and closes on the next move, up or down", () => {
    const stints = stintsOn(rungs[1]!, rungs, [
      move("a", "r1", "2026-01-01"),
      move("a", "r2", "2026-01-10"),
      move("a", "r1", "2026-01-20"), // stepped down: left r2 but not upward
      move("a", "r2", "2026-02-01"),
      move("a", "r3", "2026-02-15"),
      move("b", "r2", "2026-02-05"), // still on it
    ]);
    expect(stints).toEqual([
      { athleteId: "a", athleteName: "a", reachedOn: "2026-01-10", endedOn: "2026-01-20", movedUp: false },
      { athleteId: "a", athleteName: "a", reachedOn: "2026-02-01", endedOn: "2026-02-15", movedUp: true },
      { athleteId: "b", athleteName: "b", reachedOn: "2026-02-05", endedOn: null, movedUp: false },
    ]);
  });

  it("counts finishing the ladder (a move to no rung) as moving up", () => {
    const stints = stintsOn(rungs[2]!, rungs, [move("c", "r3", "2026-03-01"), move("c", null, "2026-03-20")]);
    expect(stints).toEqual([{ athleteId: "c", athleteName: "c", reachedOn: "2026-03-01", endedOn: "2026-03-20", movedUp: true }]);
  });
});
