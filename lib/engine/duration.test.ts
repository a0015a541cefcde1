import { describe, expect, it } from "vitest";
import { blockDurationSec, type DurationBlock, sessionDurationSec, setsPerRound, workSecondsPerSet } from "./duration";

// Paces (3 s/rep, 1 s/m, +2 s per lowering) are common practice, no source. Totals are worked by hand.
const block: DurationBlock = {
  rounds: 3,
  restBetweenSlotsSec: 30,
  restBetweenRoundsSec: 90,
  slots: [
    { measure: "hold_seconds", target: 20 }, // 20 s
    { measure: "reps", target: 8 }, // 8 × 3 = 24 s
    { measure: "eccentric_seconds", target: 5, lowerings: 3 }, // 3 × (5 + 2) = 21 s
  ],
};

describe("workSecondsPerSet (common practice, no source)", () => {
  it.each<[DurationBlock["slots"][number], number]>([
    [{ measure: "hold_seconds", target: 25 }, 25],
    [{ measure: "hold_seconds_each_side", target: 15 }, 30],
    [{ measure: "reps", target: 8 }, 24],
    [{ measure: "reps_each_side", target: 5 }, 30],
    [{ measure: "eccentric_seconds", target: 5, lowerings: 3 }, 21],
    [{ measure: "eccentric_seconds", target: 8 }, 10],
    [{ measure: "distance_m", target: 10 }, 10],
  ])("%o → %i s", (slot, seconds) => {
    expect(workSecondsPerSet(slot)).toBe(seconds);
  });
});

describe("setsPerRound", () => {
  it("spreads sets over rounds, earlier rounds first", () => {
    expect(setsPerRound(3, 3)).toEqual([1, 1, 1]);
    expect(setsPerRound(5, 3)).toEqual([2, 2, 1]);
    expect(setsPerRound(2, 3)).toEqual([1, 1, 0]);
    expect(setsPerRound(6, 3)).toEqual([2, 2, 2]);
  });
});

describe("blockDurationSec (hand-worked)", () => {
  it("3 rounds of hold 20 s, 8 reps, 3 × 5 s lowerings, 30 s between slots, 90 s between rounds = 555 s", () => {
    // Work per round 20 + 24 + 21 = 65 s, × 3 = 195 s. Slot rests: 2 per round × 3 rounds × 30 s = 180 s.
    // Round rests: 2 × 90 s = 180 s. Total 195 + 180 + 180 = 555 s.
    expect(blockDurationSec(block)).toBe(555);
  });

  it("a slot with 5 explicit sets over 3 rounds does 2, 2, 1 → 663 s", () => {
    // Rounds 1–2: hold, reps, reps, lowerings = 20 + 48 + 21 = 89 s work, 3 rests × 30 s = 90 s.
    // Round 3: 65 s work, 2 rests = 60 s. Work 243 + slot rests 240 + round rests 180 = 663 s.
    const withExtra: DurationBlock = { ...block, slots: block.slots.map((s) => (s.measure === "reps" ? { ...s, sets: 5 } : s)) };
    expect(blockDurationSec(withExtra)).toBe(663);
  });

  it("skips a round with nothing to do, and its rest", () => {
    // One slot, 2 sets over 3 rounds → 1, 1, 0: 2 × 30 s work + one round rest of 90 s = 150 s.
    expect(blockDurationSec({ rounds: 3, restBetweenSlotsSec: 30, restBetweenRoundsSec: 90, slots: [{ measure: "hold_seconds", target: 30, sets: 2 }] })).toBe(150);
    expect(blockDurationSec({ ...block, rounds: 0 })).toBe(0);
  });
});

describe("sessionDurationSec", () => {
  it("adds block rests between blocks only: 555 + 150 + 120 = 825 s", () => {
    const small: DurationBlock = { rounds: 3, restBetweenSlotsSec: 30, restBetweenRoundsSec: 90, slots: [{ measure: "hold_seconds", target: 30, sets: 2 }] };
    expect(sessionDurationSec([block, small], { restBetweenBlocksSec: 120 })).toBe(825);
    expect(sessionDurationSec([])).toBe(0);
  });

  it("six typical blocks land in the usual 40–60 min (design.md §4, common practice, no source)", () => {
    const minutes = sessionDurationSec(Array.from({ length: 6 }, () => block), { restBetweenBlocksSec: 30 }) / 60;
    // 6 × 555 s + 5 × 30 s = 3480 s = 58 min.
    expect(minutes).toBe(58);
    expect(minutes).toBeGreaterThanOrEqual(40);
    expect(minutes).toBeLessThanOrEqual(60);
  });
});
