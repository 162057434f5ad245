// A stored quote revision as the document the customer reads (no costs, no margins).
import Decimal from "decimal.js";
import type { QuoteRevisionDetail } from "./quote-queries.server";
import type { TaxBandJson } from "../db-schema-quotes";
import { formatQuoteNumber } from "~/domain/quotes/quote-status";
import type { QuotePlanSnapshot } from "~/domain/quotes/quote-types";
import type { QuoteDocumentData } from "~/lib/quote-document";

interface QuoteHead {
  number: number;
  title: string;
  team_name: string;
  customer_name: string;
  customer_email: string;
  currency: string;
}

export function toQuoteDocument(quote: QuoteHead, rev: QuoteRevisionDetail): QuoteDocumentData {
  const issued = rev.sent_at ?? rev.created_at;
  return {
    number: formatQuoteNumber(quote.number),
    revision: rev.revision,
    title: quote.title,
    teamName: quote.team_name,
    customerName: quote.customer_name,
    customerEmail: quote.customer_email,
    issuedOn: new Date(issued).toISOString().slice(0, 10),
    validUntil: rev.valid_until,
    terms: rev.terms,
    lines: rev.lines.map((l) => ({
      position: l.position,
      description: l.description,
      quantity: l.quantity,
      unitPrice: l.unit_price,
      discountPct: l.discount_pct ?? rev.discount_pct,
      taxRatePct: l.tax_rate_pct ?? rev.tax_rate_pct,
      lineNet: l.line_net,
    })),
    totals: {
      currency: quote.currency,
      net: rev.net,
      taxBands: rev.tax_bands as TaxBandJson[],
      gross: rev.gross,
      depositPct: new Decimal(rev.deposit_pct).toString(),
      deposit: rev.deposit,
    },
    plan: rev.plan_snapshot as QuotePlanSnapshot,
  };
}
