// Day geometry of the sun: declination, sunset hour angle, Klein's average days and the
// extraterrestrial daily irradiation H0 (Duffie & Beckman, Solar Engineering of Thermal
// Processes, ch. 1).
import { DEG_TO_RAD, RAD_TO_DEG, clamp, cosDeg, sinDeg, tanDeg } from "./angles";

/** Solar constant used by Duffie & Beckman (W/m²). */
export const SOLAR_CONSTANT_WM2 = 1367;

/**
 * Klein (1977) recommended average day of each month (day of year, non-leap), whose declination
 * and H0 are closest to the month's mean (Duffie & Beckman Table 1.6.1).
 */
export const KLEIN_AVERAGE_DAY_OF_MONTH: readonly number[] = [17, 47, 75, 105, 135, 162, 198, 228, 258, 288, 318, 344];

/** Average day (day of year) for month 1..12, after Klein (1977). */
export function averageDayOfMonth(month: number): number {
  const dayOfYear = KLEIN_AVERAGE_DAY_OF_MONTH[month - 1];
  if (dayOfYear === undefined) throw new RangeError(`month must be 1..12, got ${month}`);
  return dayOfYear;
}

/** Declination after Cooper (1969): δ = 23.45·sin(360·(284 + n)/365) (D&B eq. 1.6.1a). */
export function declinationCooperDeg(dayOfYear: number): number {
  return 23.45 * sinDeg((360 * (284 + dayOfYear)) / 365);
}

/**
 * −tan φ · tan δ, the cosine of the sunset hour angle before clamping (D&B eq. 1.6.10).
 * Below −1 the sun never sets (polar day); above +1 it never rises (polar night).
 */
export function unclampedCosSunsetHourAngle(latitudeDeg: number, declinationDeg: number): number {
  return -tanDeg(latitudeDeg) * tanDeg(declinationDeg);
}

/** Sunset hour angle ωs in degrees, clamped to 180° in polar day and 0° in polar night. */
export function sunsetHourAngleDeg(latitudeDeg: number, declinationDeg: number): number {
  const cosOmegaS = clamp(unclampedCosSunsetHourAngle(latitudeDeg, declinationDeg), -1, 1);
  return Math.acos(cosOmegaS) * RAD_TO_DEG;
}

/** Eccentricity correction of extraterrestrial radiation, 1 + 0.033·cos(360n/365) (D&B eq. 1.4.1a). */
export function eccentricityFactor(dayOfYear: number): number {
  return 1 + 0.033 * cosDeg((360 * dayOfYear) / 365);
}

/**
 * Extraterrestrial daily irradiation on a horizontal surface, D&B eq. 1.10.3:
 * H0 = (24·3600·Gsc/π)·(1 + 0.033 cos(360n/365))·(cos φ cos δ sin ωs + (π ωs/180) sin φ sin δ),
 * in J/m². Clamping ωs makes the same formula valid in polar day (ωs = 180°) and night (0).
 */
export function extraterrestrialDailyJM2(latitudeDeg: number, dayOfYear: number): number {
  const declinationDeg = declinationCooperDeg(dayOfYear);
  const omegaSDeg = sunsetHourAngleDeg(latitudeDeg, declinationDeg);
  const shape = cosDeg(latitudeDeg) * cosDeg(declinationDeg) * sinDeg(omegaSDeg) + omegaSDeg * DEG_TO_RAD * sinDeg(latitudeDeg) * sinDeg(declinationDeg);
  const h0 = ((24 * 3600 * SOLAR_CONSTANT_WM2) / Math.PI) * eccentricityFactor(dayOfYear) * shape;
  return Math.max(0, h0);
}

export function extraterrestrialDailyMJM2(latitudeDeg: number, dayOfYear: number): number {
  return extraterrestrialDailyJM2(latitudeDeg, dayOfYear) / 1e6;
}

export function extraterrestrialDailyKWhM2(latitudeDeg: number, dayOfYear: number): number {
  return extraterrestrialDailyJM2(latitudeDeg, dayOfYear) / 3.6e6;
}

/** H0 on Klein's average day of month 1..12, kWh/m²/day. */
export function monthlyH0KWhM2Day(latitudeDeg: number, month: number): number {
  return extraterrestrialDailyKWhM2(latitudeDeg, averageDayOfMonth(month));
}
