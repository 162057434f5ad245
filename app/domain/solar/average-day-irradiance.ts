// Irradiance on the array plane through the average day of a month, for any tilt, any azimuth
// and either hemisphere. The monthly mean daily horizontal irradiation H̄ is split into hours
// after Collares-Pereira & Rabl (1979) r_t (total) and Liu & Jordan (1960) r_d (diffuse), the
// diffuse share coming from Erbs et al. (1982); each step is transposed with the isotropic sky
// (Liu & Jordan): beam by cos θ / cos θz, sky diffuse (1 + cos β)/2, ground ρ(1 − cos β)/2
// (Duffie & Beckman §2.13–2.15, §2.19). Midpoint steps never sit on sunrise or sunset.
import { DEG_TO_RAD, cosDeg, sinDeg } from "./angles";
import { averageDayOfMonth, declinationCooperDeg, extraterrestrialDailyKWhM2, sunsetHourAngleDeg } from "./day-geometry";
import { erbsMonthlyDiffuseFraction } from "./diffuse-fraction";
import { collaresPereiraRablCoefficients } from "./hourly-split";
import { bearingToSurfaceAzimuthFromSouthDeg, incidenceCoefficients } from "./incidence-angle";

/** 10-minute steps: 2.5° of hour angle. */
export const DEFAULT_STEP_MINUTES = 10;

export interface AverageDayInput {
  latitudeDeg: number;
  tiltDeg: number;
  /** Compass bearing the array faces: 0 N, 90 E, 180 S, 270 W. */
  azimuthDeg: number;
  month: number;
  /** A specific day of year (may be fractional) instead of Klein's average day of the month. */
  dayOfYear?: number;
  albedo: number;
  /** Monthly mean daily horizontal irradiation; when absent, clearnessIndex·H0 is used. */
  ghiKWhM2Day?: number;
  clearnessIndex?: number;
  stepMinutes?: number;
}

export interface AverageDayIrradiance {
  month: number;
  dayOfYear: number;
  declinationDeg: number;
  sunsetHourAngleDeg: number;
  h0KWhM2Day: number;
  ghiKWhM2Day: number;
  clearnessIndex: number;
  diffuseFraction: number;
  poaKWhM2Day: number;
  poaBeamKWhM2Day: number;
  poaSkyDiffuseKWhM2Day: number;
  poaGroundKWhM2Day: number;
  stepHours: number;
  /** Hour angle at the middle of each step (degrees, morning negative). */
  hourAngleDeg: Float64Array;
  /** Mean plane-of-array irradiance over each step, W/m². */
  poaWm2: Float64Array;
}

