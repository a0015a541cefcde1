import { describe, expect, it } from "vitest";
import { ewmaAcwr, ewmaSeries, rollingAcwr, rollingAcwrFromWeeks, sessionLoad, weekly, WEEKLY_SD_KIND } from "./load";

describe("sessionLoad", () => {
  it("RPE 7 × 60 min = 420 AU (Foster et al. 2001, J Strength Cond Res 15(1):109–115)", () => {
    expect(sessionLoad(7, 60)).toBe(420);
  });
});

describe("weekly monotony and strain", () => {
  it("matches Foster 1998 (Med Sci Sports Exerc 30(7):1164–1168) with the population SD", () => {
    // Worked figures from design.md §8: sum 1800, population SD 204.2907, monotony 1.2587, strain 2265.68.
    const week = weekly([300, 0, 450, 250, 0, 600, 200]);
    expect(WEEKLY_SD_KIND).toBe("population");
    expect(week.total).toBe(1800);
    expect(week.mean).toBeCloseTo(257.142857, 6);
    expect(week.sd).toBeCloseTo(204.2907, 4);
    expect(week.monotony).toBeCloseTo(1.2587, 4);
    expect(week.strain).toBeCloseTo(2265.68, 2);
    // The sample SD (220.6592 → monotony 1.1653) is NOT what we report.
    expect(week.monotony).not.toBeCloseTo(1.1653, 2);
  });

  it("SD 0 → monotony and strain undefined (null), not infinity (Foster 1998: monotony = mean / SD)", () => {
    expect(weekly([300, 300, 300, 300, 300, 300, 300])).toMatchObject({ total: 2100, sd: 0, monotony: null, strain: null });
    expect(weekly([0, 0, 0, 0, 0, 0, 0])).toMatchObject({ monotony: null, strain: null });
  });

  it("rejects anything but 7 days", () => {
    expect(() => weekly([1, 2, 3])).toThrow(RangeError);
  });
});

describe("rolling acute:chronic (Hulin et al. 2014, Br J Sports Med 48(8):708–712)", () => {
  it("weeks 1500, 1600, 1700, 2400 → coupled 1.3333, uncoupled 1.5", () => {
    const result = rollingAcwrFromWeeks([1500, 1600, 1700, 2400]);
    expect(result?.coupled).toBeCloseTo(2400 / 1800, 4);
    expect(result?.coupled).toBeCloseTo(1.3333, 4);
    expect(result?.uncoupled).toBeCloseTo(1.5, 10);
  });

  it("gives the same ratios from daily loads, however each week's load is spread", () => {
    // Hulin et al. 2014 weekly totals spread over days: 1500 = 300×5, 1600 = 800×2, 1700 in one day, 2400 = 400×6.
    const days = [300, 300, 300, 300, 300, 0, 0, 800, 0, 800, 0, 0, 0, 0, 0, 0, 1700, 0, 0, 0, 0, 400, 400, 400, 0, 400, 400, 400];
    const result = rollingAcwr(days);
    expect(result?.acute).toBe(2400);
    expect(result?.chronicCoupled).toBe(1800);
    expect(result?.coupled).toBeCloseTo(1.3333, 4);
    expect(result?.uncoupled).toBeCloseTo(1.5, 10);
    // Older days before the 28-day window do not count.
    expect(rollingAcwr([5000, 5000, ...days])?.coupled).toBeCloseTo(1.3333, 4);
  });

  it("returns no ratio before 28 days of history, or before a higher minimum (common practice, no source)", () => {
    expect(rollingAcwr(new Array<number>(27).fill(100))).toBeNull();
    expect(rollingAcwr(new Array<number>(28).fill(100))?.coupled).toBe(1);
    expect(rollingAcwr(new Array<number>(28).fill(100), { minDaysOfHistory: 35 })).toBeNull();
    expect(rollingAcwrFromWeeks([100, 200, 300])).toBeNull();
  });

  it("a chronic load of 0 gives no ratio rather than infinity", () => {
    expect(rollingAcwrFromWeeks([0, 0, 0, 500])).toMatchObject({ coupled: 4, uncoupled: null });
  });
});

describe("EWMA acute:chronic (Williams et al. 2017, Br J Sports Med 51(3):209–210)", () => {
  it("loads [100, 200, 0, 300, 150] → day 5 acute 146.484375, chronic 115.877848, ratio 1.264128", () => {
    const result = ewmaAcwr([100, 200, 0, 300, 150], { minDaysOfHistory: 5 });
    expect(result?.acute).toBeCloseTo(146.484375, 6);
    expect(result?.chronic).toBeCloseTo(115.877848, 6);
    expect(result?.ratio).toBeCloseTo(1.264128, 6);
  });

  it("seeds with day 1 and uses λ = 2/(N+1): N = 7 → λ = 0.25 (Williams et al. 2017)", () => {
    // By hand: 100; 0.25·200 + 0.75·100 = 125; 0.75·125 = 93.75.
    expect(ewmaSeries([100, 200, 0], 7)).toEqual([100, 125, 93.75]);
  });

  it("withholds the ratio before 28 days by default", () => {
    expect(ewmaAcwr([100, 200, 0, 300, 150])?.ratio).toBeNull();
    expect(ewmaAcwr([])).toBeNull();
  });
});
