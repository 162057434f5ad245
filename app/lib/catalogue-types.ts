// What the catalogue's pages and API hand out per part (camelCase, units in the names).
import type { ControllerKind, PartKind } from "~/domain/catalogue/part-kinds";
import type { BatterySpec, InverterSpec, ModuleNameplate } from "~/domain/catalogue/part-specs";

/** A module as listed: the curator's nameplate figures plus what is derived from them and from readings. */
export interface ModuleItem extends ModuleNameplate {
  id: string;
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

export interface BatteryItem extends BatterySpec {
  id: string;
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

export interface InverterItem extends InverterSpec {
  id: string;
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
