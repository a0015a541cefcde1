import { describe, expect, it } from "vitest";
import { blockWarnings, estimateBlockSec, estimateSessionSec, formatDuration, REST_BETWEEN_BLOCKS_SEC } from "@/lib/training/block-estimate";

const hold = { name: "Tuck hold", measure: "hold_seconds" as const, target: 20, lowerings: null, tags: ["core" as const] };
const lowering = { name: "Slow lowering", measure: "eccentric_seconds" as const, target: 5, lowerings: 3, tags: [] };

describe("block estimate adapter", () => {
  it("reads eccentric lowerings and counts a ladder without rungs as rest only", () => {
    // lib/engine/duration.ts pace (common practice, no source): a lowering is its seconds + 2 s set-up.
    //   1 round: hold 20 s + 30 s rest + 3 × (5 + 2) = 21 s → 71 s
    expect(estimateBlockSec({ rounds: 1, restBetweenSlotsSec: 30, restBetweenRoundsSec: 90, slots: [{ rung: hold }, { rung: lowering }] })).toBe(71);
    //   a slot with no live rung: 20 s + 30 s + 0 s = 50 s
    expect(estimateBlockSec({ rounds: 1, restBetweenSlotsSec: 30, restBetweenRoundsSec: 90, slots: [{ rung: hold }, { rung: null }] })).toBe(50);
    expect(blockWarnings({ rounds: 2, restBetweenSlotsSec: 30, restBetweenRoundsSec: 90, slots: [{ rung: hold }, { rung: null }] })).toEqual([]);
  });

  it("adds one change-over between the blocks of a day", () => {
    const block = { rounds: 1, restBetweenSlotsSec: 30, restBetweenRoundsSec: 90, slots: [{ rung: hold }, { rung: lowering }] };
    expect(estimateSessionSec([block, block])).toBe(71 + REST_BETWEEN_BLOCKS_SEC + 71);
    expect(estimateSessionSec([])).toBe(0);
  });

  it("formats seconds for people", () => {
    expect(formatDuration(45)).toBe("45 s");
    expect(formatDuration(600)).toBe("10 min");
    expect(formatDuration(89)).toBe("1 min");
    expect(formatDuration(3900)).toBe("1 h 05 min");
  });
});
