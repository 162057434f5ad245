// Normalising a field reading to standard test conditions (1000 W/m², 25 °C cell).
import { cellTemperatureFromBackSheetC, noctCellTemperatureC, SANDIA_OPEN_RACK_DELTA_T_C } from "./cell-temperature";
import { STC_CELL_TEMPERATURE_C, STC_IRRADIANCE_WM2 } from "./module-power";
import type { SweepPoint } from "./load-sweep";

/** IEC 60891 procedure 1 coefficients, absolute units. */
export interface Iec60891Coefficients {
  /** Current temperature coefficient α, A/K. */
  alphaAPerK: number;
  /** Voltage temperature coefficient β, V/K (negative). */
  betaVPerK: number;
  /** Internal series resistance Rs, Ω. */
  rsOhm: number;
  /** Curve correction factor κ, Ω/K. */
  kappaOhmPerK: number;
}

export interface MeasurementConditions {
  irradianceWm2: number;
  cellTemperatureC: number;
}

/** Datasheet %/°C → absolute: α = (α%/100)·Isc, β = (β%/100)·Voc. */
export function absoluteCoefficient(coefficientPctPerC: number, stcValue: number): number {
  return (coefficientPctPerC / 100) * stcValue;
}

/**
 * IEC 60891 procedure 1, applied to every point of a measured curve:
 *   I2 = I1 + Isc1·(G2/G1 − 1) + α·(T2 − T1)
 *   V2 = V1 − Rs·(I2 − I1) − κ·I2·(T2 − T1) + β·(T2 − T1)
 * Isc1 is the short-circuit current of the measured curve (from analyzeLoadSweep).
 */
export function translateCurveIec60891Procedure1(
  points: readonly SweepPoint[],
  iscMeasuredA: number,
  from: MeasurementConditions,
  to: MeasurementConditions,
  coefficients: Iec60891Coefficients,
): SweepPoint[] {
  const deltaTK = to.cellTemperatureC - from.cellTemperatureC;
  const currentShiftA = iscMeasuredA * (to.irradianceWm2 / from.irradianceWm2 - 1) + coefficients.alphaAPerK * deltaTK;
  return points.map((p) => {
    const currentA = p.currentA + currentShiftA;
    const voltageV =
      p.voltageV - coefficients.rsOhm * (currentA - p.currentA) - coefficients.kappaOhmPerK * currentA * deltaTK + coefficients.betaVPerK * deltaTK;
    return { voltageV, currentA };
  });
}

/** The conditions of standard test: 1000 W/m², 25 °C cell. */
export const STC_CONDITIONS: MeasurementConditions = {
  irradianceWm2: STC_IRRADIANCE_WM2,
  cellTemperatureC: STC_CELL_TEMPERATURE_C,
};

/**
 * Fallback when only a Pmax reading exists: P_STC = P·(1000/G)/(1 + γ(Tc − 25)), the linear
 * power model of module-power.ts solved for P0. γ in 1/°C.
 */
export function pmaxToStcW(measuredPmaxW: number, conditions: MeasurementConditions, gammaPerC: number): number {
  return (measuredPmaxW * (STC_IRRADIANCE_WM2 / conditions.irradianceWm2)) / (1 + gammaPerC * (conditions.cellTemperatureC - STC_CELL_TEMPERATURE_C));
}

export type ReadingTemperature = { kind: "back-sheet"; backSheetC: number; deltaTC?: number } | { kind: "air"; airC: number; noctC: number };

/**
 * Cell temperature of a reading: from a back-of-module thermometer plus the Sandia cell-to-back
 * difference (King et al. 2004, ΔT = 3 °C open rack), or else estimated from air temperature
 * and irradiance with the NOCT model.
 */
export function readingCellTemperatureC(source: ReadingTemperature, irradianceWm2: number): number {
  if (source.kind === "back-sheet") {
    return cellTemperatureFromBackSheetC(source.backSheetC, irradianceWm2, source.deltaTC ?? SANDIA_OPEN_RACK_DELTA_T_C);
  }
  return noctCellTemperatureC(source.airC, irradianceWm2, source.noctC);
}
