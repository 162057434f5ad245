// Team-entered exchange rates: each says how many units of `to` one unit of `from` buys, on a date.
// A conversion always reports the rate it used, so a quote can show it.
import Decimal from "decimal.js";
import { money, type Money } from "./money";

export interface ExchangeRate {
  from: string;
  to: string;
  rate: Decimal;
  /** ISO date the team took the rate on. */
  asOf: string;
}

export interface Conversion {
  result: Money;
  rate: ExchangeRate | null;
}

/**
 * Converts with the newest rate on or before `onDate` for the pair, or the inverse of the reverse
 * pair when only that was entered. Unrounded: round once, where the amount is used.
 */
export function convertMoney(amount: Money, to: string, rates: readonly ExchangeRate[], onDate?: string): Conversion {
  const target = to.toUpperCase();
  if (amount.currency === target) return { result: amount, rate: null };
  const usable = rates.filter((r) => !onDate || r.asOf <= onDate);
  const newest = (list: ExchangeRate[]) => list.sort((a, b) => (a.asOf < b.asOf ? 1 : -1))[0];
  const direct = newest(usable.filter((r) => r.from === amount.currency && r.to === target));
  if (direct) return { result: money(amount.amount.times(direct.rate), target), rate: direct };
  const reverse = newest(usable.filter((r) => r.from === target && r.to === amount.currency));
  if (reverse) {
    const inverse: ExchangeRate = { from: amount.currency, to: target, rate: new Decimal(1).dividedBy(reverse.rate), asOf: reverse.asOf };
    return { result: money(amount.amount.dividedBy(reverse.rate), target), rate: inverse };
  }
  throw new MissingRateError(amount.currency, target);
}

export class MissingRateError extends Error {
  constructor(
    readonly from: string,
    readonly to: string,
  ) {
    super(`No exchange rate from ${from} to ${to}: add one in the team's rates.`);
  }
}
