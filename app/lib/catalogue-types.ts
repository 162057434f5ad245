// What the catalogue's pages and API hand out per part (camelCase, units in the names).
import type { BatteryChemistry, CellTechnology, ControllerKind, NominalTempKind, PartKind } from "~/domain/catalogue/part-kinds";

export interface ModuleItem {
  id: string;
  maker: string;
  model: string;
  cellTechnology: CellTechnology;
  cellsInSeries: number;
  pmaxW: number;
  vmpV: number;
  impA: number;
  vocV: number;
  iscA: number;
  gammaPmaxPctPerC: number;
  betaVocPctPerC: number;
  alphaIscPctPerC: number;
  nominalTempKind: NominalTempKind;
  noctC: number;
  lengthMm: number;
  widthMm: number;
  massKg: number;
  areaM2: number;
  nameplateDensityWm2: number;
  nameplateEfficiencyPct: number;
  /** Median of approved readings at STC (weighted); null until a reading is approved. */
  verifiedPmaxW: number | null;
  readingCount: number;
  /** Scaled MAD of approved readings as a share of their median; null below two readings. */
  spreadPct: number | null;
  verifiedRatio: number | null;
  measuredDensityWm2: number | null;
  mergedIntoId: string | null;
}

export interface BatteryItem {
  id: string;
  maker: string;
  model: string;
  chemistry: BatteryChemistry;
  nominalVoltageV: number;
  capacityAh: number;
  capacityHourRateH: number;
  usableDodPct: number;
  cycleLife: number;
  roundTripEfficiencyPct: number;
  massKg: number | null;
  energyKWh: number;
  usableEnergyKWh: number;
}

export interface ControllerItem {
  id: string;
  maker: string;
  model: string;
  kind: ControllerKind;
  batteryVoltagesV: number[];
  /** Rated PV power per nominal battery voltage, e.g. { "12": 520, "24": 1040 }. */
  maxPvPowerW: Record<string, number>;
  maxPvVocV: number;
  maxChargeCurrentA: number;
  efficiencyPct: number;
}

export interface InverterItem {
  id: string;
  maker: string;
  model: string;
  continuousW: number;
  surgeW: number;
  dcInputVoltageV: number;
  efficiencyPct: number;
  idleDrawW: number;
}

export type PartItem<K extends PartKind> = K extends "modules"
  ? ModuleItem
  : K extends "batteries"
    ? BatteryItem
    : K extends "controllers"
      ? ControllerItem
      : InverterItem;

export interface PartPage<K extends PartKind> {
  items: PartItem<K>[];
  total: number;
}

export interface ReadingPoint {
  /** The reading's order among the module's approved readings (1 = oldest). */
  index: number;
  takenAt: string;
  stcPmaxW: number;
  irradianceSource: "pyranometer" | "reference-cell" | "clear-sky-estimate";
  kind: "single" | "sweep";
}

export interface ReadingsSummary {
  approvedCount: number;
  verifiedPmaxW: number | null;
  spreadPct: number | null;
  verifiedRatio: number | null;
  measuredDensityWm2: number | null;
  minStcPmaxW: number | null;
  maxStcPmaxW: number | null;
  /** The approved readings at STC, oldest first (at most the latest 500); no submitter or place. */
  points: ReadingPoint[];
}
