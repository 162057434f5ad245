// A year of daily clearness indices, drawn month by month from the Bendt et al. (1981) distribution
// (daily-clearness.ts) with a seeded generator, so the same seed always gives the same year.
// Day-to-day persistence: cloudy spells matter for batteries, and independent draws would make them too
// rare. Each day's probability u = Φ(z) comes from a first-order autoregressive normal series
// z_d = ρ·z_{d−1} + √(1 − ρ²)·ε_d (a Gaussian copula): every day still follows the month's distribution
// exactly, while neighbouring days are alike. ρ = 0 gives independent days.
import { clearnessDistribution, clearnessQuantile } from "./daily-clearness";
import type { ClearnessDistribution } from "./daily-clearness";
import { mulberry32, normalSource, standardNormalCdf } from "./random";
import { DAYS_IN_MONTH } from "../solar/module-yield";

export { DAYS_IN_MONTH };
export const DAYS_IN_YEAR = 365;
/**
 * Correlation of neighbouring days in the latent normal series. From memory: measured lag-one
 * autocorrelations of the daily clearness index are typically about 0.2–0.4; 0.3 is taken.
 */
export const DEFAULT_DAY_TO_DAY_CORRELATION = 0.3;
export const DEFAULT_WEATHER_SEED = 20260101;

/** Month (1–12) of each day of a 365-day year. */
export function monthOfDay(): Uint8Array {
  const months = new Uint8Array(DAYS_IN_YEAR);
  let day = 0;
  DAYS_IN_MONTH.forEach((count, index) => {
    for (let i = 0; i < count; i++) months[day++] = index + 1;
  });
  return months;
}

export interface WeatherYear {
  /** Daily clearness index, 365 days from 1 January. */
  clearnessIndex: Float64Array;
  distributions: ClearnessDistribution[];
}

export function drawWeatherYear(
  monthlyClearnessIndex: readonly number[],
  seed = DEFAULT_WEATHER_SEED,
  correlation = DEFAULT_DAY_TO_DAY_CORRELATION,
): WeatherYear {
  if (monthlyClearnessIndex.length !== 12) throw new RangeError("the weather year needs 12 monthly clearness indices");
  if (!(correlation >= 0 && correlation < 1)) throw new RangeError("day-to-day correlation must be in [0, 1)");
  const distributions = monthlyClearnessIndex.map((kt) => clearnessDistribution(kt));
  const normal = normalSource(mulberry32(seed));
  const innovationScale = Math.sqrt(1 - correlation * correlation);
  const clearnessIndex = new Float64Array(DAYS_IN_YEAR);
  const months = monthOfDay();
  let z = normal();
  for (let day = 0; day < DAYS_IN_YEAR; day++) {
    if (day > 0) z = correlation * z + innovationScale * normal();
    clearnessIndex[day] = clearnessQuantile(distributions[months[day] - 1], standardNormalCdf(z));
  }
  return { clearnessIndex, distributions };
}
