// Conductor choice for a DC run: the smallest conductor that keeps the voltage drop within the target
// and can carry the current its overcurrent device lets through.
// Voltage drop over a two-wire run: Vd = 2·L·I·R′ (L one way, R′ per unit length; REFERENCES).
import { AWG_COPPER, AWG_COPPER_TABLE_SOURCE } from "../../../data/conductors/awg-copper";
import {
  COPPER_RESISTIVITY_20C_OHM_M,
  COPPER_TEMPERATURE_COEFFICIENT_PER_K,
  METRIC_CONDUCTOR_TEMPERATURE_C,
  METRIC_COPPER,
  METRIC_COPPER_TABLE_SOURCE,
} from "../../../data/conductors/metric-copper";

export type ConductorSystem = "awg" | "mm2";

export const FEET_PER_KM = 1000 / 0.3048;

export interface Conductor {
  /** "10 AWG" or "6 mm²". */
  label: string;
  areaMm2: number;
  /** DC resistance at 75 °C, Ω/km (one conductor). */
  ohmPerKm: number;
  ampacityA: number;
  /** Largest overcurrent device allowed on it, A. */
  maxOvercurrentA: number;
}

/** R′ of copper of a given area at a temperature from ρ20 and α (REFERENCES), Ω/km: the nominal solid area. */
export function copperResistanceOhmPerKm(areaMm2: number, temperatureC: number): number {
  const resistivityOhmM = COPPER_RESISTIVITY_20C_OHM_M * (1 + COPPER_TEMPERATURE_COEFFICIENT_PER_K * (temperatureC - 20));
  return (resistivityOhmM / (areaMm2 * 1e-6)) * 1000;
}

/** A resistance given at 20 °C, at another conductor temperature: R_T = R20·(1 + α·(T − 20 °C)) (REFERENCES). */
export function copperResistanceAt(ohmPerKm20C: number, temperatureC: number): number {
  return ohmPerKm20C * (1 + COPPER_TEMPERATURE_COEFFICIENT_PER_K * (temperatureC - 20));
}

export function conductorTable(system: ConductorSystem): Conductor[] {
  if (system === "awg") {
    return AWG_COPPER.map((row) => ({
      label: `${row.awg} AWG`,
      areaMm2: row.areaMm2,
      ohmPerKm: (row.ohmPer1000Ft75C * FEET_PER_KM) / 1000,
      ampacityA: row.ampacity75CA,
      maxOvercurrentA: row.maxOvercurrentA,
    }));
  }
  return METRIC_COPPER.map((row) => ({
    label: `${row.areaMm2} mm²`,
    areaMm2: row.areaMm2,
    ohmPerKm: copperResistanceAt(row.maxOhmPerKm20C, METRIC_CONDUCTOR_TEMPERATURE_C),
    ampacityA: row.ampacityA,
    maxOvercurrentA: row.ampacityA,
  }));
}

export function conductorTableSource(system: ConductorSystem): string {
  return system === "awg" ? AWG_COPPER_TABLE_SOURCE : METRIC_COPPER_TABLE_SOURCE;
}

/** Vd = 2·L·I·R′, volts. */
export function voltageDropV(oneWayLengthM: number, currentA: number, ohmPerKm: number): number {
  return (2 * oneWayLengthM * currentA * ohmPerKm) / 1000;
}

/** Smallest resistance per km that meets a drop target: R′ ≤ Vd,max / (2·L·I). */
export function maxOhmPerKmForDrop(oneWayLengthM: number, currentA: number, maxDropV: number): number {
  if (oneWayLengthM <= 0 || currentA <= 0) return Infinity;
  return (maxDropV * 1000) / (2 * oneWayLengthM * currentA);
}

export interface ConductorChoice {
  /** The chosen conductor; null when even the largest in the table cannot carry the protected current. */
  conductor: Conductor | null;
  /** Null when no conductor was found. */
  dropV: number | null;
  dropPct: number | null;
  meetsDropTarget: boolean;
  /** What decided the size: the current it must carry, or the voltage-drop target. */
  limitedBy: "voltage-drop" | "current";
}

/**
 * Chooses a conductor: at least `minAmpacityA` of ampacity and a largest allowed overcurrent device of
 * at least `protectionA` (so the fuse protects the cable), and the smallest such size that also meets
 * the drop target — or the largest of the table when none does (the drop check then warns).
 */
export function chooseConductor(
  system: ConductorSystem,
  run: { oneWayLengthM: number; currentA: number; voltageV: number; dropTargetPct: number; minAmpacityA: number; protectionA: number | null },
): ConductorChoice {
  const table = conductorTable(system);
  const carries = table.filter((c) => c.ampacityA >= run.minAmpacityA && (run.protectionA === null || c.maxOvercurrentA >= run.protectionA));
  if (carries.length === 0) return { conductor: null, dropV: null, dropPct: null, meetsDropTarget: false, limitedBy: "current" };
  const maxDropV = (run.dropTargetPct / 100) * run.voltageV;
  const meeting = carries.find((c) => voltageDropV(run.oneWayLengthM, run.currentA, c.ohmPerKm) <= maxDropV + 1e-12);
  const conductor = meeting ?? carries[carries.length - 1];
  const dropV = voltageDropV(run.oneWayLengthM, run.currentA, conductor.ohmPerKm);
  return {
    conductor,
    dropV,
    dropPct: (100 * dropV) / run.voltageV,
    meetsDropTarget: meeting !== undefined,
    limitedBy: meeting === carries[0] ? "current" : "voltage-drop",
  };
}
