// Metric (mm²) copper conductors for the cable sizing.
//
// Resistance: IEC 60228 Table 3, class 5 (flexible) plain annealed copper, maximum DC resistance at 20 °C
// in Ω/km. PV cable (EN 50618) and battery leads are class 5, so its limits are the ones a real cable may
// reach; a class 2 (stranded, fixed installation) cable is a few per cent lower, so these values lean to
// the safe side. Read from two independent reproductions of the table (mycableengineering.com, "IEC 60228
// DC resistance"; nationalcables.com, "IEC 60228 conductor classes", which agrees up to 25 mm²). The kit
// plan corrects them to the same 75 °C conductor temperature as the AWG table with copper's α.
// Ampacity: IEC 60364-5-52, copper, PVC insulation (70 °C), two loaded conductors, installation method C
// (clipped direct), 30 °C ambient — FROM MEMORY; check the edition in force and the cable maker's figures
// (PV cable to EN 50618 is rated higher; hot roofs and bundling rate lower).

export const COPPER_RESISTIVITY_20C_OHM_M = 1.7241e-8;
export const COPPER_TEMPERATURE_COEFFICIENT_PER_K = 0.00393;
/** Conductor temperature for the sizing, matching NEC Chapter 9 Table 8. */
export const METRIC_CONDUCTOR_TEMPERATURE_C = 75;

export interface MetricCopperRow {
  areaMm2: number;
  /** IEC 60228 class 5, plain copper: maximum DC resistance at 20 °C, Ω/km. */
  maxOhmPerKm20C: number;
  ampacityA: number;
}

export const METRIC_COPPER_TABLE_SOURCE =
  "Resistance: IEC 60228 Table 3, class 5 flexible plain copper, maximum at 20 °C, corrected to 75 °C with α = 0.00393/K. " +
  "Ampacity: IEC 60364-5-52, copper/PVC, two loaded conductors, method C, 30 °C (from memory).";

export const METRIC_COPPER: readonly MetricCopperRow[] = [
  { areaMm2: 1.5, maxOhmPerKm20C: 13.3, ampacityA: 19.5 },
  { areaMm2: 2.5, maxOhmPerKm20C: 7.98, ampacityA: 27 },
  { areaMm2: 4, maxOhmPerKm20C: 4.95, ampacityA: 36 },
  { areaMm2: 6, maxOhmPerKm20C: 3.3, ampacityA: 46 },
  { areaMm2: 10, maxOhmPerKm20C: 1.91, ampacityA: 63 },
  { areaMm2: 16, maxOhmPerKm20C: 1.21, ampacityA: 85 },
  { areaMm2: 25, maxOhmPerKm20C: 0.78, ampacityA: 112 },
  { areaMm2: 35, maxOhmPerKm20C: 0.554, ampacityA: 138 },
  { areaMm2: 50, maxOhmPerKm20C: 0.386, ampacityA: 168 },
  { areaMm2: 70, maxOhmPerKm20C: 0.272, ampacityA: 213 },
  { areaMm2: 95, maxOhmPerKm20C: 0.206, ampacityA: 258 },
  { areaMm2: 120, maxOhmPerKm20C: 0.161, ampacityA: 299 },
];
