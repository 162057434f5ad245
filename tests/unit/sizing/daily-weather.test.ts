import { describe, expect, it } from "vitest";
import {
  bendtKtMax,
  clearnessCdf,
  clearnessDistribution,
  clearnessQuantile,
  distributionMean,
  duffieBeckmanGamma,
  KT_MIN,
} from "~/domain/sizing/daily-clearness";
import { erbsDailyDiffuseFraction } from "~/domain/sizing/day-irradiance";
import { erbsMonthlyDiffuseFraction } from "~/domain/solar/diffuse-fraction";
import { mulberry32, standardNormalCdf } from "~/domain/sizing/random";
import { DAYS_IN_MONTH, drawWeatherYear, monthOfDay } from "~/domain/sizing/weather-year";

const MONTHLY_KT = [0.42, 0.48, 0.5, 0.52, 0.55, 0.58, 0.6, 0.58, 0.55, 0.5, 0.4, 0.36];

describe("Bendt, Collares-Pereira & Rabl (1981) daily clearness distribution", () => {
  it("uses KT,min = 0.05 and KT,max = 0.6313 + 0.267·K̄T − 11.9·(K̄T − 0.75)^8 (D&B Eq. 2.9.5)", () => {
    expect(KT_MIN).toBe(0.05);
    expect(bendtKtMax(0.75)).toBeCloseTo(0.6313 + 0.267 * 0.75, 12);
    expect(bendtKtMax(0.5)).toBeCloseTo(0.6313 + 0.1335 - 11.9 * 0.25 ** 8, 12);
  });

  it("solves γ so the distribution's mean is K̄T, close to Duffie & Beckman's explicit γ (Eq. 2.9.6)", () => {
    for (const kt of [0.3, 0.4, 0.5, 0.6, 0.7]) {
      const d = clearnessDistribution(kt);
      expect(distributionMean(d.gamma, d.ktMin, d.ktMax), `K̄T ${kt}`).toBeCloseTo(kt, 9);
      // D&B's fit is an approximation of the same implicit equation: it lands within 0.2 of γ and its
      // mean within 0.003 of K̄T.
      const dbGamma = duffieBeckmanGamma(kt);
      expect(Math.abs(d.gamma - dbGamma), `γ at K̄T ${kt}`).toBeLessThan(0.2);
      expect(Math.abs(distributionMean(dbGamma, d.ktMin, d.ktMax) - kt)).toBeLessThan(0.003);
    }
  });

  it("holds every day at the mean where the fitted form does not apply (twilight months)", () => {
    // KT,max at K̄T = 0.05 is 0.6313 + 0.01335 − 11.9 × 0.7^8 < KT,min: no distribution exists there.
    expect(bendtKtMax(0.05)).toBeLessThan(KT_MIN);
    const dim = clearnessDistribution(0.05);
    expect(dim.constant).toBe(true);
    expect(clearnessQuantile(dim, 0.9)).toBe(0.05);
    expect(clearnessDistribution(0.1).constant).toBe(false);
  });

  it("has the cumulative form (e^{γKT,min} − e^{γKT})/(e^{γKT,min} − e^{γKT,max}) and inverts it", () => {
    const d = clearnessDistribution(0.55);
    const kt = 0.6;
    const direct = (Math.exp(d.gamma * d.ktMin) - Math.exp(d.gamma * kt)) / (Math.exp(d.gamma * d.ktMin) - Math.exp(d.gamma * d.ktMax));
    expect(clearnessCdf(d, kt)).toBeCloseTo(direct, 12);
    for (const u of [0, 0.01, 0.3, 0.5, 0.9, 0.999, 1]) expect(clearnessCdf(d, clearnessQuantile(d, u))).toBeCloseTo(u, 9);
    expect(clearnessQuantile(d, 0)).toBeCloseTo(d.ktMin, 12);
    expect(clearnessQuantile(d, 1)).toBeCloseTo(d.ktMax, 12);
  });

  it("Erbs et al.'s daily diffuse correlation, averaged over the distribution, lands near their monthly one (D&B Eqs. 2.11.1, 2.12.1)", () => {
    // Both were fitted to the same data; averaging H_d/H over the month's days should come within ~0.05.
    for (const omegaS of [70, 95]) {
      for (const kt of [0.3, 0.4, 0.5, 0.6, 0.7]) {
        const d = clearnessDistribution(kt);
        let diffuse = 0;
        const n = 1000;
        for (let i = 0; i < n; i++) {
          const day = clearnessQuantile(d, (i + 0.5) / n);
          diffuse += day * erbsDailyDiffuseFraction(day, omegaS);
        }
        expect(Math.abs(diffuse / n / kt - erbsMonthlyDiffuseFraction(kt, omegaS)), `ωs ${omegaS}, K̄T ${kt}`).toBeLessThan(0.05);
      }
    }
    // The first branch meets its constant at KT = 0.715 (a transcription check of the coefficients).
    expect(erbsDailyDiffuseFraction(0.7149999, 70)).toBeCloseTo(0.143, 2);
  });
});

