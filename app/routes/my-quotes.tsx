import { Link } from "react-router";
import type { Route } from "./+types/my-quotes";
import { PageHeader, Panel } from "~/components/page-header";
import { QuoteStatusBadge } from "~/components/quotes/quote-status-badge";
import { formatMoney, money } from "~/domain/money/money";
import { effectiveStatus, formatQuoteNumber } from "~/domain/quotes/quote-status";
import { todayIso } from "~/domain/sourcing/offer-validity";
import { requireUser } from "~/server/guards.server";
import { listCustomerQuotes } from "~/server/quotes/quote-queries.server";

export const meta: Route.MetaFunction = () => [{ title: "Your quotes · Kitwright" }];

export async function loader({ request }: Route.LoaderArgs) {
  const user = await requireUser(request);
  const today = todayIso();
  const quotes = await listCustomerQuotes(user.id);
  return { quotes: quotes.map((q) => ({ ...q, shownStatus: effectiveStatus(q.status, q.valid_until, today) })) };
}

export default function MyQuotes({ loaderData }: Route.ComponentProps) {
  return (
    <>
      <PageHeader title="Your quotes" lead="Quotes installers have sent you. Open one to read it, approve or decline it, and pay the deposit." />
      <Panel>
        {loaderData.quotes.length === 0 ? <p className="text-ink-soft">No quotes have been sent to you yet.</p> : null}
        <ul className="divide-y divide-rule">
          {loaderData.quotes.map((q) => (
            <li key={q.id} className="flex flex-wrap items-center justify-between gap-2 py-3">
              <span>
                <Link to={`/my-quotes/${q.id}`} className="font-medium underline">
                  {formatQuoteNumber(q.number)} · {q.title}
                </Link>
                <span className="block text-sm text-ink-soft">
                  from {q.team_name} · {formatMoney(money(q.gross, q.currency))} · valid until {q.valid_until}
                </span>
              </span>
              <QuoteStatusBadge status={q.shownStatus} />
            </li>
          ))}
        </ul>
      </Panel>
    </>
  );
}
