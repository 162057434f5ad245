// Conditions that make a field reading less trustworthy. A flagged reading is still accepted: the
// curator sees each flag with its reason and decides. Thresholds are common practice, no source,
// unless a line says otherwise.
import { LOW_IRRADIANCE_WM2 } from "./reading-uncertainty";

export interface ReadingFlag {
  code: string;
  message: string;
}

/** Sun elevation below which the light's path through the air is far longer than the AM1.5 of STC. */
export const LOW_SUN_ELEVATION_DEG = 30;
/** Angle of incidence above which reflection off the glass starts to cost noticeable power. */
export const HIGH_INCIDENCE_DEG = 45;
/** Fewer points than this leaves the knee of the curve coarsely sampled (the engine needs 10). */
export const SPARSE_SWEEP_POINTS = 20;
/** Voltage step beside the maximum power point, as a share of Voc, above which the peak is coarse. */
export const COARSE_KNEE_FRACTION_OF_VOC = 0.05;
/** A sweep slower than this lets the sun and the module's temperature drift during it. */
export const SLOW_SWEEP_S = 5;
/** Measured irradiance this far above the clear-sky estimate suggests a wrong time or orientation. */
export const ABOVE_CLEAR_SKY_FACTOR = 1.25;
export const ABOVE_CLEAR_SKY_MARGIN_WM2 = 100;
/** Outside this ratio to nameplate, a unit or wiring mistake is likelier than a real module. */
export const PLAUSIBLE_RATIO_MIN = 0.6;
export const PLAUSIBLE_RATIO_MAX = 1.2;
/** A back sheet in sun is warmer than the air; this much colder suggests a misread thermometer. */
export const MODULE_COLDER_THAN_AIR_C = 3;

export interface FlagInput {
  sunElevationDeg: number;
  incidenceDeg: number;
  irradianceWm2: number;
  irradianceEstimated: boolean;
  clearSkyPoaWm2: number;
  airTempC: number;
  moduleTempC: number | null;
  stcPmaxW: number;
  nameplatePmaxW: number;
  sweep: null | {
    pointCount: number;
    /** Voltage steps on either side of the maximum power point, V. */
    kneeStepV: number;
    vocV: number;
    iscExtrapolated: boolean;
    vocExtrapolated: boolean;
    notes: string[];
    durationS: number | null;
  };
}

function round(value: number, digits = 0) {
  return value.toFixed(digits);
}

export function readingFlags(input: FlagInput): ReadingFlag[] {
  const flags: ReadingFlag[] = [];
  const add = (code: string, message: string) => flags.push({ code, message });

  if (input.sunElevationDeg < LOW_SUN_ELEVATION_DEG) {
    add(
      "sun-low",
      `The sun was ${round(input.sunElevationDeg)}° above the horizon (under ${LOW_SUN_ELEVATION_DEG}°): its light crossed much more air than the standard spectrum assumes.`,
    );
  }
  if (input.irradianceWm2 < LOW_IRRADIANCE_WM2) {
    add(
      "low-irradiance",
      `In-plane irradiance was ${round(input.irradianceWm2)} W/m² (under ${LOW_IRRADIANCE_WM2} W/m²); scaling up to 1000 W/m² magnifies every error.`,
    );
  }
  if (input.incidenceDeg >= 90) {
    add(
      "sun-behind-module",
      "The sun was behind the module's plane at that time: only diffuse light reached it. Check the time, UTC offset, tilt and azimuth.",
    );
  } else if (input.incidenceDeg > HIGH_INCIDENCE_DEG) {
    add(
      "high-incidence",
      `The sun struck the module at ${round(input.incidenceDeg)}° from its normal (over ${HIGH_INCIDENCE_DEG}°): reflection off the glass cuts the power.`,
    );
  }
  if (input.irradianceEstimated) {
    add("irradiance-estimated", "Irradiance was not measured: it is a clear-sky estimate for that time, place and orientation, so the reading counts half.");
  } else if (input.clearSkyPoaWm2 > 0 && input.irradianceWm2 > ABOVE_CLEAR_SKY_FACTOR * input.clearSkyPoaWm2 + ABOVE_CLEAR_SKY_MARGIN_WM2) {
    add(
      "irradiance-above-clear-sky",
      `Measured ${round(input.irradianceWm2)} W/m² is far above the clear-sky estimate of ${round(input.clearSkyPoaWm2)} W/m²: check the time, UTC offset, tilt and azimuth (cloud edges can also cause it).`,
    );
  }
  if (input.moduleTempC === null) {
    add("module-temperature-missing", "No back-sheet temperature: the cell temperature is estimated from the air temperature with the NOCT model.");
  } else if (input.irradianceWm2 > 300 && input.moduleTempC < input.airTempC - MODULE_COLDER_THAN_AIR_C) {
    add(
      "module-colder-than-air",
      `The back sheet (${round(input.moduleTempC, 1)} °C) read colder than the air (${round(input.airTempC, 1)} °C) in sun: check the thermometer.`,
    );
  }
  const ratio = input.stcPmaxW / input.nameplatePmaxW;
  if (ratio < PLAUSIBLE_RATIO_MIN || ratio > PLAUSIBLE_RATIO_MAX) {
    add("far-from-nameplate", `The STC value is ${round(100 * ratio)} % of nameplate: check the units, the wiring and for shade.`);
  }

  const sweep = input.sweep;
  if (sweep) {
    if (sweep.pointCount < SPARSE_SWEEP_POINTS) {
      add("sparse-sweep", `The sweep has ${sweep.pointCount} points (fewer than ${SPARSE_SWEEP_POINTS}): the maximum power point is coarsely located.`);
    } else if (sweep.kneeStepV > COARSE_KNEE_FRACTION_OF_VOC * sweep.vocV) {
      add(
        "sparse-sweep",
        `Points near the maximum power point are ${round(sweep.kneeStepV, 2)} V apart (over ${round(100 * COARSE_KNEE_FRACTION_OF_VOC)} % of Voc): the peak is coarsely located.`,
      );
    }
    if (sweep.durationS !== null && sweep.durationS > SLOW_SWEEP_S) {
      add(
        "slow-sweep",
        `The sweep took ${round(sweep.durationS, 1)} s (over ${SLOW_SWEEP_S} s): the sun and the module's temperature may have changed during it.`,
      );
    }
    if (sweep.iscExtrapolated || sweep.vocExtrapolated) {
      const ends = [sweep.iscExtrapolated ? "Isc" : null, sweep.vocExtrapolated ? "Voc" : null].filter(Boolean).join(" and ");
      add(
        "sweep-extrapolated",
        `${ends} extrapolated: the sweep does not reach ${sweep.iscExtrapolated && sweep.vocExtrapolated ? "either end" : "one end"} of the curve. ${sweep.notes.join(" ")}`.trim(),
      );
    }
  }
  return flags;
}
