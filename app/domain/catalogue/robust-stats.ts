// Robust statistics for field readings: a few bad readings (wrong units, a shaded cell, a cloud
// during the sweep) must not drag a module's verified power. Median and median absolute deviation
// (MAD), scaled by 1.4826 so that it estimates the standard deviation of normal data
// (Rousseeuw & Croux 1993; the factor is 1/Φ⁻¹(3/4)).
export const MAD_TO_SIGMA = 1.4826;

export function median(values: readonly number[]): number {
  if (values.length === 0) throw new Error("median of no values");
  const sorted = [...values].sort((a, b) => a - b);
  const mid = Math.floor(sorted.length / 2);
  return sorted.length % 2 ? sorted[mid] : (sorted[mid - 1] + sorted[mid]) / 2;
}

/** Weighted median: the value where the cumulative weight first reaches half the total. */
export function weightedMedian(values: readonly number[], weights: readonly number[]): number {
  if (values.length === 0) throw new Error("weighted median of no values");
  const pairs = values.map((v, i) => [v, Math.max(0, weights[i] ?? 1)] as const).sort((a, b) => a[0] - b[0]);
  const total = pairs.reduce((s, [, w]) => s + w, 0);
  if (total === 0) return median(values);
  let cumulative = 0;
  for (let i = 0; i < pairs.length; i++) {
    cumulative += pairs[i][1];
    if (cumulative > total / 2) return pairs[i][0];
    // Exactly half: average with the next value, as the unweighted median does.
    if (cumulative === total / 2) return (pairs[i][0] + pairs[i + 1][0]) / 2;
  }
  return pairs[pairs.length - 1][0];
}

/** Median absolute deviation, scaled to estimate σ. */
export function scaledMad(values: readonly number[]): number {
  const m = median(values);
  return MAD_TO_SIGMA * median(values.map((v) => Math.abs(v - m)));
}

/**
 * Robust z-score of `value` against `reference` (e.g. a module's approved STC readings):
 * (value − median) / scaled MAD. Null when there are fewer than 3 references or no spread, since
 * a score from so little evidence would mislead the curator. |z| > 3.5 is the usual outlier mark
 * (Iglewicz & Hoaglin 1993).
 */
export function robustZScore(value: number, reference: readonly number[]): number | null {
  if (reference.length < 3) return null;
  const spread = scaledMad(reference);
  if (spread === 0) return null;
  return (value - median(reference)) / spread;
}

export const OUTLIER_Z = 3.5;
