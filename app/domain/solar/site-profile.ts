// Everything about a site that does not depend on the module: per month, the plane-of-array
// irradiance and air temperature at each step of the average day. Computed once per site so
// that many modules can be ranked cheaply (see module-yield.ts).
import { airTemperatureAtSolarHourC, sunriseSolarHour } from "./air-temperature";
import { DEFAULT_STEP_MINUTES, averageDayIrradiance } from "./average-day-irradiance";
import { ERBS_MONTHLY_KT_MAX, ERBS_MONTHLY_KT_MIN } from "./diffuse-fraction";
import type { CellTemperatureModel, SiteInput, YieldOptions } from "./yield-types";

export const DEFAULT_WIND_SPEED_MS = 1;

export interface MonthProfile {
  month: number;
  h0KWhM2Day: number;
  ghiKWhM2Day: number;
  clearnessIndex: number;
  irradianceSource: "measured" | "clearness-index";
  diffuseFraction: number;
  albedo: number;
  poaKWhM2Day: number;
  /** True when the sun stays below the horizon on the average day. */
  polarNight: boolean;
  /** True when K̄T fell outside the 0.3–0.8 range of the Erbs fit. */
  clearnessOutsideErbsRange: boolean;
  stepHours: number;
  poaWm2: Float64Array;
  airTemperatureC: Float64Array;
}

export interface SiteProfile {
  site: SiteInput;
  cellTempModel: CellTemperatureModel;
  windSpeedMs: number;
  stepMinutes: number;
  months: MonthProfile[];
  /** Bounds over all daylight steps of the year, so a module can tabulate what depends on cell temperature. */
  daylightAirMinC: number;
  daylightAirMaxC: number;
  poaMaxWm2: number;
}

export function prepareSiteProfile(site: SiteInput, options: YieldOptions = {}): SiteProfile {
  if (site.months.length !== 12) throw new RangeError(`site needs 12 months, got ${site.months.length}`);
  const stepMinutes = options.stepMinutes ?? DEFAULT_STEP_MINUTES;
  const months = site.months.map((climate, index): MonthProfile => {
    const month = index + 1;
    const albedo = climate.albedo ?? site.albedo;
    const day = averageDayIrradiance({
      latitudeDeg: site.latitudeDeg,
      tiltDeg: site.tiltDeg,
      azimuthDeg: site.azimuthDeg,
      month,
      albedo,
      ghiKWhM2Day: climate.ghiKWhM2Day,
      clearnessIndex: climate.clearnessIndex,
      stepMinutes,
    });
    const sunrise = sunriseSolarHour(day.sunsetHourAngleDeg);
    const airTemperatureC = new Float64Array(day.poaWm2.length);
    for (let i = 0; i < airTemperatureC.length; i++) {
      const solarHour = 12 + day.hourAngleDeg[i] / 15;
      airTemperatureC[i] = airTemperatureAtSolarHourC(solarHour, sunrise, climate.tMinC, climate.tMaxC);
    }
    const kt = day.clearnessIndex;
    return {
      month,
      h0KWhM2Day: day.h0KWhM2Day,
      ghiKWhM2Day: day.ghiKWhM2Day,
      clearnessIndex: kt,
      irradianceSource: climate.ghiKWhM2Day !== undefined ? "measured" : "clearness-index",
      diffuseFraction: day.diffuseFraction,
      albedo,
      poaKWhM2Day: day.poaKWhM2Day,
      polarNight: day.h0KWhM2Day <= 0,
      clearnessOutsideErbsRange: day.h0KWhM2Day > 0 && (kt < ERBS_MONTHLY_KT_MIN || kt > ERBS_MONTHLY_KT_MAX),
      stepHours: day.stepHours,
      poaWm2: day.poaWm2,
      airTemperatureC,
    };
  });
  let daylightAirMinC = Infinity;
  let daylightAirMaxC = -Infinity;
  let poaMaxWm2 = 0;
  for (const month of months) {
    for (let i = 0; i < month.poaWm2.length; i++) {
      daylightAirMinC = Math.min(daylightAirMinC, month.airTemperatureC[i]);
      daylightAirMaxC = Math.max(daylightAirMaxC, month.airTemperatureC[i]);
      poaMaxWm2 = Math.max(poaMaxWm2, month.poaWm2[i]);
    }
  }
  if (daylightAirMinC > daylightAirMaxC) daylightAirMinC = daylightAirMaxC = 25; // no sun all year
  return {
    site,
    daylightAirMinC,
    daylightAirMaxC,
    poaMaxWm2,
    cellTempModel: options.cellTempModel ?? "noct",
    windSpeedMs: options.windSpeedMs ?? DEFAULT_WIND_SPEED_MS,
    stepMinutes,
    months,
  };
}
