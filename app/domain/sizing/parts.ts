// The parts a kit plan is made of, in the domain's own words (the catalogue tables map onto these).
import type { ModuleSpec } from "../solar/yield-types";

export type SystemVoltage = 12 | 24 | 48;
export const SYSTEM_VOLTAGES: readonly SystemVoltage[] = [12, 24, 48];

export interface ModulePart extends ModuleSpec {
  cellsInSeries: number;
  /** Median STC power of approved field readings, W; null when there are none. */
  verifiedPmaxW?: number | null;
  verifiedReadingCount?: number;
  /** The module's maximum series fuse rating from its datasheet, A, when known. */
  maxSeriesFuseA?: number | null;
  /** Length × width from the catalogue, m², when known (for the plan's area limit). */
  areaM2?: number | null;
}

export type BatteryChemistry = "lead-acid-flooded" | "lead-acid-agm" | "lead-acid-gel" | "lifepo4" | "nmc";

export interface BatteryPart {
  chemistry: BatteryChemistry;
  nominalVoltageV: number;
  capacityAh: number;
  /** Hour rate of the capacity figure (C20 → 20). */
  capacityHourRateH: number;
  usableDodPct: number;
  cycleLife: number;
  roundTripEfficiencyPct: number;
  /** Peukert exponent when the maker gives one; otherwise a typical value for the chemistry is used. */
  peukertExponent?: number;
}

export type ControllerKind = "pwm" | "mppt";

export interface ControllerPart {
  kind: ControllerKind;
  batteryVoltagesV: readonly number[];
  maxPvVocV: number;
  maxChargeCurrentA: number;
  /** Rated PV power per nominal battery voltage, e.g. { "12": 520, "24": 1040 }. */
  maxPvPowerW: Readonly<Record<string, number>>;
  efficiencyPct: number;
}

export interface InverterPart {
  continuousW: number;
  surgeW: number;
  dcInputVoltageV: number;
  efficiencyPct: number;
  idleDrawW: number;
}

export function isLeadAcid(chemistry: BatteryChemistry): boolean {
  return chemistry.startsWith("lead-acid");
}

export const CHEMISTRY_LABELS: Record<BatteryChemistry, string> = {
  "lead-acid-flooded": "flooded lead-acid",
  "lead-acid-agm": "AGM lead-acid",
  "lead-acid-gel": "gel lead-acid",
  lifepo4: "LiFePO4",
  nmc: "NMC lithium-ion",
};
