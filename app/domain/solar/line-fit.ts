// Ordinary least-squares straight line, used to extrapolate a load sweep to its ends.

export interface Line {
  slope: number;
  intercept: number;
}

export function fitLine(xs: readonly number[], ys: readonly number[]): Line {
  const n = xs.length;
  if (n < 2 || ys.length !== n) throw new RangeError("a line needs at least two (x, y) pairs");
  let sumX = 0;
  let sumY = 0;
  for (let i = 0; i < n; i++) {
    sumX += xs[i];
    sumY += ys[i];
  }
  const meanX = sumX / n;
  const meanY = sumY / n;
  let sxx = 0;
  let sxy = 0;
  for (let i = 0; i < n; i++) {
    sxx += (xs[i] - meanX) ** 2;
    sxy += (xs[i] - meanX) * (ys[i] - meanY);
  }
  const slope = sxx > 0 ? sxy / sxx : 0;
  return { slope, intercept: meanY - slope * meanX };
}
