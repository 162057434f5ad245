// Metric (mm²) copper conductors for the cable sizing.
//
// Resistance is COMPUTED, not read from a table: R′ = ρ20·(1 + α·(T − 20 °C))/A with the annealed-copper
// resistivity ρ20 = 1.7241e-8 Ω·m and α = 0.00393/K (values in the project's REFERENCES), at the same
// 75 °C conductor temperature as the AWG table. This is the resistance of the nominal copper area; a real
// fine-stranded (IEC 60228 class 5) cable is allowed a somewhat higher resistance by that standard, whose
// maximum values are not reproduced here because they could not be checked. The kit plan therefore adds
// a stranding allowance (METRIC_STRANDING_ALLOWANCE below; common practice, no source).
// Ampacity: IEC 60364-5-52, copper, PVC insulation (70 °C), two loaded conductors, installation method C
// (clipped direct), 30 °C ambient — FROM MEMORY; check the edition in force and the cable maker's figures
// (PV cable to EN 50618 is rated higher; hot roofs and bundling rate lower).

export const COPPER_RESISTIVITY_20C_OHM_M = 1.7241e-8;
export const COPPER_TEMPERATURE_COEFFICIENT_PER_K = 0.00393;
/** Conductor temperature for the computed resistance, matching NEC Chapter 9 Table 8. */
export const METRIC_CONDUCTOR_TEMPERATURE_C = 75;
/**
 * Extra resistance of fine stranding over the nominal solid area (common practice, no source: a few
 * per cent; 5 % is taken so the computed value leans to the safe side).
 */
export const METRIC_STRANDING_ALLOWANCE = 0.05;

export interface MetricCopperRow {
  areaMm2: number;
  ampacityA: number;
}

export const METRIC_COPPER_TABLE_SOURCE =
  "Resistance computed from ρ20 = 1.7241e-8 Ω·m and α = 0.00393/K at 75 °C plus a 5 % stranding allowance. " +
  "Ampacity: IEC 60364-5-52, copper/PVC, two loaded conductors, method C, 30 °C (from memory).";

export const METRIC_COPPER: readonly MetricCopperRow[] = [
  { areaMm2: 1.5, ampacityA: 19.5 },
  { areaMm2: 2.5, ampacityA: 27 },
  { areaMm2: 4, ampacityA: 36 },
  { areaMm2: 6, ampacityA: 46 },
  { areaMm2: 10, ampacityA: 63 },
  { areaMm2: 16, ampacityA: 85 },
  { areaMm2: 25, ampacityA: 112 },
  { areaMm2: 35, ampacityA: 138 },
  { areaMm2: 50, ampacityA: 168 },
  { areaMm2: 70, ampacityA: 213 },
  { areaMm2: 95, ampacityA: 258 },
  { areaMm2: 120, ampacityA: 299 },
];
