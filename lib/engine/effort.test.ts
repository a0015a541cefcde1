import { describe, expect, it } from "vitest";
import { effortOk, rirFromRpe, rpeFromRir, setRpe } from "./effort";

describe("RIR ↔ RPE", () => {
  // Zourdos et al. 2016, J Strength Cond Res 30(1):267–275, RIR-based RPE scale table.
  it.each([
    [10, 0],
    [9, 1],
    [8, 2],
    [7, 3],
  ])("RPE %i ↔ %i RIR (Zourdos et al. 2016)", (rpe, rir) => {
    expect(rpeFromRir(rir)).toBe(rpe);
    expect(rirFromRpe(rpe)).toBe(rir);
  });

  it("round-trips any value (rpe = 10 − rir, Zourdos et al. 2016)", () => {
    for (let rpe = 1; rpe <= 10; rpe += 0.5) expect(rpeFromRir(rirFromRpe(rpe))).toBe(rpe);
  });
});

describe("setRpe", () => {
  it("reads RPE, converts RIR, and takes the harder reading when both disagree", () => {
    expect(setRpe({ rpe: 6 })).toBe(6);
    expect(setRpe({ rir: 3 })).toBe(7); // Zourdos et al. 2016: 3 RIR = RPE 7
    expect(setRpe({ rpe: 6, rir: 2 })).toBe(8); // RIR 2 = RPE 8 (Zourdos et al. 2016) is the harder one
    expect(setRpe({})).toBeNull();
  });
});

describe("effortOk", () => {
  // Ceiling numbers are the design.md §4 default (common practice, no source); conversions are
  // Zourdos et al. 2016.
  const rpeCeiling = { maxRpe: 7 };
  const rirFloor = { minRir: 3 };
  it.each([
    ["RPE 7 at ceiling RPE 7", { rpe: 7 }, rpeCeiling, true],
    ["RPE 7.5 over ceiling RPE 7", { rpe: 7.5 }, rpeCeiling, false],
    ["3 RIR = RPE 7 under ceiling RPE 7", { rir: 3 }, rpeCeiling, true],
    ["2 RIR = RPE 8 over ceiling RPE 7", { rir: 2 }, rpeCeiling, false],
    ["RPE 7 = 3 RIR meets ≥ 3 RIR", { rpe: 7 }, rirFloor, true],
    ["RPE 8 = 2 RIR misses ≥ 3 RIR", { rpe: 8 }, rirFloor, false],
    ["4 RIR meets ≥ 3 RIR", { rir: 4 }, rirFloor, true],
    ["no effort recorded is not held against the athlete", {}, rpeCeiling, true],
    ["no ceiling on the standard", { rpe: 10 }, {}, true],
    ["both ceilings: RPE 7 passes both", { rpe: 7 }, { maxRpe: 7, minRir: 3 }, true],
    ["both ceilings: stricter RIR floor decides", { rpe: 7 }, { maxRpe: 8, minRir: 4 }, false],
  ])("%s", (_label, set, standard, expected) => {
    expect(effortOk(set, standard)).toBe(expected);
  });
});
