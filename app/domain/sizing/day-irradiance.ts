// How the array's daily irradiation follows the day's clearness index. A clear day is not just a
// brighter average day: more of its light is beam, which a tilted array gathers more (or less) of than
// diffuse. Per month, the beam, sky-diffuse and ground-reflected parts of the engine's average day
// give transposition ratios (beam: H̄T,b / H̄b; sky: (1 + cos β)/2; ground: ρ(1 − cos β)/2 — the
// isotropic sky of Liu & Jordan, as Klein 1977 uses for monthly means); a day of clearness KT then gets
//   HT(KT) = KT·H0·[(1 − fd)·R̄b + fd·Rsky + Rground],
// with the day's diffuse fraction fd from the Erbs et al. (1982) daily correlation (Duffie & Beckman
// §2.11, Eq. 2.11.1). Approximation, stated in the plan: the month's average-day geometry and hourly
// shape stand for every day of the month, and the cell-temperature change between clear and dull days
// is not modelled.
import { averageDayIrradiance } from "../solar/average-day-irradiance";
import type { SiteInput } from "../solar/yield-types";
import type { ClearnessDistribution } from "./daily-clearness";
import { clearnessQuantile } from "./daily-clearness";

/** Coarse steps suffice: only ratios of daily sums are kept. */
const RATIO_STEP_MINUTES = 20;
/** Quadrature points for the expected daily irradiation over the month's distribution. */
const EXPECTATION_POINTS = 128;

export interface MonthTransposition {
  month: number;
  h0KWhM2Day: number;
  sunsetHourAngleDeg: number;
  beamRatio: number;
  skyRatio: number;
  groundRatio: number;
}

/**
 * Erbs, Klein & Duffie (1982) daily diffuse fraction Hd/H from the day's clearness index and the
 * sunset hour angle (D&B Eq. 2.11.1):
 *   ωs ≤ 81.4°: KT < 0.715: 1 − 0.2727KT + 2.4495KT² − 11.9514KT³ + 9.3879KT⁴;  else 0.143
 *   ωs > 81.4°: KT < 0.722: 1 + 0.2832KT − 2.5557KT² + 0.8448KT³;              else 0.175
 */
export function erbsDailyDiffuseFraction(kt: number, sunsetHourAngleDeg: number): number {
  let fraction: number;
  if (sunsetHourAngleDeg <= 81.4) {
    fraction = kt < 0.715 ? 1 - 0.2727 * kt + 2.4495 * kt ** 2 - 11.9514 * kt ** 3 + 9.3879 * kt ** 4 : 0.143;
  } else {
    fraction = kt < 0.722 ? 1 + 0.2832 * kt - 2.5557 * kt ** 2 + 0.8448 * kt ** 3 : 0.175;
  }
  return Math.min(1, Math.max(0, fraction));
}

export function monthTranspositions(site: SiteInput): MonthTransposition[] {
  return site.months.map((climate, index) => {
    const month = index + 1;
    const day = averageDayIrradiance({
      latitudeDeg: site.latitudeDeg,
      tiltDeg: site.tiltDeg,
      azimuthDeg: site.azimuthDeg,
      month,
      albedo: climate.albedo ?? site.albedo,
      ghiKWhM2Day: climate.ghiKWhM2Day,
      clearnessIndex: climate.clearnessIndex,
      stepMinutes: RATIO_STEP_MINUTES,
    });
    const h = day.ghiKWhM2Day;
    const beamH = h * (1 - day.diffuseFraction);
    const diffuseH = h * day.diffuseFraction;
    const tiltRad = (site.tiltDeg * Math.PI) / 180;
    return {
      month,
      h0KWhM2Day: day.h0KWhM2Day,
      sunsetHourAngleDeg: day.sunsetHourAngleDeg,
      // With no beam on the average day the ratio cannot be read off; 1 keeps clear days neutral.
      beamRatio: beamH > 1e-9 ? day.poaBeamKWhM2Day / beamH : 1,
      skyRatio: diffuseH > 1e-9 ? day.poaSkyDiffuseKWhM2Day / diffuseH : (1 + Math.cos(tiltRad)) / 2,
      groundRatio: h > 1e-9 ? day.poaGroundKWhM2Day / h : ((climate.albedo ?? site.albedo) * (1 - Math.cos(tiltRad))) / 2,
    };
  });
}

/** Irradiation on the array plane for a day of clearness kt in this month, kWh/m². */
export function planeOfArrayForDayKWhM2(t: MonthTransposition, kt: number): number {
  const fd = erbsDailyDiffuseFraction(kt, t.sunsetHourAngleDeg);
  return kt * t.h0KWhM2Day * ((1 - fd) * t.beamRatio + fd * t.skyRatio + t.groundRatio);
}

/** Expected plane-of-array irradiation of a day over the month's clearness distribution (midpoint rule in probability). */
export function expectedPlaneOfArrayKWhM2(t: MonthTransposition, distribution: ClearnessDistribution): number {
  let sum = 0;
  for (let i = 0; i < EXPECTATION_POINTS; i++) sum += planeOfArrayForDayKWhM2(t, clearnessQuantile(distribution, (i + 0.5) / EXPECTATION_POINTS));
  return sum / EXPECTATION_POINTS;
}
