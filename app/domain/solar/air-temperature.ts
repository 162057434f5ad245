// Air temperature through the day from the monthly mean daily minimum and maximum.
// Profile (common practice, no source): the minimum at sunrise, a half-cosine rise to the
// maximum at 15:00 solar time, then a half-cosine fall to the next sunrise's minimum. Where the
// sun never sets (polar day) the minimum is put at solar midnight.

/** Solar time of the daily maximum, hours. */
export const AIR_TEMPERATURE_PEAK_SOLAR_HOUR = 15;

/**
 * Air temperature at a solar time (hours, 0–24), given the sunrise time in solar hours.
 */
export function airTemperatureAtSolarHourC(solarHour: number, sunriseSolarHour: number, tMinC: number, tMaxC: number): number {
  const peak = AIR_TEMPERATURE_PEAK_SOLAR_HOUR;
  const rise = Math.min(sunriseSolarHour, peak - 1e-6);
  const amplitude = tMaxC - tMinC;
  if (solarHour >= rise && solarHour <= peak) {
    const phase = (solarHour - rise) / (peak - rise);
    return tMinC + (amplitude * (1 - Math.cos(Math.PI * phase))) / 2;
  }
  // Falling branch: from 15:00 to sunrise of the next day (24 h later than today's sunrise).
  const hoursSincePeak = solarHour > peak ? solarHour - peak : solarHour + 24 - peak;
  const fallLength = rise + 24 - peak;
  const phase = hoursSincePeak / fallLength;
  return tMaxC - (amplitude * (1 - Math.cos(Math.PI * phase))) / 2;
}

/** Sunrise in solar hours from the sunset hour angle (12 − ωs/15); 0 in polar day. */
export function sunriseSolarHour(sunsetHourAngleDeg: number): number {
  return 12 - sunsetHourAngleDeg / 15;
}
