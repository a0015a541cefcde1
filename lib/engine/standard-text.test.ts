import { describe, expect, it } from "vitest";
import { defaultStandard } from "./defaults";
import { formatValue } from "./format-value";
import { describeStandard } from "./standard-text";
import type { Measure, Standard } from "./types";

// Wording is our own (design.md §3/§4); thresholds are design.md §4 defaults (common practice, no source).
describe("describeStandard", () => {
  it.each<[Measure, Partial<Standard>, string]>([
    ["hold_seconds", {}, "3 sets of at least 20 s at RPE 7 or easier, in 2 of the last 3 sessions, at least 7 days on this rung, pain-free"],
    ["reps", { minValue: 8 }, "3 sets of at least 8 reps at RPE 7 or easier, in 2 of the last 3 sessions, at least 7 days on this rung, pain-free"],
    ["hold_seconds_each_side", { minValue: 20 }, "3 sets of at least 20 s each side at RPE 7 or easier, in 2 of the last 3 sessions, at least 7 days on this rung, pain-free"],
    ["eccentric_seconds", { minValue: 5, minReps: 3 }, "3 sets of 3 lowerings of at least 5 s at RPE 7 or easier, in 2 of the last 3 sessions, at least 7 days on this rung, pain-free"],
    ["distance_m", { minValue: 10 }, "3 sets of at least 10 m at RPE 7 or easier, in 2 of the last 3 sessions, at least 7 days on this rung, pain-free"],
    ["hold_seconds", { maxRpe: null, minRir: 3 }, "3 sets of at least 20 s with at least 3 reps in reserve, in 2 of the last 3 sessions, at least 7 days on this rung, pain-free"],
    ["hold_seconds", { maxRpe: null, sets: 1, sessionsRequired: 1, sessionsWindow: 1, minDaysOnRung: 1, painFree: false }, "1 set of at least 20 s, in the latest session, at least 1 day on this rung"],
    ["hold_seconds", { sessionsRequired: 3, sessionsWindow: 3, minDaysOnRung: 0 }, "3 sets of at least 20 s at RPE 7 or easier, in each of the last 3 sessions, pain-free"],
  ])("%s %o", (measure, overrides, expected) => {
    expect(describeStandard(measure, { ...defaultStandard(measure), ...overrides })).toBe(expected);
  });
});

describe("formatValue", () => {
  it.each<[Measure, number, string]>([
    ["hold_seconds", 20, "20 s"],
    ["hold_seconds", 12.46, "12.5 s"],
    ["reps", 1, "1 rep"],
    ["reps", 8, "8 reps"],
    ["reps_each_side", 6, "6 reps each side"],
    ["hold_seconds_each_side", 15, "15 s each side"],
    ["eccentric_seconds", 5, "5 s"],
    ["distance_m", 10, "10 m"],
  ])("%s %d → %s", (measure, value, expected) => {
    expect(formatValue(measure, value)).toBe(expected);
  });
});
