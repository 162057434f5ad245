// A stored revision as the editor's starting values (decimal text stays text).
import type { QuoteRevisionDetail } from "./quote-queries.server";
import type { QuoteEditorForm } from "~/lib/quote-forms";

export function editorValues(quote: { title: string; customer_name: string; customer_email: string }, rev: QuoteRevisionDetail): QuoteEditorForm {
  return {
    title: quote.title,
    customerName: quote.customer_name,
    customerEmail: quote.customer_email,
    marginPct: rev.margin_pct,
    discountPct: rev.discount_pct,
    taxRatePct: rev.tax_rate_pct,
    depositPct: rev.deposit_pct,
    validUntil: rev.valid_until,
    terms: rev.terms,
    note: "",
    lines: rev.lines.map((l) => ({
      kind: l.kind,
      description: l.description,
      quantity: l.quantity,
      unitCost: l.unit_cost,
      marginPct: l.margin_pct ?? undefined,
      discountPct: l.discount_pct ?? undefined,
      taxRatePct: l.tax_rate_pct ?? undefined,
      partKind: l.part_kind ?? undefined,
      partId: l.part_id ?? undefined,
      offerId: l.offer_id ?? undefined,
    })),
  };
}
