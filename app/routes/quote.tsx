import { parseWithZod } from "@conform-to/zod/v4";
import { data, Link } from "react-router";
import type { Route } from "./+types/quote";
import { PageHeader, Panel } from "~/components/page-header";
import { QuoteDocument } from "~/components/quotes/quote-document";
import { QuoteEditor } from "~/components/quotes/quote-editor";
import { QuotePayments } from "~/components/quotes/quote-payments";
import { QuoteSendPanel } from "~/components/quotes/quote-send-panel";
import { QuoteStatusBadge } from "~/components/quotes/quote-status-badge";
import { QuoteTimeline } from "~/components/quotes/quote-timeline";
import { effectiveStatus, formatQuoteNumber, teamCanRevise, teamCanSend, teamCanWithdraw } from "~/domain/quotes/quote-status";
import { todayIso } from "~/domain/sourcing/offer-validity";
import { quoteEditorSchema } from "~/lib/quote-forms";
import { redirectWithFlash } from "~/server/flash.server";
import { requireTeamMember } from "~/server/guards.server";
import { isUuid } from "~/server/modules.server";
import { noteExpiry } from "~/server/quotes/quote-decisions.server";
import { toQuoteDocument } from "~/server/quotes/quote-document.server";
import { editorValues } from "~/server/quotes/quote-editor-values.server";
import { lineOfferChoices } from "~/server/quotes/line-offers.server";
import { findTeamQuote } from "~/server/quotes/quote-queries.server";
import { saveQuoteEdits } from "~/server/quotes/quote-save.server";
import { sendQuote, withdrawQuote } from "~/server/quotes/quote-send.server";

export const meta: Route.MetaFunction = ({ data }) => [{ title: `${data ? formatQuoteNumber(data.quote.number) : "Quote"} · Quotes · Kitwright` }];

function wantedRevision(request: Request) {
  const n = Number(new URL(request.url).searchParams.get("revision"));
  return Number.isInteger(n) && n > 0 ? n : undefined;
}

export async function loader({ request, params }: Route.LoaderArgs) {
  const { team } = await requireTeamMember(request);
  let found = await findTeamQuote(team.teamId, params.quoteId, wantedRevision(request));
  if (!found) throw new Response("There is no such quote in your team.", { status: 404 });
  if (await noteExpiry(found.quote.id)) found = (await findTeamQuote(team.teamId, params.quoteId, wantedRevision(request)))!;
  const rev = found.revision;
  const status = effectiveStatus(found.quote.status, rev.valid_until, todayIso());
  const isLatest = rev.revision === found.quote.latest_revision;
  const editable = isLatest && teamCanRevise(found.quote.status);
  const editor = editorValues(found.quote, rev);
  return {
    quote: found.quote,
    status,
    revision: rev.revision,
    editable,
    canSend: isLatest && teamCanSend(found.quote.status),
    canWithdraw: teamCanWithdraw(found.quote.status),
    revisionSent: rev.sent_at !== null,
    editor,
    offerChoices: editable ? await lineOfferChoices(team.teamId, editor.lines) : {},
    doc: toQuoteDocument(found.quote, rev),
    events: found.events,
    payments: found.payments,
    revisions: found.revisions,
  };
}

