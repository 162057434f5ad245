// A field reading normalised to standard test conditions (1000 W/m², 25 °C cell), with the
// conditions the engine worked out (sun position, clear-sky estimate, cell temperature), the
// uncertainty, the weight and the flags. Pure: runs in the browser for the live preview and on the
// server when the reading is stored, so both show the same numbers.
//
// Method: P_STC = P·(1000/G)/(1 + γ(Tc − 25)), the Pmax translation with the datasheet's power
// coefficient (stc-translation.ts). Cell temperature from the back sheet (King et al. 2004) or,
// without one, from air temperature by the NOCT model. Irradiance measured in plane, or the
// Haurwitz (1945) clear-sky estimate transposed to the module's plane (instant-irradiance.ts).
import { readingCellTemperatureC, pmaxToStcW } from "../solar/stc-translation";
import { clearSkyPlaneOfArrayAt } from "../solar/instant-irradiance";
import { sunPositionAt } from "../solar/sun-position";
import type { SweepAnalysis, SweepPoint } from "../solar/load-sweep";
import { readingFlags, type ReadingFlag } from "./reading-flags";
import {
  combinedUncertaintyPct,
  readingWeight,
  uncertaintyTerms,
  type CellTemperatureSource,
  type IrradianceSource,
  type UncertaintyTerm,
} from "./reading-uncertainty";

/** Below this in-plane irradiance a reading cannot be scaled to 1000 W/m² with any confidence. */
export const MIN_READING_IRRADIANCE_WM2 = 100;
/** Ground reflectance assumed for the clear-sky estimate (grass, soil; common practice, no source). */
export const ESTIMATE_ALBEDO = 0.2;
/** A reading may be stamped a little ahead of the server's clock (clock drift). */
const FUTURE_TOLERANCE_MS = 10 * 60_000;

export interface ReadingModule {
  pmaxW: number;
  gammaPmaxPctPerC: number;
  noctC: number;
}

export type MeasuredPower =
  | { kind: "single"; pmaxW: number }
  | { kind: "sweep"; points: readonly SweepPoint[]; analysis: Extract<SweepAnalysis, { ok: true }>; durationS: number | null };

export type IrradianceInput = { source: "pyranometer" | "reference-cell"; irradianceWm2: number } | { source: "clear-sky-estimate" };

export interface ReadingInput {
  module: ReadingModule;
  measured: MeasuredPower;
  takenAtUtc: Date;
  latitudeDeg: number;
  longitudeDeg: number;
  tiltDeg: number;
  azimuthDeg: number;
  airTempC: number;
  moduleTempC: number | null;
  irradiance: IrradianceInput;
  now?: Date;
}

/** The engine's working, stored with the reading (field_reading.normalisation). */
export interface ReadingWorking {
  method: "pmax-gamma";
  sunElevationDeg: number;
  sunAzimuthDeg: number;
  incidenceDeg: number;
  clearSkyPoaWm2: number;
  cellTempSource: CellTemperatureSource;
  uncertaintyTerms: UncertaintyTerm[];
  nameplatePmaxW: number;
}

export interface NormalisedReading {
  measuredPmaxW: number;
  irradianceWm2: number;
  irradianceSource: IrradianceSource;
  cellTempC: number;
  stcPmaxW: number;
  ratioToNameplate: number;
  uncertaintyPct: number;
  weight: number;
  flags: ReadingFlag[];
  working: ReadingWorking;
}

export type NormaliseOutcome = { ok: true; reading: NormalisedReading } | { ok: false; field: string; message: string };

/** Largest voltage step on either side of the sample nearest the maximum power point, V. */
export function kneeStepV(points: readonly SweepPoint[], vmpV: number): number {
  const voltages = points.map((p) => p.voltageV).sort((a, b) => a - b);
  let nearest = 0;
  for (let k = 1; k < voltages.length; k++) if (Math.abs(voltages[k] - vmpV) < Math.abs(voltages[nearest] - vmpV)) nearest = k;
  const before = nearest > 0 ? voltages[nearest] - voltages[nearest - 1] : 0;
  const after = nearest < voltages.length - 1 ? voltages[nearest + 1] - voltages[nearest] : 0;
  return Math.max(before, after);
}

