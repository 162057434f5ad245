// What a comparison is asked to meet. Typed by the installer today (kept in the page's URL); a saved
// kit plan will supply the same figures later (source: plan), so the comparisons need no change.
import type { OfferPartKind } from "./offer-facts";

export interface ComparisonNeed {
  /** How many units to land. Null means: as many as the need takes — for modules, the energy target;
   * for batteries, each model's own count for the bank (see battery-need.ts). */
  quantity: number | null;
  /** Modules: the array's daily energy target in the design month, Wh/day. */
  arrayEnergyWhPerDay: number;
  /** Modules: the design month's daily irradiation on the array, kWh/m² (= peak sun hours). */
  sunHoursPerDay: number;
  /** Modules: losses between STC power and the battery (temperature, wiring, soiling…), %. */
  systemLossesPct: number;
  /** Batteries, controllers and inverters: the battery bank's nominal voltage, V. */
  batteryVoltageV: number;
  /** Batteries: usable energy the bank must hold (daily load × days of autonomy), Wh. */
  bankUsableWh: number;
  /** Batteries: the lowest battery temperature the bank's capacity must hold at, °C. */
  batteryTempC: number;
  /** Batteries: design limit on depth of discharge, %; null = each battery's own usable depth. */
  maxDepthOfDischargePct: number | null;
  /** Controllers: the array's STC power, W. */
  arrayPowerW: number;
  /** Inverters: the largest AC load running at once, W. */
  peakAcLoadW: number;
  source: { kind: "typed" } | { kind: "plan"; planId: string; label: string };
}

/**
 * Starting figures for a small off-grid cabin (2.4 kWh a day, 3 sun hours in the design month, 20 %
 * losses, a 24 V bank holding two days of that load at 25 °C): round, typical values — common
 * practice, no source.
 */
export const DEFAULT_NEED: Omit<ComparisonNeed, "quantity" | "source"> = {
  arrayEnergyWhPerDay: 2400,
  sunHoursPerDay: 3,
  systemLossesPct: 20,
  batteryVoltageV: 24,
  bankUsableWh: 4800,
  batteryTempC: 25,
  maxDepthOfDischargePct: null,
  arrayPowerW: 1000,
  peakAcLoadW: 800,
};

export const DEFAULT_QUANTITY: Record<OfferPartKind, number | null> = { modules: null, batteries: null, controllers: 1, inverters: 1 };