export async function action({ request, params }: Route.ActionArgs) {
  const { user, team } = await requireTeamMember(request);
  // The id reaches uuid columns in every branch below; anything else is no quote at all.
  if (!isUuid(params.quoteId)) throw new Response("There is no such quote in your team.", { status: 404 });
  const actor = { userId: user.id, name: user.name };
  const formData = await request.formData();
  const intent = formData.get("intent");
  const here = `/quotes/${params.quoteId}`;
  if (intent === "save") {
    const submission = parseWithZod(formData, { schema: quoteEditorSchema });
    if (submission.status !== "success") return data({ result: submission.reply(), message: null }, { status: 400 });
    const outcome = await saveQuoteEdits(team.teamId, actor, params.quoteId, submission.value);
    if (!outcome) throw new Response("There is no such quote in your team.", { status: 404 });
    if (!outcome.ok) return data({ result: submission.reply({ formErrors: [outcome.message] }), message: null }, { status: outcome.status });
    return redirectWithFlash(here, {
      kind: "success",
      message: outcome.newRevision ? `Saved as revision ${outcome.revision}. The customer still sees the sent one until you send this.` : "Draft saved.",
    });
  }
  if (intent === "send" || intent === "withdraw") {
    const outcome =
      intent === "send"
        ? await sendQuote(team.teamId, actor, params.quoteId)
        : await withdrawQuote(
            team.teamId,
            actor,
            params.quoteId,
            String(formData.get("reason") ?? "")
              .trim()
              .slice(0, 500),
          );
    if (!outcome) throw new Response("There is no such quote in your team.", { status: 404 });
    if (!outcome.ok) return data({ result: null, message: outcome.message }, { status: outcome.status });
    const message =
      intent === "withdraw"
        ? "Quote withdrawn; the customer was told by e-mail."
        : outcome.resent
          ? "Sent again, with a fresh link."
          : `Revision ${outcome.revision} sent to the customer.`;
    return redirectWithFlash(here, { kind: "success", message });
  }
  return data({ result: null, message: "Unknown action." }, { status: 400 });
}

export default function QuotePage({ loaderData, actionData }: Route.ComponentProps) {
  const { quote, status, revision, revisions } = loaderData;
  return (
    <>
      <PageHeader
        title={`${formatQuoteNumber(quote.number)} · ${quote.title}`}
        lead={
          <span className="flex flex-wrap items-center gap-2">
            <QuoteStatusBadge status={status} /> for {quote.customer_name || "(no customer yet)"} · revision {revision}
            {quote.sent_revision !== null ? ` · the customer sees revision ${quote.sent_revision}` : ""}
          </span>
        }
        actions={
          <div className="flex gap-2">
            <Link to={`/quotes/${quote.id}/print?revision=${revision}`} className="rounded-md border border-copper px-4 py-2 font-medium text-copper-dark">
              Print view
            </Link>
            <Link to={`/plans/${quote.plan_id}`} className="rounded-md border border-rule px-4 py-2 font-medium">
              Kit plan
            </Link>
          </div>
        }
      />
      <div className="grid gap-6 xl:grid-cols-[1fr_20rem]">
        <div className="min-w-0 space-y-6">
          {loaderData.editable ? (
            <QuoteEditor
              key={`${quote.id}-${revision}-${String(quote.updated_at)}`}
              defaultValue={loaderData.editor}
              lastResult={actionData?.result}
              currency={quote.currency}
              offerChoices={loaderData.offerChoices}
              sentRevision={loaderData.revisionSent ? revision : null}
            />
          ) : (
            <QuoteDocument doc={loaderData.doc} />
          )}
        </div>
        <aside className="space-y-6">
          <QuoteSendPanel
            canSend={loaderData.canSend}
            canWithdraw={loaderData.canWithdraw}
            revisionSent={loaderData.revisionSent}
            status={status}
            message={actionData?.message ?? null}
          />
          <QuotePayments payments={loaderData.payments} />
          {revisions.length > 1 ? (
            <Panel title="Revisions">
              <ul className="space-y-1 text-sm">
                {revisions.map((r) => (
                  <li key={r.revision}>
                    <Link to={`?revision=${r.revision}`} className={r.revision === revision ? "font-semibold" : "underline"}>
                      Revision {r.revision}
                    </Link>{" "}
                    <span className="text-ink-soft">{r.sent_at ? "sent" : "not sent"}</span>
                  </li>
                ))}
              </ul>
            </Panel>
          ) : null}
          <Panel title="Timeline">
            <QuoteTimeline events={loaderData.events} />
          </Panel>
        </aside>
      </div>
    </>
  );
}
