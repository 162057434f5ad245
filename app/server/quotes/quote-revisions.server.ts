// Writing one revision of a quote: its lines priced by the domain, the totals stored beside them.
// Callers own the transaction.
import type { Executor } from "./quote-events.server";
import { moneyText } from "~/domain/money/money";
import { priceEnteredLines, type EnteredLine, type QuoteDefaults } from "~/domain/quotes/quote-lines";
import type { QuotePlanSnapshot } from "~/domain/quotes/quote-types";

export interface RevisionContent {
  defaults: QuoteDefaults;
  depositPct: string;
  validUntil: string;
  terms: string;
  note: string;
  lines: EnteredLine[];
}

export interface RevisionArgs {
  quoteId: string;
  revision: number;
  planRevision: number;
  currency: string;
  snapshot: QuotePlanSnapshot;
  userId: string | null;
  content: RevisionContent;
}

export async function insertRevision(trx: Executor, args: RevisionArgs) {
  const { content } = args;
  const totals = priceEnteredLines(content.lines, content.defaults, args.currency, content.depositPct);
  const row = await trx
    .insertInto("quote_revision")
    .values({
      quote_id: args.quoteId,
      revision: args.revision,
      plan_revision: args.planRevision,
      margin_pct: content.defaults.marginPct,
      discount_pct: content.defaults.discountPct,
      tax_rate_pct: content.defaults.taxRatePct,
      deposit_pct: content.depositPct,
      valid_until: content.validUntil,
      terms: content.terms,
      note: content.note,
      net: moneyText(totals.net),
      tax: moneyText(totals.tax),
      gross: moneyText(totals.gross),
      deposit: moneyText(totals.deposit),
      tax_bands: JSON.stringify(totals.taxBands.map((b) => ({ ratePct: b.ratePct, net: moneyText(b.net), tax: moneyText(b.tax) }))),
      plan_snapshot: JSON.stringify(args.snapshot),
      created_by: args.userId,
    })
    .returning("id")
    .executeTakeFirstOrThrow();
  await trx
    .insertInto("quote_line")
    .values(
      content.lines.map((line, i) => ({
        revision_id: row.id,
        position: i + 1,
        kind: line.kind,
        description: line.description,
        part_kind: line.partKind,
        part_id: line.partId,
        offer_id: line.offerId,
        quantity: line.quantity,
        unit_cost: line.unitCost,
        margin_pct: line.marginPct,
        discount_pct: line.discountPct,
        tax_rate_pct: line.taxRatePct,
        unit_price: moneyText(totals.lines[i].unitPrice),
        line_net: moneyText(totals.lines[i].lineNet),
      })),
    )
    .execute();
  return { id: row.id, totals };
}

/** Replaces an unsent revision's content (the draft is edited in place; a sent one never is). */
export async function replaceDraftRevision(trx: Executor, args: RevisionArgs & { revisionId: string }) {
  await trx.deleteFrom("quote_revision").where("id", "=", args.revisionId).where("sent_at", "is", null).execute();
  return insertRevision(trx, args);
}
