// Money is a decimal amount beside its currency: never a float (decimal.js works in base 10).
import Decimal from "decimal.js";

export { Decimal };

export interface Money {
  amount: Decimal;
  /** ISO 4217 code, e.g. "EUR". */
  currency: string;
}

// Minor-unit digits per ISO 4217 for the currencies whose exponent is not 2; every other code has 2.
const MINOR_DIGITS: Record<string, number> = { JPY: 0, KRW: 0, VND: 0, CLP: 0, ISK: 0, UGX: 0, XAF: 0, XOF: 0, BHD: 3, KWD: 3, OMR: 3, JOD: 3, TND: 3 };

export function minorDigits(currency: string): number {
  return MINOR_DIGITS[currency.toUpperCase()] ?? 2;
}

export function isCurrencyCode(code: string): boolean {
  return /^[A-Z]{3}$/.test(code);
}

export function money(amount: Decimal.Value, currency: string): Money {
  const value = new Decimal(amount);
  if (!value.isFinite()) throw new RangeError(`Not a finite amount: ${String(amount)}`);
  return { amount: value, currency: currency.toUpperCase() };
}

/** Rounds to the currency's minor unit, half away from zero (the usual commercial rounding). */
export function roundMoney(m: Money): Money {
  return { amount: m.amount.toDecimalPlaces(minorDigits(m.currency), Decimal.ROUND_HALF_UP), currency: m.currency };
}

function sameCurrency(a: Money, b: Money) {
  if (a.currency !== b.currency) throw new Error(`Cannot combine ${a.currency} with ${b.currency} without a conversion`);
}

export function addMoney(a: Money, b: Money): Money {
  sameCurrency(a, b);
  return { amount: a.amount.plus(b.amount), currency: a.currency };
}

export function sumMoney(items: readonly Money[], currency: string): Money {
  return items.reduce((total, m) => addMoney(total, m), money(0, currency));
}

export function multiplyMoney(m: Money, factor: Decimal.Value): Money {
  return { amount: m.amount.times(factor), currency: m.currency };
}

/** Fixed-point text with exactly the currency's minor digits, e.g. "1234.50". */
export function moneyText(m: Money): string {
  return m.amount.toFixed(minorDigits(m.currency), Decimal.ROUND_HALF_UP);
}

/** For people: "EUR 1,234.50". Grouping is a display concern; stored values use moneyText. */
export function formatMoney(m: Money, locale = "en-GB"): string {
  const digits = minorDigits(m.currency);
  const [whole, fraction] = m.amount.toFixed(digits, Decimal.ROUND_HALF_UP).split(".");
  const sign = whole.startsWith("-") ? "−" : "";
  const grouped = BigInt(whole.replace("-", "")).toLocaleString(locale);
  return `${m.currency} ${sign}${grouped}${fraction ? `.${fraction}` : ""}`;
}
