/** Ordinary least-squares line y = intercept + slope·x, from centred sums for numerical stability. */
export interface LinearFit {
  slope: number;
  intercept: number;
  n: number;
}

/** Null when fewer than 2 points or all x are equal (no line is defined). */
export function leastSquares(xs: readonly number[], ys: readonly number[]): LinearFit | null {
  const n = Math.min(xs.length, ys.length);
  if (n < 2) return null;
  let sumX = 0;
  let sumY = 0;
  for (let i = 0; i < n; i += 1) {
    sumX += xs[i] as number;
    sumY += ys[i] as number;
  }
  const meanX = sumX / n;
  const meanY = sumY / n;
  let sxx = 0;
  let sxy = 0;
  for (let i = 0; i < n; i += 1) {
    const dx = (xs[i] as number) - meanX;
    sxx += dx * dx;
    sxy += dx * ((ys[i] as number) - meanY);
  }
  if (sxx === 0) return null;
  const slope = sxy / sxx;
  return { slope, intercept: meanY - slope * meanX, n };
}
