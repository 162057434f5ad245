// Plane-of-array irradiance at one instant, for judging a field reading: global horizontal
// irradiance split into beam and diffuse with the hourly correlation of Erbs et al. (1982),
// then transposed with the isotropic sky (Liu & Jordan; Duffie & Beckman §2.15).
import { cosDeg } from "./angles";
import { SOLAR_CONSTANT_WM2, eccentricityFactor } from "./day-geometry";
import { erbsHourlyDiffuseFraction } from "./diffuse-fraction";
import { cosIncidenceFromSunPosition } from "./incidence-angle";
import { haurwitzClearSkyGhiWm2 } from "./clear-sky";
import { sunPositionAt } from "./sun-position";

export interface InstantPoaInput {
  ghiWm2: number;
  sunZenithDeg: number;
  sunAzimuthDeg: number;
  dayOfYear: number;
  tiltDeg: number;
  /** Compass bearing the module faces. */
  azimuthDeg: number;
  albedo: number;
}

export interface InstantPoa {
  poaWm2: number;
  beamWm2: number;
  skyDiffuseWm2: number;
  groundWm2: number;
  dniWm2: number;
  dhiWm2: number;
  hourlyClearnessIndex: number;
  incidenceDeg: number;
}

export function planeOfArrayIrradianceAt(input: InstantPoaInput): InstantPoa {
  const { ghiWm2, tiltDeg, albedo } = input;
  const cosZenith = cosDeg(input.sunZenithDeg);
  const extraterrestrialNormalWm2 = SOLAR_CONSTANT_WM2 * eccentricityFactor(input.dayOfYear);
  const cosTheta = cosIncidenceFromSunPosition(input.sunZenithDeg, input.sunAzimuthDeg, tiltDeg, input.azimuthDeg);
  let dniWm2 = 0;
  let dhiWm2 = ghiWm2;
  let kt = 0;
  if (cosZenith > 0 && ghiWm2 > 0) {
    kt = ghiWm2 / (extraterrestrialNormalWm2 * cosZenith);
    dhiWm2 = ghiWm2 * erbsHourlyDiffuseFraction(kt);
    // Near the horizon (GHI − DHI)/cos z can exceed what arrives above the atmosphere: cap the
    // beam there and count the rest as diffuse, so GHI is conserved.
    dniWm2 = Math.min((ghiWm2 - dhiWm2) / cosZenith, extraterrestrialNormalWm2);
    dhiWm2 = ghiWm2 - dniWm2 * cosZenith;
  }
  const beamWm2 = dniWm2 * Math.max(0, cosTheta);
  const skyDiffuseWm2 = (dhiWm2 * (1 + cosDeg(tiltDeg))) / 2;
  const groundWm2 = (ghiWm2 * albedo * (1 - cosDeg(tiltDeg))) / 2;
  return {
    poaWm2: beamWm2 + skyDiffuseWm2 + groundWm2,
    beamWm2,
    skyDiffuseWm2,
    groundWm2,
    dniWm2,
    dhiWm2,
    hourlyClearnessIndex: kt,
    incidenceDeg: (Math.acos(Math.max(-1, Math.min(1, cosTheta))) * 180) / Math.PI,
  };
}

/** Day of year (1..366) of a UTC instant. */
export function dayOfYearUtc(instantUtc: Date): number {
  const startOfYear = Date.UTC(instantUtc.getUTCFullYear(), 0, 1);
  return Math.floor((instantUtc.getTime() - startOfYear) / 86_400_000) + 1;
}

export interface ClearSkyPoaInput {
  instantUtc: Date;
  latitudeDeg: number;
  longitudeDeg: number;
  tiltDeg: number;
  azimuthDeg: number;
  albedo: number;
}

/** Estimated plane-of-array irradiance under a clear sky (Haurwitz 1945 + the split above). */
export function clearSkyPlaneOfArrayAt(input: ClearSkyPoaInput): InstantPoa & { ghiWm2: number; sunZenithDeg: number } {
  const sun = sunPositionAt(input.instantUtc, input.latitudeDeg, input.longitudeDeg);
  const ghiWm2 = haurwitzClearSkyGhiWm2(sun.zenithDeg);
  const poa = planeOfArrayIrradianceAt({
    ghiWm2,
    sunZenithDeg: sun.zenithDeg,
    sunAzimuthDeg: sun.azimuthDeg,
    dayOfYear: dayOfYearUtc(input.instantUtc),
    tiltDeg: input.tiltDeg,
    azimuthDeg: input.azimuthDeg,
    albedo: input.albedo,
  });
  return { ...poa, ghiWm2, sunZenithDeg: sun.zenithDeg };
}
