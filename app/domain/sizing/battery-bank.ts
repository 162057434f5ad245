// Battery bank for the chosen autonomy: the usable energy must carry the heaviest month's daily load
// for the given number of days without sun, at the chemistry's usable depth of discharge and the
// capacity left at the coldest battery temperature:
//   nominal Wh = daily load × autonomy days ÷ (depth of discharge × temperature factor),
//   Ah at system voltage = nominal Wh ÷ system voltage,
// then batteries in series = system voltage ÷ battery voltage and strings in parallel = ⌈Ah ÷ battery Ah⌉.
import { capacityTemperatureFactor } from "./chemistry";
import type { BatteryPart, SystemVoltage } from "./parts";

export interface BatteryBankInput {
  battery: BatteryPart;
  systemVoltageV: SystemVoltage;
  /** Daily load the bank must carry (the heaviest month's, at the battery bus), Wh. */
  dailyLoadWh: number;
  autonomyDays: number;
  /** Design limit on depth of discharge, %; the battery's own usable depth applies when lower. */
  maxDepthOfDischargePct?: number;
  /** Lowest battery temperature the capacity must hold at, °C. */
  batteryTempC: number;
  /** Force the number of parallel strings (to compare banks). */
  stringsInParallel?: number;
}

export interface BatteryBankSizing {
  effectiveDodPct: number;
  temperatureFactor: number;
  batteryTempC: number;
  requiredUsableWh: number;
  requiredNominalWh: number;
  requiredAh: number;
  batteriesInSeries: number;
  /** False when the system voltage is not a whole multiple of the battery's voltage. */
  seriesExact: boolean;
  stringsInParallel: number;
  batteryCount: number;
  bankAh: number;
  bankNominalWh: number;
  /** Usable energy at the design temperature and depth of discharge, Wh. */
  bankUsableWh: number;
  /** Days the usable energy carries the daily load; null with no load. */
  autonomyDaysAchieved: number | null;
}

export function effectiveDepthOfDischargePct(battery: BatteryPart, maxDepthOfDischargePct?: number): number {
  return Math.min(battery.usableDodPct, maxDepthOfDischargePct ?? battery.usableDodPct);
}

const VOLTAGE_CLASSES_V = [2, 4, 6, 8, 12, 24, 36, 48];

/**
 * The nominal class a battery block belongs to. Lead-acid blocks are exact (2, 6, 12 V); lithium iron
 * phosphate blocks of 12.8, 25.6 and 51.2 V (4, 8 and 16 cells of 3.2 V) serve 12, 24 and 48 V systems
 * (common practice, no source). A block within 8 % of a class counts as that class.
 */
export function batteryVoltageClassV(nominalVoltageV: number): number {
  const match = VOLTAGE_CLASSES_V.find((c) => Math.abs(nominalVoltageV / c - 1) <= 0.08);
  return match ?? nominalVoltageV;
}

export function sizeBatteryBank(input: BatteryBankInput): BatteryBankSizing {
  const { battery, systemVoltageV, dailyLoadWh, autonomyDays, batteryTempC } = input;
  const effectiveDodPct = effectiveDepthOfDischargePct(battery, input.maxDepthOfDischargePct);
  const temperatureFactor = capacityTemperatureFactor(battery.chemistry, batteryTempC);
  const requiredUsableWh = dailyLoadWh * autonomyDays;
  const requiredNominalWh = requiredUsableWh / ((effectiveDodPct / 100) * temperatureFactor);
  const requiredAh = requiredNominalWh / systemVoltageV;
  const seriesRatio = systemVoltageV / batteryVoltageClassV(battery.nominalVoltageV);
  const seriesExact = Math.abs(seriesRatio - Math.round(seriesRatio)) < 1e-9 && Math.round(seriesRatio) >= 1;
  const batteriesInSeries = Math.max(1, Math.round(seriesRatio));
  const stringsInParallel = input.stringsInParallel ?? Math.max(1, Math.ceil(requiredAh / battery.capacityAh - 1e-9));
  const bankAh = stringsInParallel * battery.capacityAh;
  const bankNominalWh = bankAh * batteriesInSeries * battery.nominalVoltageV;
  const bankUsableWh = bankNominalWh * (effectiveDodPct / 100) * temperatureFactor;
  return {
    effectiveDodPct,
    temperatureFactor,
    batteryTempC,
    requiredUsableWh,
    requiredNominalWh,
    requiredAh,
    batteriesInSeries,
    seriesExact,
    stringsInParallel,
    batteryCount: batteriesInSeries * stringsInParallel,
    bankAh,
    bankNominalWh,
    bankUsableWh,
    autonomyDaysAchieved: dailyLoadWh > 0 ? bankUsableWh / dailyLoadWh : null,
  };
}
