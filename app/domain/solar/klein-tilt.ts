// Monthly mean ratio R̄ of tilted to horizontal irradiation for an equator-facing surface,
// isotropic sky (Liu & Jordan 1962 as extended by Klein 1977; Duffie & Beckman §2.19).
// Kept as an independent cross-check of the hourly integration, which handles any azimuth.
import { DEG_TO_RAD, acosDeg, cosDeg, sinDeg, tanDeg } from "./angles";
import { declinationCooperDeg, sunsetHourAngleDeg } from "./day-geometry";

/**
 * Klein (1977) R̄b for a surface facing the equator (D&B §2.19):
 *   R̄b = [cos(φ∓β) cos δ sin ω′s + (π/180) ω′s sin(φ∓β) sin δ] / [cos φ cos δ sin ωs + (π/180) ωs sin φ sin δ]
 *   ω′s = min(ωs, arccos(−tan(φ∓β) tan δ)),
 * with φ−β in the northern hemisphere and φ+β in the southern.
 */
export function kleinMonthlyBeamRatio(latitudeDeg: number, tiltDeg: number, dayOfYear: number): number {
  const declinationDeg = declinationCooperDeg(dayOfYear);
  const omegaSDeg = sunsetHourAngleDeg(latitudeDeg, declinationDeg);
  const horizontal = cosDeg(latitudeDeg) * cosDeg(declinationDeg) * sinDeg(omegaSDeg) + omegaSDeg * DEG_TO_RAD * sinDeg(latitudeDeg) * sinDeg(declinationDeg);
  if (horizontal <= 0) return 0;
  // The equator-facing tilted plane is parallel to a horizontal plane at latitude φ ∓ β.
  const equivalentLatitudeDeg = latitudeDeg >= 0 ? latitudeDeg - tiltDeg : latitudeDeg + tiltDeg;
  const tiltedSunsetDeg = acosDeg(-tanDeg(equivalentLatitudeDeg) * tanDeg(declinationDeg));
  const omegaSPrimeDeg = Math.min(omegaSDeg, tiltedSunsetDeg);
  const tilted =
    cosDeg(equivalentLatitudeDeg) * cosDeg(declinationDeg) * sinDeg(omegaSPrimeDeg) +
    omegaSPrimeDeg * DEG_TO_RAD * sinDeg(equivalentLatitudeDeg) * sinDeg(declinationDeg);
  return Math.max(0, tilted) / horizontal;
}

/**
 * Isotropic-sky monthly R̄ (Liu & Jordan; Klein 1977; D&B §2.19):
 * R̄ = (1 − H̄d/H̄)·R̄b + (H̄d/H̄)·(1 + cos β)/2 + ρ·(1 − cos β)/2.
 */
export function isotropicMonthlyTiltRatio(beamRatio: number, diffuseFraction: number, tiltDeg: number, albedo: number): number {
  const cosBeta = cosDeg(tiltDeg);
  return (1 - diffuseFraction) * beamRatio + (diffuseFraction * (1 + cosBeta)) / 2 + (albedo * (1 - cosBeta)) / 2;
}
