// Ratios of an hour's irradiation to the day's total on the average day of a month
// (Duffie & Beckman §2.13): Collares-Pereira & Rabl (1979) r_t for total, Liu & Jordan (1960)
// r_d for diffuse. Hour angles in degrees, ratios per hour.
import { DEG_TO_RAD, cosDeg, sinDeg } from "./angles";

/** Collares-Pereira & Rabl (1979) coefficients a = 0.409 + 0.5016 sin(ωs − 60), b = 0.6609 − 0.4767 sin(ωs − 60). */
export function collaresPereiraRablCoefficients(sunsetHourAngleDeg: number): { a: number; b: number } {
  const s = sinDeg(sunsetHourAngleDeg - 60);
  return { a: 0.409 + 0.5016 * s, b: 0.6609 - 0.4767 * s };
}

/**
 * Liu & Jordan (1960) r_d = (π/24)·(cos ω − cos ωs)/(sin ωs − (π ωs/180) cos ωs) (D&B §2.13).
 * Zero outside daylight.
 */
export function liuJordanDiffuseRatio(hourAngleDeg: number, sunsetHourAngleDeg: number): number {
  if (Math.abs(hourAngleDeg) >= sunsetHourAngleDeg) return 0;
  const cosOmegaS = cosDeg(sunsetHourAngleDeg);
  const denominator = sinDeg(sunsetHourAngleDeg) - sunsetHourAngleDeg * DEG_TO_RAD * cosOmegaS;
  return ((Math.PI / 24) * (cosDeg(hourAngleDeg) - cosOmegaS)) / denominator;
}

/** Collares-Pereira & Rabl (1979) r_t = (a + b cos ω)·r_d (D&B §2.13). */
export function collaresPereiraRablTotalRatio(hourAngleDeg: number, sunsetHourAngleDeg: number): number {
  const { a, b } = collaresPereiraRablCoefficients(sunsetHourAngleDeg);
  return (a + b * cosDeg(hourAngleDeg)) * liuJordanDiffuseRatio(hourAngleDeg, sunsetHourAngleDeg);
}
