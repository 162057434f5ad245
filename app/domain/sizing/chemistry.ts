// Properties of battery chemistries used by the sizing. All values here are typical figures of the
// trade, recalled rather than read in a cited source: they are marked as such and a battery maker's
// datasheet always wins.
import type { BatteryChemistry } from "./parts";
import { isLeadAcid } from "./parts";

/**
 * Highest charging (absorption) voltage per 12 V nominal, V — what an MPPT string must still exceed
 * on a hot afternoon (common practice, from memory; equalising flooded batteries goes higher still).
 */
export const CHARGE_VOLTAGE_PER_12V: Record<BatteryChemistry, number> = {
  "lead-acid-flooded": 14.8,
  "lead-acid-agm": 14.7,
  "lead-acid-gel": 14.4,
  lifepo4: 14.6,
  nmc: 14.7,
};

/** The bank's charging voltage, V: the per-12 V figure scaled to the system voltage. */
export function bankChargeVoltageV(systemVoltageV: number, chemistry: BatteryChemistry): number {
  return (systemVoltageV / 12) * CHARGE_VOLTAGE_PER_12V[chemistry];
}

/**
 * Voltage per 12 V nominal at which an inverter typically cuts out; the battery→inverter current is
 * worked out at this voltage because the current is highest there (common practice, from memory).
 */
export const INVERTER_CUTOUT_VOLTAGE_PER_12V = 10.5;

/** Typical Peukert exponents when the maker gives none (from memory: lead-acid 1.1–1.3, lithium near 1). */
export const TYPICAL_PEUKERT_EXPONENT: Record<BatteryChemistry, number> = {
  "lead-acid-flooded": 1.25,
  "lead-acid-agm": 1.12,
  "lead-acid-gel": 1.15,
  lifepo4: 1.05,
  nmc: 1.05,
};

/**
 * Fraction of the rated (25 °C) capacity available at a battery temperature. From memory, common
 * practice: lead-acid loses roughly 0.9 % per °C below 25 °C (about 80 % at 0 °C, 60 % at −20 °C);
 * lithium cells lose less, about 0.5 % per °C. No credit is taken above 25 °C. The floor keeps the
 * linear rule from running past where it was ever meant to apply.
 */
export function capacityTemperatureFactor(chemistry: BatteryChemistry, batteryTempC: number): number {
  const lossPerC = isLeadAcid(chemistry) ? 0.009 : 0.005;
  const floor = isLeadAcid(chemistry) ? 0.4 : 0.6;
  if (batteryTempC >= 25) return 1;
  return Math.max(floor, 1 - lossPerC * (25 - batteryTempC));
}

/** Lowest charging temperature of lithium iron phosphate and NMC cells (common practice: no charging below 0 °C). */
export const LITHIUM_MIN_CHARGE_TEMP_C = 0;
