import { describe, expect, it } from "vitest";
import { leastSquares } from "./linear-trend";

describe("leastSquares", () => {
  it("reproduces Montgomery & Runger, Applied Statistics and Probability for Engineers (3rd ed.), Example 11-1", () => {
    // Table 11-1: hydrocarbon level x (%) and oxygen purity y (%), n = 20. The book reports
    // Sxx = 0.68088, Sxy = 10.17744, slope 14.94748 and intercept 74.28331 (p. 378).
    const x = [0.99, 1.02, 1.15, 1.29, 1.46, 1.36, 0.87, 1.23, 1.55, 1.4, 1.19, 1.15, 0.98, 1.01, 1.11, 1.2, 1.26, 1.32, 1.43, 0.95];
    const y = [90.01, 89.05, 91.43, 93.74, 96.73, 94.45, 87.59, 91.77, 99.42, 93.65, 93.54, 92.52, 90.56, 89.54, 89.85, 90.39, 93.25, 93.41, 94.98, 87.33];
    const fit = leastSquares(x, y);
    expect(fit?.slope).toBeCloseTo(14.94748, 5);
    expect(fit?.intercept).toBeCloseTo(74.28331, 5);
    expect(fit?.n).toBe(20);
  });

  it("fits a hand-worked example", () => {
    // By hand: x̄ = 2.5, ȳ = 12.75, Sxx = 21, Sxy = 17.5 → slope 5/6, intercept 12.75 − 2.5·5/6 = 32/3.
    const fit = leastSquares([0, 1, 3, 6], [10, 13, 12, 16]);
    expect(fit?.slope).toBeCloseTo(5 / 6, 12);
    expect(fit?.intercept).toBeCloseTo(32 / 3, 12);
  });

  it("has no line for one point or equal x", () => {
    expect(leastSquares([1], [2])).toBeNull();
    expect(leastSquares([3, 3, 3], [1, 2, 3])).toBeNull();
  });
});
