// How many of one battery model make the bank a comparison asks for. A 2 V cell and a 12 V block are
// not bought in the same numbers: each model needs enough in series for the bank's voltage and enough
// strings in parallel for the usable energy at its own depth of discharge and cold-temperature
// capacity. The sizing's own bank rule does the arithmetic, so a comparison opened from a plan counts
// the plan's battery exactly as the plan does.
import { batteryVoltageClassV, sizeBatteryBank } from "../sizing/battery-bank";
import type { BatteryChemistry, SystemVoltage } from "../sizing/parts";
import type { BatteryFigures } from "./offer-facts";

export interface BankNeed {
  /** The bank's nominal voltage, V. */
  bankVoltageV: number;
  /** Usable energy the bank must hold (daily load × days of autonomy), Wh. */
  usableWh: number;
  /** Lowest battery temperature the capacity must hold at, °C. */
  batteryTempC: number;
  /** Design limit on depth of discharge, %; a battery's own usable depth applies when lower. */
  maxDepthOfDischargePct: number | null;
}

export interface BankForModel {
  batteriesInSeries: number;
  stringsInParallel: number;
  count: number;
  /** False when the bank voltage is not a whole number of this battery's voltage class. */
  seriesExact: boolean;
  /** The battery's voltage class (a 12.8 V lithium block serves 12 V). */
  classV: number;
  /** Usable energy of that many at the design temperature and depth, Wh. */
  bankUsableWh: number;
  effectiveDodPct: number;
  temperatureFactor: number;
}

export function bankForModel(battery: BatteryFigures, need: BankNeed): BankForModel {
  const sizing = sizeBatteryBank({
    battery: {
      // The catalogue only stores the chemistries the sizing knows.
      chemistry: battery.chemistry as BatteryChemistry,
      nominalVoltageV: battery.nominalVoltageV,
      capacityAh: battery.capacityAh,
      capacityHourRateH: battery.capacityHourRateH,
      usableDodPct: battery.usableDodPct,
      cycleLife: battery.cycleLife,
      roundTripEfficiencyPct: battery.roundTripEfficiencyPct,
    },
    // The rule is the same for any bank voltage; the comparison lets one be typed (e.g. 36 V).
    systemVoltageV: need.bankVoltageV as SystemVoltage,
    // One "day" of the whole usable energy: the same required usable Wh as load × autonomy days.
    dailyLoadWh: need.usableWh,
    autonomyDays: 1,
    maxDepthOfDischargePct: need.maxDepthOfDischargePct ?? undefined,
    batteryTempC: need.batteryTempC,
  });
  return {
    batteriesInSeries: sizing.batteriesInSeries,
    stringsInParallel: sizing.stringsInParallel,
    count: sizing.batteryCount,
    seriesExact: sizing.seriesExact,
    classV: batteryVoltageClassV(battery.nominalVoltageV),
    bankUsableWh: sizing.bankUsableWh,
    effectiveDodPct: sizing.effectiveDodPct,
    temperatureFactor: sizing.temperatureFactor,
  };
}
