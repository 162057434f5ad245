// GET /api/v1/quotes/:quoteId[?revision=N] — one of the team's quotes: lines with costs, totals,
// timeline and payments. Money is decimal text.
import type { Route } from "./+types/api.v1.quote";
import { effectiveStatus, formatQuoteNumber } from "~/domain/quotes/quote-status";
import { todayIso } from "~/domain/sourcing/offer-validity";
import { requireApiTeam } from "~/server/guards.server";
import { jsonError } from "~/server/json-body.server";
import { findTeamQuote } from "~/server/quotes/quote-queries.server";

export async function loader({ request, params }: Route.LoaderArgs) {
  const { teamId } = await requireApiTeam(request);
  const n = Number(new URL(request.url).searchParams.get("revision") ?? "");
  const found = await findTeamQuote(teamId, params.quoteId, Number.isInteger(n) && n > 0 ? n : undefined);
  if (!found) return jsonError(404, "There is no such quote in your team.");
  const { quote, revision } = found;
  return Response.json({
    id: quote.id,
    number: formatQuoteNumber(quote.number),
    title: quote.title,
    planId: quote.plan_id,
    customer: { name: quote.customer_name, email: quote.customer_email },
    status: effectiveStatus(quote.status, revision.valid_until, todayIso()),
    currency: quote.currency,
    latestRevision: quote.latest_revision,
    sentRevision: quote.sent_revision,
    revision: {
      number: revision.revision,
      planRevision: revision.plan_revision,
      sentAt: revision.sent_at,
      validUntil: revision.valid_until,
      defaults: { marginPct: revision.margin_pct, discountPct: revision.discount_pct, taxRatePct: revision.tax_rate_pct },
      depositPct: revision.deposit_pct,
      terms: revision.terms,
      lines: revision.lines.map((l) => ({
        position: l.position,
        kind: l.kind,
        description: l.description,
        part: l.part_kind ? { kind: l.part_kind, id: l.part_id, offerId: l.offer_id } : null,
        quantity: l.quantity,
        unitCost: l.unit_cost,
        marginPct: l.margin_pct,
        discountPct: l.discount_pct,
        taxRatePct: l.tax_rate_pct,
        unitPrice: l.unit_price,
        lineNet: l.line_net,
      })),
      totals: { net: revision.net, taxBands: revision.tax_bands, tax: revision.tax, gross: revision.gross, deposit: revision.deposit },
    },
    events: found.events.map((e) => ({ kind: e.kind, revision: e.revision, actor: e.actor_name, detail: e.detail, at: e.at })),
    payments: found.payments.map((p) => ({ status: p.status, amount: p.amount, currency: p.currency, createdAt: p.created_at, paidAt: p.paid_at })),
  });
}
