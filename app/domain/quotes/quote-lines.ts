// A quote revision's lines as the installer enters them: margin, discount and tax rate may be left
// blank on a line, and then the revision's own figure applies. Pricing itself is quote-totals.ts.
import { quoteTotals, type QuoteLineInput, type QuoteTotals } from "../money/quote-totals";
import type { OfferPartKind } from "../sourcing/offer-facts";
import type { QuoteLineKind } from "./quote-types";

export interface QuoteDefaults {
  marginPct: string;
  discountPct: string;
  taxRatePct: string;
}

export interface EnteredLine {
  kind: QuoteLineKind;
  description: string;
  /** Decimal text. */
  quantity: string;
  /** The team's cost per unit in the quote's currency, decimal text. */
  unitCost: string;
  marginPct: string | null;
  discountPct: string | null;
  taxRatePct: string | null;
  partKind: OfferPartKind | null;
  partId: string | null;
  offerId: string | null;
}

export function effectiveLine(line: EnteredLine, defaults: QuoteDefaults): QuoteLineInput {
  return {
    description: line.description,
    quantity: line.quantity,
    unitCost: line.unitCost,
    marginPct: line.marginPct ?? defaults.marginPct,
    discountPct: line.discountPct ?? defaults.discountPct,
    taxRatePct: line.taxRatePct ?? defaults.taxRatePct,
  };
}

export function priceEnteredLines(lines: readonly EnteredLine[], defaults: QuoteDefaults, currency: string, depositPct: string): QuoteTotals {
  return quoteTotals(
    lines.map((l) => effectiveLine(l, defaults)),
    currency,
    depositPct,
  );
}
