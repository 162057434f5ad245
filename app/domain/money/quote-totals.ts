// A quote's arithmetic. Each line is rounded once, to the currency's minor unit, after its margin
// and discount; tax is computed per rate on the sum of that rate's lines and rounded once per rate;
// so the printed lines, subtotals, tax and total always add up to the cent.
import Decimal from "decimal.js";
import { money, roundMoney, type Money } from "./money";

export interface QuoteLineInput {
  description: string;
  quantity: Decimal.Value;
  /** The team's cost per unit (from the chosen offer, already in the quote currency). */
  unitCost: Decimal.Value;
  /** Margin on cost, percent: price = cost × (1 + margin/100). */
  marginPct: Decimal.Value;
  /** Discount on the priced line, percent. */
  discountPct: Decimal.Value;
  /** Tax rate for this line, percent (e.g. 20, 5, 0). */
  taxRatePct: Decimal.Value;
}

export interface QuoteLine extends QuoteLineInput {
  unitPrice: Money;
  lineNet: Money;
}

export interface TaxBand {
  ratePct: string;
  net: Money;
  tax: Money;
}

export interface QuoteTotals {
  lines: QuoteLine[];
  net: Money;
  taxBands: TaxBand[];
  tax: Money;
  gross: Money;
  depositPct: string;
  deposit: Money;
  balance: Money;
}

function pct(value: Decimal.Value) {
  return new Decimal(value).dividedBy(100);
}

/** The customer sees the unit price, so the line is built from the rounded unit price: qty × shown price. */
export function priceQuoteLine(line: QuoteLineInput, currency: string): QuoteLine {
  const unitPrice = roundMoney(money(new Decimal(line.unitCost).times(pct(line.marginPct).plus(1)), currency));
  const beforeDiscount = unitPrice.amount.times(line.quantity);
  const lineNet = roundMoney(money(beforeDiscount.times(new Decimal(1).minus(pct(line.discountPct))), currency));
  return { ...line, unitPrice, lineNet };
}

export function quoteTotals(lines: readonly QuoteLineInput[], currency: string, depositPct: Decimal.Value): QuoteTotals {
  const priced = lines.map((line) => priceQuoteLine(line, currency));
  const zero = money(0, currency);
  const byRate = new Map<string, Decimal>();
  for (const line of priced) {
    const key = new Decimal(line.taxRatePct).toString();
    byRate.set(key, (byRate.get(key) ?? new Decimal(0)).plus(line.lineNet.amount));
  }
  const taxBands = [...byRate.entries()]
    .sort(([a], [b]) => new Decimal(b).comparedTo(a))
    .map(([ratePct, net]) => ({ ratePct, net: money(net, currency), tax: roundMoney(money(net.times(pct(ratePct)), currency)) }));
  const net = priced.reduce((sum, l) => money(sum.amount.plus(l.lineNet.amount), currency), zero);
  const tax = taxBands.reduce((sum, b) => money(sum.amount.plus(b.tax.amount), currency), zero);
  const gross = money(net.amount.plus(tax.amount), currency);
  const deposit = roundMoney(money(gross.amount.times(pct(depositPct)), currency));
  return {
    lines: priced,
    net,
    taxBands,
    tax,
    gross,
    depositPct: new Decimal(depositPct).toString(),
    deposit,
    balance: money(gross.amount.minus(deposit.amount), currency),
  };
}