describe("seeded weather year", () => {
  it("is repeatable for a seed and differs for another", () => {
    const a = drawWeatherYear(MONTHLY_KT, 42);
    const b = drawWeatherYear(MONTHLY_KT, 42);
    const c = drawWeatherYear(MONTHLY_KT, 43);
    expect(Array.from(a.clearnessIndex)).toEqual(Array.from(b.clearnessIndex));
    expect(Array.from(a.clearnessIndex)).not.toEqual(Array.from(c.clearnessIndex));
    expect(a.clearnessIndex.length).toBe(365);
    expect(DAYS_IN_MONTH.reduce((s, d) => s + d, 0)).toBe(365);
  });

  it("matches each month's mean clearness index: within 0.08 in one year, within 0.01 over 200 years", () => {
    // Day-to-day spread of KT is about 0.2; with persistence ρ = 0.3 about half the days count as independent,
    // so one month of one year has a standard error near 0.05 and 200 years near 0.004.
    const months = monthOfDay();
    const sums = new Array(12).fill(0);
    const counts = new Array(12).fill(0);
    for (let seed = 1; seed <= 200; seed++) {
      const year = drawWeatherYear(MONTHLY_KT, seed);
      const yearSums = new Array(12).fill(0);
      year.clearnessIndex.forEach((kt, day) => {
        sums[months[day] - 1] += kt;
        counts[months[day] - 1]++;
        yearSums[months[day] - 1] += kt;
      });
      if (seed === 1) yearSums.forEach((s, i) => expect(Math.abs(s / DAYS_IN_MONTH[i] - MONTHLY_KT[i]), `month ${i + 1}`).toBeLessThan(0.08));
    }
    sums.forEach((s, i) => expect(Math.abs(s / counts[i] - MONTHLY_KT[i]), `month ${i + 1}`).toBeLessThan(0.01));
  });

  it("gives neighbouring days alike with persistence, and independent days without", () => {
    function lagOneCorrelation(correlation: number): number {
      let sxy = 0,
        sx = 0,
        sy = 0,
        sxx = 0,
        syy = 0,
        n = 0;
      for (let seed = 1; seed <= 20; seed++) {
        const kt = drawWeatherYear(new Array(12).fill(0.5), seed, correlation).clearnessIndex;
        for (let d = 1; d < kt.length; d++) {
          sx += kt[d - 1];
          sy += kt[d];
          sxy += kt[d - 1] * kt[d];
          sxx += kt[d - 1] ** 2;
          syy += kt[d] ** 2;
          n++;
        }
      }
      return (sxy / n - (sx / n) * (sy / n)) / Math.sqrt((sxx / n - (sx / n) ** 2) * (syy / n - (sy / n) ** 2));
    }
    expect(Math.abs(lagOneCorrelation(0))).toBeLessThan(0.05);
    const persistent = lagOneCorrelation(0.3);
    expect(persistent).toBeGreaterThan(0.2);
    expect(persistent).toBeLessThan(0.35);
  });

  it("draws uniform numbers and a normal CDF that behave (Abramowitz & Stegun 7.1.26: Φ(1.96) = 0.9750)", () => {
    const next = mulberry32(7);
    let sum = 0;
    for (let i = 0; i < 20000; i++) sum += next();
    expect(sum / 20000).toBeCloseTo(0.5, 2);
    expect(standardNormalCdf(1.96)).toBeCloseTo(0.975, 4);
    expect(standardNormalCdf(0)).toBeCloseTo(0.5, 7);
    expect(standardNormalCdf(-1)).toBeCloseTo(0.158655, 5);
  });
});
