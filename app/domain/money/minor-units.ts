// Card processors take amounts as whole numbers of the currency's minor unit (cents, fils, yen).
// The conversion is exact in decimal: an amount that does not fit the minor unit is refused rather
// than rounded, so the customer is never charged a different figure from the one on the quote.
import Decimal from "decimal.js";
import { minorDigits, type Money } from "./money";

export function toMinorUnits(m: Money): number {
  const minor = m.amount.times(Decimal.pow(10, minorDigits(m.currency)));
  if (!minor.isInteger()) throw new RangeError(`${m.amount.toString()} ${m.currency} has more decimals than the currency's minor unit`);
  if (minor.greaterThan(Number.MAX_SAFE_INTEGER)) throw new RangeError(`${m.amount.toString()} ${m.currency} is too large`);
  return minor.toNumber();
}

export function fromMinorUnits(minor: number, currency: string): Money {
  if (!Number.isSafeInteger(minor)) throw new RangeError(`Not a whole number of minor units: ${minor}`);
  const code = currency.toUpperCase();
  return { amount: new Decimal(minor).dividedBy(Decimal.pow(10, minorDigits(code))), currency: code };
}
