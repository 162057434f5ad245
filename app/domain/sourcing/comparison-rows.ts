// The parts of a comparison row every part kind shares: which offer, and what it costs for the
// quantity in the offer's currency and in the team's quoting currency with the rate used. Rows are
// plain data (decimal text for money) so that they travel to the page and the API unchanged.
import type Decimal from "decimal.js";
import { minorDigits, type Money } from "../money/money";
import type { ExchangeRate } from "../money/currency-conversion";
import { isExpired } from "./offer-validity";
import type { OfferCosting } from "./offer-costing";
import type { OfferFacts } from "./offer-facts";

export interface MoneyText {
  /** Exact decimal text, e.g. "0.39" or "1096.2"; display rounds it. */
  amount: string;
  currency: string;
}

export interface RateText {
  from: string;
  to: string;
  rate: string;
  asOf: string;
}

export interface OfferCostRow {
  offerId: string;
  supplierId: string;
  supplierName: string;
  partId: string;
  maker: string;
  model: string;
  sku: string;
  leadTimeDays: number | null;
  stock: number | null;
  validUntil: string | null;
  expired: boolean;
  quantityNeeded: number;
  quantityBought: number;
  /** In the offer's own currency. */
  offerUnitPrice: MoneyText;
  offerGoods: MoneyText;
  offerShipping: MoneyText;
  offerLanded: MoneyText;
  /** In the quoting currency (null when no rate converts the offer's currency). */
  unitPrice: MoneyText | null;
  landed: MoneyText | null;
  rate: RateText | null;
  missingRate: string | null;
}

/** Exact text of an unrounded amount (unit prices, prices per watt). */
export function moneyText(m: Money): MoneyText {
  return { amount: m.amount.toFixed(), currency: m.currency };
}

/** Text of an amount already rounded to its currency's minor unit, with every minor digit ("3.00"). */
export function roundedText(m: Money): MoneyText {
  return { amount: m.amount.toFixed(minorDigits(m.currency)), currency: m.currency };
}

export function rateText(rate: ExchangeRate | null): RateText | null {
  return rate ? { from: rate.from, to: rate.to, rate: rate.rate.toFixed(), asOf: rate.asOf } : null;
}

export function decimalText(amount: Decimal | null | undefined, currency: string): MoneyText | null {
  return amount ? { amount: amount.toFixed(), currency } : null;
}

export function offerCostRow(offer: OfferFacts, part: { maker: string; model: string }, costing: OfferCosting, asOf: string): OfferCostRow {
  return {
    offerId: offer.id,
    supplierId: offer.supplierId,
    supplierName: offer.supplierName,
    partId: offer.partId,
    maker: part.maker,
    model: part.model,
    sku: offer.sku,
    leadTimeDays: offer.leadTimeDays,
    stock: offer.stock,
    validUntil: offer.validUntil,
    expired: isExpired(offer.validUntil, asOf),
    quantityNeeded: costing.quantityNeeded,
    quantityBought: costing.landed.quantityBought,
    offerUnitPrice: moneyText(costing.landed.unitPrice),
    offerGoods: roundedText(costing.landed.goods),
    offerShipping: roundedText(costing.landed.shipping),
    offerLanded: roundedText(costing.landed.total),
    unitPrice: costing.unitPriceQuoting ? moneyText(costing.unitPriceQuoting) : null,
    landed: costing.totalQuoting ? roundedText(costing.totalQuoting) : null,
    rate: rateText(costing.rate),
    missingRate: costing.missingRate
      ? `No ${costing.missingRate.from} → ${costing.missingRate.to} rate dated on or before ${asOf}: add one under Rates.`
      : null,
  };
}
