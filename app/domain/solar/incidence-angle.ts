// Angle of incidence of beam radiation on a tilted plane (Duffie & Beckman §1.6).
// Public API uses compass bearings (0 N, 90 E, 180 S, 270 W) for the direction the array faces.
// Duffie & Beckman measure the surface azimuth γ from south, east negative, west positive.
import { cosDeg, sinDeg } from "./angles";

/** Compass bearing the array faces → D&B surface azimuth γ (from south, west positive), −180..180. */
export function bearingToSurfaceAzimuthFromSouthDeg(bearingDeg: number): number {
  let gammaDeg = (((bearingDeg - 180) % 360) + 360) % 360;
  if (gammaDeg > 180) gammaDeg -= 360;
  return gammaDeg;
}

/**
 * cos θ from the sun's zenith and azimuth (D&B §1.6: cos θ = cos θz cos β + sin θz sin β cos(γs − γ)).
 * Both azimuths are compass bearings; only their difference matters, so any common origin works.
 * May be negative (sun behind the plane); callers clip.
 */
export function cosIncidenceFromSunPosition(sunZenithDeg: number, sunAzimuthDeg: number, tiltDeg: number, surfaceAzimuthDeg: number): number {
  return cosDeg(sunZenithDeg) * cosDeg(tiltDeg) + sinDeg(sunZenithDeg) * sinDeg(tiltDeg) * cosDeg(sunAzimuthDeg - surfaceAzimuthDeg);
}

/** Coefficients of cos θ = A + B·cos ω + C·sin ω for one day (D&B eq. 1.6.2 regrouped by ω). */
export interface IncidenceCoefficients {
  constant: number;
  cosOmega: number;
  sinOmega: number;
}

/**
 * Regroups D&B eq. 1.6.2
 *   cos θ = sin δ sin φ cos β − sin δ cos φ sin β cos γ + cos δ cos φ cos β cos ω
 *         + cos δ sin φ sin β cos γ cos ω + cos δ sin β sin γ sin ω
 * so the per-step work in the daily integration is two multiplications. γ is the D&B surface
 * azimuth (from south, west positive); ω the hour angle (morning negative).
 */
export function incidenceCoefficients(latitudeDeg: number, declinationDeg: number, tiltDeg: number, surfaceAzimuthFromSouthDeg: number): IncidenceCoefficients {
  const sinPhi = sinDeg(latitudeDeg);
  const cosPhi = cosDeg(latitudeDeg);
  const sinDelta = sinDeg(declinationDeg);
  const cosDelta = cosDeg(declinationDeg);
  const sinBeta = sinDeg(tiltDeg);
  const cosBeta = cosDeg(tiltDeg);
  const sinGamma = sinDeg(surfaceAzimuthFromSouthDeg);
  const cosGamma = cosDeg(surfaceAzimuthFromSouthDeg);
  return {
    constant: sinDelta * sinPhi * cosBeta - sinDelta * cosPhi * sinBeta * cosGamma,
    cosOmega: cosDelta * cosPhi * cosBeta + cosDelta * sinPhi * sinBeta * cosGamma,
    sinOmega: cosDelta * sinBeta * sinGamma,
  };
}

/** cos θz of the sun for a horizontal plane (D&B eq. 1.6.5 / β = 0 case of eq. 1.6.2). */
export function cosZenithFromHourAngle(latitudeDeg: number, declinationDeg: number, hourAngleDeg: number): number {
  return cosDeg(latitudeDeg) * cosDeg(declinationDeg) * cosDeg(hourAngleDeg) + sinDeg(latitudeDeg) * sinDeg(declinationDeg);
}
