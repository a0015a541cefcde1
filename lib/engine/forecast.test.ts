import { describe, expect, it } from "vitest";
import { forecast } from "./forecast";

// Slopes below are worked by hand from the least-squares formulas (slope = Sxy / Sxx); the fit
// itself is checked against Montgomery & Runger Example 11-1 in linear-trend.test.ts.
describe("forecast", () => {
  it("projects an exact line: 10, 12, 14 s on days 0, 2, 4 → 1 s/day, 20 s on day 10", () => {
    const result = forecast({
      points: [
        { date: "2026-03-05", best: 14 },
        { date: "2026-03-01", best: 10 },
        { date: "2026-03-03", best: 12 },
      ],
      target: 20,
      asOfDate: "2026-03-05",
    });
    expect(result).toEqual({ estimate: "2026-03-11", slopePerDay: 1, reason: "trending_up" });
  });

  it("projects a noisy series: days 0, 1, 3, 6 → slope 5/6, intercept 32/3, 20 s at day 11.2 → day 12", () => {
    // By hand: x̄ = 2.5, ȳ = 12.75, Sxx = 21, Sxy = 17.5; (20 − 32/3) / (5/6) = 11.2.
    const result = forecast({
      points: [
        { date: "2026-03-01", best: 10 },
        { date: "2026-03-02", best: 13 },
        { date: "2026-03-04", best: 12 },
        { date: "2026-03-07", best: 16 },
      ],
      target: 20,
      asOfDate: "2026-03-07",
    });
    expect(result.reason).toBe("trending_up");
    expect(result.slopePerDay).toBeCloseTo(5 / 6, 12);
    expect(result.estimate).toBe("2026-03-13");
  });

  it.each([
    ["two sessions are too few", [10, 12], 20, "too_few_sessions", null],
    ["flat is not trending up", [12, 12, 12], 20, "not_trending_up", 0],
    ["falling is not trending up", [14, 12, 10], 20, "not_trending_up", -1],
    ["latest at target is already met", [14, 16, 20], 20, "already_met", 1.5],
    ["already met even with few sessions", [21], 20, "already_met", null],
  ])("%s", (_label, bests, target, reason, slope) => {
    const points = bests.map((best, i) => ({ date: `2026-03-0${1 + 2 * i}`, best }));
    const result = forecast({ points, target, asOfDate: "2026-03-09" });
    expect(result.reason).toBe(reason);
    expect(result.estimate).toBeNull();
    if (slope === null) expect(result.slopePerDay).toBeNull();
    else expect(result.slopePerDay).toBeCloseTo(slope, 12);
  });

  it("never estimates a date before asOfDate, and gives none beyond the horizon", () => {
    // By hand: x̄ = 2, ȳ = 18, Sxx = 8, Sxy = 18 → 13.5 + 2.25·day reaches 20 on day 2.9 (03-04),
    // before asOfDate, while the latest session (day 4) was only 19.
    const crossed = forecast({
      points: [
        { date: "2026-03-01", best: 10 },
        { date: "2026-03-03", best: 25 },
        { date: "2026-03-05", best: 19 },
      ],
      target: 20,
      asOfDate: "2026-03-06",
    });
    expect(crossed).toMatchObject({ estimate: "2026-03-06", reason: "trending_up" });
    const slow = forecast({
      points: [
        { date: "2026-03-01", best: 10 },
        { date: "2026-03-11", best: 10.1 },
        { date: "2026-03-21", best: 10.2 },
      ],
      target: 60,
      asOfDate: "2026-03-21",
    });
    expect(slow).toMatchObject({ estimate: null, reason: "trending_up" });
  });

  it("ignores points after asOfDate", () => {
    const result = forecast({
      points: [
        { date: "2026-03-01", best: 10 },
        { date: "2026-03-02", best: 11 },
        { date: "2026-03-09", best: 30 },
      ],
      target: 20,
      asOfDate: "2026-03-05",
    });
    expect(result.reason).toBe("too_few_sessions");
  });
});
