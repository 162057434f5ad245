// Clear-sky global horizontal irradiance where nothing was measured.

/**
 * Haurwitz (1945): GHI = 1098·cos z·exp(−0.059/cos z) W/m², z the apparent solar zenith angle.
 * Zero with the sun at or below the horizon.
 */
export function haurwitzClearSkyGhiWm2(apparentZenithDeg: number): number {
  const cosZenith = Math.cos((apparentZenithDeg * Math.PI) / 180);
  if (cosZenith <= 0) return 0;
  return 1098 * cosZenith * Math.exp(-0.059 / cosZenith);
}
