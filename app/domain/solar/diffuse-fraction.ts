// Diffuse fraction correlations of Erbs, Klein & Duffie (1982), as given in Duffie & Beckman
// (§2.10 hourly, §2.12 monthly mean daily).
import { clamp } from "./angles";

/** Range of K̄T over which Erbs et al. fitted the monthly correlation. */
export const ERBS_MONTHLY_KT_MIN = 0.3;
export const ERBS_MONTHLY_KT_MAX = 0.8;

/**
 * Monthly mean daily diffuse fraction H̄d/H̄ from the monthly clearness index K̄T and the
 * sunset hour angle of the average day (Erbs et al. 1982):
 *   ωs ≤ 81.4°: 1.391 − 3.560 K̄T + 4.189 K̄T² − 2.137 K̄T³
 *   ωs > 81.4°: 1.311 − 3.022 K̄T + 3.427 K̄T² − 1.821 K̄T³
 * K̄T is held inside the fitted range 0.3–0.8 so the cubic never runs away outside its data.
 */
export function erbsMonthlyDiffuseFraction(clearnessIndex: number, sunsetHourAngleDeg: number): number {
  const kt = clamp(clearnessIndex, ERBS_MONTHLY_KT_MIN, ERBS_MONTHLY_KT_MAX);
  const fraction = sunsetHourAngleDeg <= 81.4 ? 1.391 - 3.56 * kt + 4.189 * kt ** 2 - 2.137 * kt ** 3 : 1.311 - 3.022 * kt + 3.427 * kt ** 2 - 1.821 * kt ** 3;
  return clamp(fraction, 0, 1);
}

/**
 * Hourly diffuse fraction I_d/I from the hourly clearness index k_T (Erbs et al. 1982):
 *   k_T ≤ 0.22: 1 − 0.09 k_T
 *   0.22 < k_T ≤ 0.80: 0.9511 − 0.1604 k_T + 4.388 k_T² − 16.638 k_T³ + 12.336 k_T⁴
 *   k_T > 0.80: 0.165
 */
export function erbsHourlyDiffuseFraction(hourlyClearnessIndex: number): number {
  const kt = Math.max(0, hourlyClearnessIndex);
  if (kt <= 0.22) return 1 - 0.09 * kt;
  if (kt <= 0.8) {
    return 0.9511 - 0.1604 * kt + 4.388 * kt ** 2 - 16.638 * kt ** 3 + 12.336 * kt ** 4;
  }
  return 0.165;
}