export function normaliseReading(input: ReadingInput): NormaliseOutcome {
  const now = input.now ?? new Date();
  if (input.takenAtUtc.getTime() > now.getTime() + FUTURE_TOLERANCE_MS) {
    return { ok: false, field: "takenAtLocal", message: "The time of the reading is in the future; check the date, time and UTC offset." };
  }
  const sun = sunPositionAt(input.takenAtUtc, input.latitudeDeg, input.longitudeDeg);
  const clearSky = clearSkyPlaneOfArrayAt({
    instantUtc: input.takenAtUtc,
    latitudeDeg: input.latitudeDeg,
    longitudeDeg: input.longitudeDeg,
    tiltDeg: input.tiltDeg,
    azimuthDeg: input.azimuthDeg,
    albedo: ESTIMATE_ALBEDO,
  });
  const estimated = input.irradiance.source === "clear-sky-estimate";
  if (sun.elevationDeg <= 0) {
    return {
      ok: false,
      field: "takenAtLocal",
      message: `The sun was below the horizon (${sun.elevationDeg.toFixed(1)}°) at that time and place; check the date, time, UTC offset and coordinates.`,
    };
  }
  const irradianceWm2 = input.irradiance.source === "clear-sky-estimate" ? clearSky.poaWm2 : input.irradiance.irradianceWm2;
  if (estimated && irradianceWm2 < MIN_READING_IRRADIANCE_WM2) {
    return {
      ok: false,
      field: "irradianceSource",
      message: `A clear sky gives only ${irradianceWm2.toFixed(0)} W/m² on the module at that time: too little to normalise. Measure the irradiance, or check the time and orientation.`,
    };
  }
  if (!estimated && irradianceWm2 < MIN_READING_IRRADIANCE_WM2) {
    return { ok: false, field: "irradianceWm2", message: `Below ${MIN_READING_IRRADIANCE_WM2} W/m² a reading cannot be normalised to STC.` };
  }

  const cellTempSource: CellTemperatureSource = input.moduleTempC === null ? "air-noct" : "back-sheet";
  const cellTempC =
    input.moduleTempC === null
      ? readingCellTemperatureC({ kind: "air", airC: input.airTempC, noctC: input.module.noctC }, irradianceWm2)
      : readingCellTemperatureC({ kind: "back-sheet", backSheetC: input.moduleTempC }, irradianceWm2);
  const measuredPmaxW = input.measured.kind === "single" ? input.measured.pmaxW : input.measured.analysis.pmaxW;
  const stcPmaxW = pmaxToStcW(measuredPmaxW, { irradianceWm2, cellTemperatureC: cellTempC }, input.module.gammaPmaxPctPerC / 100);

  const terms = uncertaintyTerms({
    irradianceSource: input.irradiance.source,
    irradianceWm2,
    cellTemperatureSource: cellTempSource,
    gammaPmaxPctPerC: input.module.gammaPmaxPctPerC,
    measurementKind: input.measured.kind,
  });
  const measured = input.measured;
  const flags = readingFlags({
    sunElevationDeg: sun.elevationDeg,
    incidenceDeg: clearSky.incidenceDeg,
    irradianceWm2,
    irradianceEstimated: estimated,
    clearSkyPoaWm2: clearSky.poaWm2,
    airTempC: input.airTempC,
    moduleTempC: input.moduleTempC,
    stcPmaxW,
    nameplatePmaxW: input.module.pmaxW,
    sweep:
      measured.kind === "sweep"
        ? {
            pointCount: measured.analysis.pointCount,
            kneeStepV: kneeStepV(measured.points, measured.analysis.vmpV),
            vocV: measured.analysis.vocV,
            iscExtrapolated: measured.analysis.iscExtrapolated,
            vocExtrapolated: measured.analysis.vocExtrapolated,
            notes: measured.analysis.notes,
            durationS: measured.durationS,
          }
        : null,
  });
  return {
    ok: true,
    reading: {
      measuredPmaxW,
      irradianceWm2,
      irradianceSource: input.irradiance.source,
      cellTempC,
      stcPmaxW,
      ratioToNameplate: stcPmaxW / input.module.pmaxW,
      uncertaintyPct: combinedUncertaintyPct(terms),
      weight: readingWeight(input.irradiance.source),
      flags,
      working: {
        method: "pmax-gamma",
        sunElevationDeg: sun.elevationDeg,
        sunAzimuthDeg: sun.azimuthDeg,
        incidenceDeg: clearSky.incidenceDeg,
        clearSkyPoaWm2: clearSky.poaWm2,
        cellTempSource,
        uncertaintyTerms: terms,
        nameplatePmaxW: input.module.pmaxW,
      },
    },
  };
}