export function averageDayIrradiance(input: AverageDayInput): AverageDayIrradiance {
  const { latitudeDeg, tiltDeg, month, albedo } = input;
  const dayOfYear = input.dayOfYear ?? averageDayOfMonth(month);
  const declinationDeg = declinationCooperDeg(dayOfYear);
  const omegaSDeg = sunsetHourAngleDeg(latitudeDeg, declinationDeg);
  const h0KWhM2Day = extraterrestrialDailyKWhM2(latitudeDeg, dayOfYear);
  const ghiKWhM2Day = resolveDailyGhi(input, h0KWhM2Day);
  const clearnessIndex = h0KWhM2Day > 0 ? ghiKWhM2Day / h0KWhM2Day : 0;
  const diffuseFraction = h0KWhM2Day > 0 ? erbsMonthlyDiffuseFraction(clearnessIndex, omegaSDeg) : 1;

  const stepDeg = ((input.stepMinutes ?? DEFAULT_STEP_MINUTES) / 60) * 15;
  const stepCount = h0KWhM2Day > 0 && ghiKWhM2Day > 0 ? Math.max(12, Math.ceil((2 * omegaSDeg) / stepDeg)) : 0;
  const dOmegaDeg = stepCount > 0 ? (2 * omegaSDeg) / stepCount : 0;
  const stepHours = dOmegaDeg / 15;
  const hourAngleDeg = new Float64Array(stepCount);
  const poaWm2 = new Float64Array(stepCount);

  // Shapes of r_t and r_d, normalised by their own midpoint sums so the steps add up exactly to
  // H̄ and H̄d (the closed-form r_t sums to 1 only approximately; D&B §2.13 note this).
  const { a, b } = collaresPereiraRablCoefficients(omegaSDeg);
  const sinPhiSinDelta = sinDeg(latitudeDeg) * sinDeg(declinationDeg);
  const cosPhiCosDelta = cosDeg(latitudeDeg) * cosDeg(declinationDeg);
  const cosZenith = new Float64Array(stepCount);
  let totalShapeSum = 0;
  let diffuseShapeSum = 0;
  for (let i = 0; i < stepCount; i++) {
    const omegaDeg = -omegaSDeg + (i + 0.5) * dOmegaDeg;
    hourAngleDeg[i] = omegaDeg;
    const cosOmega = Math.cos(omegaDeg * DEG_TO_RAD);
    const cz = Math.max(0, cosPhiCosDelta * cosOmega + sinPhiSinDelta);
    cosZenith[i] = cz;
    totalShapeSum += (a + b * cosOmega) * cz * stepHours;
    diffuseShapeSum += cz * stepHours;
  }

  const diffuseDailyKWhM2 = diffuseFraction * ghiKWhM2Day;
  const incidence = incidenceCoefficients(latitudeDeg, declinationDeg, tiltDeg, bearingToSurfaceAzimuthFromSouthDeg(input.azimuthDeg));
  const skyViewFactor = (1 + cosDeg(tiltDeg)) / 2;
  const groundViewFactor = (1 - cosDeg(tiltDeg)) / 2;
  let beamSum = 0;
  let skySum = 0;
  let groundSum = 0;
  for (let i = 0; i < stepCount; i++) {
    const omegaRad = hourAngleDeg[i] * DEG_TO_RAD;
    const cosOmega = Math.cos(omegaRad);
    const cz = cosZenith[i];
    // Beam normal-like term I_b/cos θz stays finite at the horizon because I_t and I_d both
    // scale with cos θz; clipping at zero keeps I_d ≤ I_t in the low-sun steps.
    const beamOverCosZenith = Math.max(0, (ghiKWhM2Day * (a + b * cosOmega)) / totalShapeSum - diffuseDailyKWhM2 / diffuseShapeSum);
    const totalKWhM2PerH = (ghiKWhM2Day * (a + b * cosOmega) * cz) / totalShapeSum;
    const diffuseKWhM2PerH = totalKWhM2PerH - beamOverCosZenith * cz;
    const cosTheta = incidence.constant + incidence.cosOmega * cosOmega + incidence.sinOmega * Math.sin(omegaRad);
    const beam = beamOverCosZenith * Math.max(0, cosTheta);
    const sky = diffuseKWhM2PerH * skyViewFactor;
    const ground = totalKWhM2PerH * albedo * groundViewFactor;
    poaWm2[i] = (beam + sky + ground) * 1000;
    beamSum += beam * stepHours;
    skySum += sky * stepHours;
    groundSum += ground * stepHours;
  }

  return {
    month,
    dayOfYear,
    declinationDeg,
    sunsetHourAngleDeg: omegaSDeg,
    h0KWhM2Day,
    ghiKWhM2Day,
    clearnessIndex,
    diffuseFraction,
    poaKWhM2Day: beamSum + skySum + groundSum,
    poaBeamKWhM2Day: beamSum,
    poaSkyDiffuseKWhM2Day: skySum,
    poaGroundKWhM2Day: groundSum,
    stepHours,
    hourAngleDeg,
    poaWm2,
  };
}

function resolveDailyGhi(input: AverageDayInput, h0KWhM2Day: number): number {
  if (input.ghiKWhM2Day !== undefined) return input.ghiKWhM2Day;
  if (input.clearnessIndex !== undefined) return input.clearnessIndex * h0KWhM2Day;
  throw new RangeError(`month ${input.month}: give ghiKWhM2Day or clearnessIndex`);
}
