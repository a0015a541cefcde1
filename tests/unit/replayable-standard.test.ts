// When the rung editor may replay the standard being typed: only when the form itself would accept
// it (our own rule, so the table never shows a standard that could not be saved).
import { describe, expect, it } from "vitest";
import { defaultStandard } from "@/lib/engine";
import { replayableStandard } from "@/lib/validation/backtest";

describe("replayableStandard", () => {
  it("passes a complete standard through, step-down rule included", () => {
    const standard = defaultStandard("reps");
    expect(replayableStandard("reps", standard)).toEqual(standard);
  });

  it("is null while a number is missing, half typed or out of range", () => {
    expect(replayableStandard("reps", { ...defaultStandard("reps"), minValue: undefined })).toBeNull();
    expect(replayableStandard("reps", { ...defaultStandard("reps"), sets: 2.5 })).toBeNull();
    expect(replayableStandard("reps", { ...defaultStandard("reps"), sessionsRequired: 4, sessionsWindow: 3 })).toBeNull();
    expect(replayableStandard("reps", { ...defaultStandard("reps"), maxRpe: 7, minRir: 3 })).toBeNull();
  });

  it("applies the per-measure limit the form applies: 300 reps is a typo, a 300 s hold is not", () => {
    expect(replayableStandard("reps", { ...defaultStandard("reps"), minValue: 300 })).toBeNull();
    expect(replayableStandard("hold_seconds", { ...defaultStandard("hold_seconds"), minValue: 300 })?.minValue).toBe(300);
  });
});
