// What an offer costs the team for a quantity: the supplier's landed cost in the offer's currency
// (price breaks, minimum order, shipping; app/domain/money/price-breaks.ts), then the same figures in
// the team's quoting currency with the rate used. A missing rate is reported, never guessed.
import type Decimal from "decimal.js";
import { convertMoney, MissingRateError, type ExchangeRate } from "../money/currency-conversion";
import { roundMoney, type Money } from "../money/money";
import { landedCost, type LandedCost, type OfferTerms } from "../money/price-breaks";

/** The team's quoting currency, its rates, and the day the comparison is made on. */
export interface TeamPricing {
  quotingCurrency: string;
  rates: readonly ExchangeRate[];
  /** ISO date: rates on or before it are used; offers valid until before it are expired. */
  asOf: string;
}

export interface OfferCosting {
  quantityNeeded: number;
  /** In the offer's currency, each line rounded once (price-breaks.ts). */
  landed: LandedCost;
  /** Unit price at the quantity bought, in the quoting currency, unrounded (it is divided further). */
  unitPriceQuoting: Money | null;
  /** Landed total in the quoting currency, rounded once to its minor unit after conversion. */
  totalQuoting: Money | null;
  /** The rate used; null when the offer is already in the quoting currency or no rate exists. */
  rate: ExchangeRate | null;
  /** Set when no rate converts the offer's currency to the quoting currency. */
  missingRate: { from: string; to: string } | null;
}

function convert(amount: Money, pricing: TeamPricing) {
  return convertMoney(amount, pricing.quotingCurrency, pricing.rates, pricing.asOf);
}

export function costOffer(terms: OfferTerms, quantityNeeded: number, pricing: TeamPricing): OfferCosting {
  const landed = landedCost(terms, quantityNeeded);
  try {
    const unit = convert(landed.unitPrice, pricing);
    const total = convert(landed.total, pricing);
    return { quantityNeeded, landed, unitPriceQuoting: unit.result, totalQuoting: roundMoney(total.result), rate: total.rate, missingRate: null };
  } catch (error) {
    if (!(error instanceof MissingRateError)) throw error;
    return { quantityNeeded, landed, unitPriceQuoting: null, totalQuoting: null, rate: null, missingRate: { from: error.from, to: error.to } };
  }
}

/** Decimal text of an amount, for JSON and for the page (never a JavaScript number). */
export function amountText(amount: Decimal): string {
  return amount.toFixed();
}
