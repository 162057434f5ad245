// The sun's position at an instant, from suncalc 2.x (degrees, azimuth clockwise from north,
// refracted altitude). suncalc 2.0.2 computes the sun after Meeus (1998) ch. 25 and adds the
// Sæmundsson refraction formula (Meeus 1998 eq. 16.4) at standard air; geometricElevationDeg
// removes exactly that refraction so callers can compare with unrefracted references.
import * as SunCalc from "suncalc";
import { DEG_TO_RAD, RAD_TO_DEG } from "./angles";

export interface SunPosition {
  /** Apparent (refracted) elevation above the horizon, degrees; negative below it. */
  elevationDeg: number;
  /** Apparent zenith angle, 90 − elevation, degrees. */
  zenithDeg: number;
  /** Compass azimuth of the sun, clockwise from north, degrees in [0, 360). */
  azimuthDeg: number;
  /** Elevation without atmospheric refraction (geometric, geocentric), degrees. */
  geometricElevationDeg: number;
}

/** Sæmundsson refraction as coded in suncalc 2.0.2, true altitude in rad → refraction in rad. */
function suncalcRefractionRad(trueAltitudeRad: number): number {
  const h = trueAltitudeRad < 0 ? 0 : trueAltitudeRad;
  return 0.0002967 / Math.tan(h + 0.00312536 / (h + 0.08901179));
}

/**
 * Inverts suncalc's refraction: finds the true altitude h with h + R(h) = apparent. A fixed-point
 * iteration converges quickly because dR/dh is small (|dR/dh| < 0.2 even at the horizon).
 */
export function removeSuncalcRefractionDeg(apparentElevationDeg: number): number {
  const apparentRad = apparentElevationDeg * DEG_TO_RAD;
  let trueRad = apparentRad;
  for (let i = 0; i < 12; i++) {
    const next = apparentRad - suncalcRefractionRad(trueRad);
    if (Math.abs(next - trueRad) < 1e-12) return next * RAD_TO_DEG;
    trueRad = next;
  }
  return trueRad * RAD_TO_DEG;
}

/** Sun position for a place and a UTC instant. longitudeDeg is east-positive. */
export function sunPositionAt(instantUtc: Date, latitudeDeg: number, longitudeDeg: number): SunPosition {
  const position = SunCalc.getPosition(instantUtc, latitudeDeg, longitudeDeg);
  const elevationDeg = position.altitude;
  return {
    elevationDeg,
    zenithDeg: 90 - elevationDeg,
    azimuthDeg: position.azimuth,
    geometricElevationDeg: removeSuncalcRefractionDeg(elevationDeg),
  };
}
