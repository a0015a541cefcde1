import { describe, expect, it } from "vitest";
import { DEFAULT_STEP_DOWN, defaultStandard } from "./defaults";
import { MEASURES } from "./types";

describe("default standards (design.md §4; common practice, no source)", () => {
  it("hold rung: 3 sets ≥ 20 s at ≤ RPE 7, 2 of the last 3 sessions, ≥ 7 days, pain-free", () => {
    // common practice, no source
    expect(defaultStandard("hold_seconds")).toMatchObject({
      sets: 3,
      minValue: 20,
      maxRpe: 7,
      sessionsRequired: 2,
      sessionsWindow: 3,
      minDaysOnRung: 7,
      painFree: true,
    });
  });

  it("rep rung 3 × 8 and eccentric rung 3 × 3 lowerings of ≥ 5 s", () => {
    // common practice, no source
    expect(defaultStandard("reps")).toMatchObject({ sets: 3, minValue: 8 });
    expect(defaultStandard("eccentric_seconds")).toMatchObject({ sets: 3, minValue: 5, minReps: 3 });
  });

  it("step-down default: pain in 2 of 3, or 2 sessions under 70 %", () => {
    // common practice, no source
    expect(DEFAULT_STEP_DOWN).toEqual({ painSessions: 2, painWindow: 3, dropBelowPct: 70, dropSessions: 2 });
  });

  it("every measure has a positive, pain-free default and its own step-down copy", () => {
    for (const measure of MEASURES) {
      const standard = defaultStandard(measure);
      expect(standard.minValue).toBeGreaterThan(0);
      expect(standard.painFree).toBe(true);
      expect(standard.stepDown).not.toBe(DEFAULT_STEP_DOWN);
    }
  });
});
