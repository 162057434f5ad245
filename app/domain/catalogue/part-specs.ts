// The figures a curator enters for each part kind, in the units of the trade. The same shapes come
// from the edit forms and from CSV rows; validation and derived figures work on them.
import type { BatteryChemistry, CellTechnology, ControllerKind, NominalTempKind } from "./part-kinds";

export interface ModuleNameplate {
  maker: string;
  model: string;
  cellTechnology: CellTechnology;
  cellsInSeries: number;
  /** All electrical figures at STC (1000 W/m², 25 °C cell, AM1.5; IEC 60904-3). */
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
}

export interface BatterySpec {
  maker: string;
  model: string;
  chemistry: BatteryChemistry;
  nominalVoltageV: number;
  capacityAh: number;
  /** The discharge time the capacity is rated at, e.g. 20 for C20. */
  capacityHourRateH: number;
  usableDodPct: number;
  cycleLife: number;
  roundTripEfficiencyPct: number;
  massKg: number | null;
}

export interface ControllerSpec {
  maker: string;
  model: string;
  kind: ControllerKind;
  /** Rated PV power per nominal battery voltage; null where the controller does not charge that bank. */
  maxPvPower12W: number | null;
  maxPvPower24W: number | null;
  maxPvPower36W: number | null;
  maxPvPower48W: number | null;
  maxPvVocV: number;
  maxChargeCurrentA: number;
  efficiencyPct: number;
}

export interface InverterSpec {
  maker: string;
  model: string;
  continuousW: number;
  surgeW: number;
  dcInputVoltageV: number;
  efficiencyPct: number;
  idleDrawW: number;
}

export const CONTROLLER_POWER_FIELDS = [
  [12, "maxPvPower12W"],
  [24, "maxPvPower24W"],
  [36, "maxPvPower36W"],
  [48, "maxPvPower48W"],
] as const;

/** The controller's ratings as (battery voltage, max PV power) pairs, lowest voltage first. */
export function controllerRatings(spec: Pick<ControllerSpec, "maxPvPower12W" | "maxPvPower24W" | "maxPvPower36W" | "maxPvPower48W">) {
  return CONTROLLER_POWER_FIELDS.flatMap(([batteryVoltageV, field]) => {
    const maxPvPowerW = spec[field];
    return maxPvPowerW === null || maxPvPowerW === undefined ? [] : [{ batteryVoltageV, maxPvPowerW, field }];
  });
}
