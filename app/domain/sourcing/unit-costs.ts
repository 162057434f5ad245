// Price per unit of what a part delivers: per watt of module power, per usable kWh of battery, per
// kWh it can cycle over its rated life. Money stays decimal; the physical quantities (watts, kWh,
// cycles) are measurements and enter the division as decimals built from their stored values.
import Decimal from "decimal.js";
import type { Money } from "../money/money";

function positive(value: number | null | undefined): value is number {
  return typeof value === "number" && Number.isFinite(value) && value > 0;
}

function per(price: Money, quantity: Decimal): Money {
  return { amount: price.amount.dividedBy(quantity), currency: price.currency };
}

/** Unit price ÷ watts; null without a power (e.g. no verified figure yet). */
export function pricePerWatt(unitPrice: Money, watts: number | null | undefined): Money | null {
  return positive(watts) ? per(unitPrice, new Decimal(watts)) : null;
}

/** Unit price ÷ usable energy of one unit. */
export function pricePerUsableKWh(unitPrice: Money, usableKWh: number): Money | null {
  return positive(usableKWh) ? per(unitPrice, new Decimal(usableKWh)) : null;
}

/**
 * Unit price ÷ (usable kWh × rated cycles): what each kWh cycled through the battery over its rated
 * life costs in purchase price alone (charging losses, ageing and replacement labour not included).
 * Levelised storage cost in its simplest form — common practice, no source.
 */
export function pricePerCycleKWh(unitPrice: Money, usableKWh: number, cycleLife: number): Money | null {
  return positive(usableKWh) && positive(cycleLife) ? per(unitPrice, new Decimal(usableKWh).times(cycleLife)) : null;
}

/** Unit price ÷ continuous kW (for inverters). */
export function pricePerKW(unitPrice: Money, watts: number): Money | null {
  return positive(watts) ? per(unitPrice, new Decimal(watts).dividedBy(1000)) : null;
}
