// Distribution of the daily clearness index KT within a month of mean K̄T, after Bendt,
// Collares-Pereira & Rabl (1981), as given in Duffie & Beckman (5th ed.) §2.9, Eqs. 2.9.4–2.9.6:
//   F(KT) = (e^{γ·KT,min} − e^{γ·KT}) / (e^{γ·KT,min} − e^{γ·KT,max})     (fraction of days with less than KT)
//   KT,min = 0.05,   KT,max = 0.6313 + 0.267·K̄T − 11.9·(K̄T − 0.75)^8,
// i.e. a density proportional to e^{γ·KT} between the two bounds, with γ set so that its mean is K̄T.
// (A density with an extra (KT,max − KT)/KT,max factor is, from memory, Hollands & Huget's (1983) form,
// not this one.) γ is solved here numerically from the mean; D&B's explicit fit for γ (Eq. 2.9.6) is
// kept as a cross-check in the tests.

export const KT_MIN = 0.05;
/**
 * Below this monthly mean (twilight months near the polar night) the KT,max fit falls towards KT,min
 * and the form loses meaning; such months, and any month whose mean is within 0.02 of KT,max, get
 * every day at the mean (a stated simplification: they carry little or no energy).
 */
export const MIN_DISTRIBUTED_MEAN_KT = 0.1;

export interface ClearnessDistribution {
  meanClearnessIndex: number;
  ktMin: number;
  ktMax: number;
  gamma: number;
  /** True when every day is held at the mean (see MIN_DISTRIBUTED_MEAN_KT). */
  constant: boolean;
}

/** Bendt et al. (1981) upper bound of the daily clearness index for a monthly mean. */
export function bendtKtMax(meanClearnessIndex: number): number {
  return 0.6313 + 0.267 * meanClearnessIndex - 11.9 * (meanClearnessIndex - 0.75) ** 8;
}

/** Mean of a density ∝ e^{t·x} on [0, 1]: 1/(1 − e^{−t}) − 1/t, with its series near t = 0. */
function unitExponentialMean(t: number): number {
  if (Math.abs(t) < 1e-4) return 0.5 + t / 12;
  return -1 / Math.expm1(-t) - 1 / t;
}

/** Mean daily clearness index of the distribution for a given γ. */
export function distributionMean(gamma: number, ktMin: number, ktMax: number): number {
  const width = ktMax - ktMin;
  return ktMin + width * unitExponentialMean(gamma * width);
}

/** The distribution for a month (a constant one outside the range where the form applies). */
export function clearnessDistribution(meanClearnessIndex: number): ClearnessDistribution {
  const ktMax = bendtKtMax(meanClearnessIndex);
  if (!(meanClearnessIndex >= MIN_DISTRIBUTED_MEAN_KT && meanClearnessIndex <= ktMax - 0.02)) {
    return { meanClearnessIndex, ktMin: meanClearnessIndex, ktMax: meanClearnessIndex, gamma: 0, constant: true };
  }
  const target = meanClearnessIndex;
  // distributionMean rises monotonically with γ: bisection is safe and quick (60 halvings → 1e-16).
  let low = -400;
  let high = 400;
  for (let i = 0; i < 60; i++) {
    const mid = (low + high) / 2;
    if (distributionMean(mid, KT_MIN, ktMax) < target) low = mid;
    else high = mid;
  }
  return { meanClearnessIndex, ktMin: KT_MIN, ktMax, gamma: (low + high) / 2, constant: false };
}

/** Fraction of days clearer than nothing up to kt: F(kt). */
export function clearnessCdf(distribution: ClearnessDistribution, kt: number): number {
  const { ktMin, ktMax, gamma } = distribution;
  if (distribution.constant) return kt < ktMin ? 0 : 1;
  if (kt <= ktMin) return 0;
  if (kt >= ktMax) return 1;
  const width = ktMax - ktMin;
  const t = gamma * width;
  const x = (kt - ktMin) / width;
  if (Math.abs(t) < 1e-9) return x;
  return Math.expm1(t * x) / Math.expm1(t);
}

/** Inverse of F: the daily clearness index at cumulative probability u ∈ [0, 1]. */
export function clearnessQuantile(distribution: ClearnessDistribution, u: number): number {
  const { ktMin, ktMax, gamma } = distribution;
  if (distribution.constant) return ktMin;
  const width = ktMax - ktMin;
  const t = gamma * width;
  const x = Math.abs(t) < 1e-9 ? u : Math.log1p(u * Math.expm1(t)) / t;
  return ktMin + width * Math.min(1, Math.max(0, x));
}

/** Duffie & Beckman Eq. 2.9.6: their explicit approximation of γ (used only as a cross-check). */
export function duffieBeckmanGamma(meanClearnessIndex: number): number {
  const ktMax = bendtKtMax(meanClearnessIndex);
  const zeta = (ktMax - KT_MIN) / (ktMax - meanClearnessIndex);
  return -1.498 + (1.184 * zeta - 27.182 * Math.exp(-1.5 * zeta)) / (ktMax - KT_MIN);
}
