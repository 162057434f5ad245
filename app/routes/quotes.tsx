import { parseWithZod } from "@conform-to/zod/v4";
import { data, Form, Link, useNavigation } from "react-router";
import type { Route } from "./+types/quotes";
import { FormErrors } from "~/components/form-field";
import { PageHeader, Panel } from "~/components/page-header";
import { QuoteStatusBadge } from "~/components/quotes/quote-status-badge";
import { formatMoney, money } from "~/domain/money/money";
import { effectiveStatus, formatQuoteNumber, QUOTE_STATUSES, STATUS_LABELS, type QuoteStatus } from "~/domain/quotes/quote-status";
import { todayIso } from "~/domain/sourcing/offer-validity";
import { formatDate } from "~/lib/plan-format";
import { newQuoteSchema } from "~/lib/quote-forms";
import { redirectWithFlash } from "~/server/flash.server";
import { requireTeamMember } from "~/server/guards.server";
import { listPlans } from "~/server/plans/plans.server";
import { createQuoteFromPlan } from "~/server/quotes/quote-create.server";
import { listTeamQuotes } from "~/server/quotes/quote-queries.server";

export const meta: Route.MetaFunction = () => [{ title: "Quotes · Kitwright" }];

function statusFilter(value: string | null): QuoteStatus | "open" | undefined {
  if (value === "open") return "open";
  return (QUOTE_STATUSES as readonly string[]).includes(value ?? "") ? (value as QuoteStatus) : undefined;
}

export async function loader({ request }: Route.LoaderArgs) {
  const { team } = await requireTeamMember(request);
  const url = new URL(request.url);
  const status = statusFilter(url.searchParams.get("status"));
  const search = (url.searchParams.get("q") ?? "").slice(0, 100);
  const [quotes, plans] = await Promise.all([listTeamQuotes(team.teamId, { status, search }), listPlans(team.teamId)]);
  const today = todayIso();
  return {
    quotes: quotes.map((q) => ({ ...q, shownStatus: effectiveStatus(q.status, q.valid_until, today) })),
    plans: plans.map((p) => ({ id: p.id, label: `${p.name} (${p.siteName})` })),
    filter: { status: status ?? "all", search },
  };
}

export async function action({ request }: Route.ActionArgs) {
  const { user, team } = await requireTeamMember(request);
  const submission = parseWithZod(await request.formData(), { schema: newQuoteSchema });
  if (submission.status !== "success") return data({ message: "Choose a kit plan to quote." }, { status: 400 });
  const outcome = await createQuoteFromPlan(team.teamId, { userId: user.id, name: user.name }, submission.value.planId);
  if (!outcome.ok) return data({ message: outcome.message }, { status: outcome.status });
  return redirectWithFlash(`/quotes/${outcome.quoteId}`, { kind: "success", message: "Quote drafted from the plan. Check every line, then send it." });
}

export default function Quotes({ loaderData, actionData }: Route.ComponentProps) {
  const { quotes, plans, filter } = loaderData;
  const busy = useNavigation().state === "submitting";
  return (
    <>
      <PageHeader title="Quotes" lead="Priced from a kit plan and your suppliers' offers; sent to the customer, who approves and pays the deposit by card." />
      <div className="grid grid-cols-[minmax(0,1fr)] gap-6">
        <Panel title="New quote">
          {plans.length === 0 ? (
            <p className="text-ink-soft">
              A quote starts from a kit plan.{" "}
              <Link to="/plans/new" className="underline">
                Make a plan
              </Link>{" "}
              first.
            </p>
          ) : (
            <Form method="post" className="flex flex-wrap items-end gap-3">
              <label className="grow">
                <span className="mb-1 block text-sm font-medium">Kit plan</span>
                <select name="planId" required className="block w-full rounded-md border border-rule bg-sheet px-3 py-2">
                  {plans.map((p) => (
                    <option key={p.id} value={p.id}>
                      {p.label}
                    </option>
                  ))}
                </select>
              </label>
              <button type="submit" disabled={busy} className="rounded-md bg-copper px-4 py-2 font-medium text-sheet hover:bg-copper-dark disabled:opacity-60">
                {busy ? "Pricing…" : "Draft a quote"}
              </button>
            </Form>
          )}
          <div className="mt-3">
            <FormErrors errors={actionData?.message ? [actionData.message] : undefined} />
          </div>
        </Panel>
        <Panel title="Your team's quotes">
          <Form method="get" className="mb-4 flex flex-wrap items-end gap-3" role="search">
            <label>
              <span className="mb-1 block text-sm font-medium">Status</span>
              <select name="status" defaultValue={filter.status} className="rounded-md border border-rule bg-sheet px-3 py-2">
                <option value="all">All</option>
                <option value="open">Open (draft to approved)</option>
                {QUOTE_STATUSES.map((s) => (
                  <option key={s} value={s}>
                    {STATUS_LABELS[s]}
                  </option>
                ))}
              </select>
            </label>
            <label className="grow">
              <span className="mb-1 block text-sm font-medium">Customer or title</span>
              <input name="q" defaultValue={filter.search} className="block w-full rounded-md border border-rule bg-sheet px-3 py-2" />
            </label>
            <button type="submit" className="rounded-md border border-copper px-4 py-2 font-medium text-copper-dark">
              Filter
            </button>
          </Form>
          {quotes.length === 0 ? <p className="text-ink-soft">No quotes match.</p> : null}
          {quotes.length > 0 ? (
            <div className="relative min-w-0 overflow-x-auto">
              <table className="w-full text-sm">
                <thead>
                  <tr className="border-b border-rule text-left text-ink-soft">
                    <th className="py-2 pr-3 font-medium">Quote</th>
                    <th className="py-2 pr-3 font-medium">Customer</th>
                    <th className="py-2 pr-3 font-medium">Status</th>
                    <th className="py-2 pr-3 text-right font-medium">Total</th>
                    <th className="py-2 pr-3 font-medium">Valid until</th>
                    <th className="py-2 font-medium">Changed</th>
                  </tr>
                </thead>
                <tbody className="divide-y divide-rule">
                  {quotes.map((q) => (
                    <tr key={q.id}>
                      <td className="py-2 pr-3">
                        <Link to={`/quotes/${q.id}`} className="font-medium underline">
                          {formatQuoteNumber(q.number)}
                        </Link>{" "}
                        <span className="text-ink-soft">{q.title}</span>
                      </td>
                      <td className="py-2 pr-3">{q.customer_name}</td>
                      <td className="py-2 pr-3">
                        <QuoteStatusBadge status={q.shownStatus} />
                      </td>
                      <td className="py-2 pr-3 text-right tabular-nums">{formatMoney(money(q.gross, q.currency))}</td>
                      <td className="py-2 pr-3 tabular-nums">{q.valid_until}</td>
                      <td className="py-2 tabular-nums">{formatDate(q.updated_at)}</td>
                    </tr>
                  ))}
                </tbody>
              </table>
            </div>
          ) : null}
        </Panel>
      </div>
    </>
  );
}
