// GET /api/v1/quotes?status=&q= — the team's quotes with their latest revision's totals (decimal text).
import type { Route } from "./+types/api.v1.quotes";
import { effectiveStatus, formatQuoteNumber, QUOTE_STATUSES, type QuoteStatus } from "~/domain/quotes/quote-status";
import { todayIso } from "~/domain/sourcing/offer-validity";
import { requireApiTeam } from "~/server/guards.server";
import { jsonError } from "~/server/json-body.server";
import { listTeamQuotes } from "~/server/quotes/quote-queries.server";

export async function loader({ request }: Route.LoaderArgs) {
  const { teamId } = await requireApiTeam(request);
  const url = new URL(request.url);
  const status = url.searchParams.get("status");
  if (status !== null && status !== "open" && !(QUOTE_STATUSES as readonly string[]).includes(status)) {
    return jsonError(400, `Unknown status "${status.slice(0, 40)}". Use open or one of: ${QUOTE_STATUSES.join(", ")}.`, { status: "unknown status" });
  }
  const quotes = await listTeamQuotes(teamId, {
    status: (status ?? undefined) as QuoteStatus | "open" | undefined,
    search: (url.searchParams.get("q") ?? "").slice(0, 100),
  });
  const today = todayIso();
  return Response.json({
    items: quotes.map((q) => ({
      id: q.id,
      number: formatQuoteNumber(q.number),
      title: q.title,
      customer: { name: q.customer_name, email: q.customer_email },
      status: effectiveStatus(q.status, q.valid_until, today),
      currency: q.currency,
      gross: q.gross,
      deposit: q.deposit,
      validUntil: q.valid_until,
      latestRevision: q.latest_revision,
      sentRevision: q.sent_revision,
      plan: q.plan_name,
      updatedAt: q.updated_at,
    })),
    total: quotes.length,
  });
}
