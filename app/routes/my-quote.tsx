import { parseWithZod } from "@conform-to/zod/v4";
import { data, Link, redirect } from "react-router";
import type { Route } from "./+types/my-quote";
import { PageHeader, Panel } from "~/components/page-header";
import { CustomerDecision } from "~/components/quotes/customer-decision";
import { CustomerDeposit } from "~/components/quotes/customer-deposit";
import { QuoteDocument } from "~/components/quotes/quote-document";
import { QuoteStatusBadge } from "~/components/quotes/quote-status-badge";
import { formatMoney, money } from "~/domain/money/money";
import { customerCanDecide, customerCanPay, effectiveStatus, formatQuoteNumber } from "~/domain/quotes/quote-status";
import { todayIso } from "~/domain/sourcing/offer-validity";
import { formatDate } from "~/lib/plan-format";
import { approveSchema, declineSchema } from "~/lib/quote-forms";
import { env } from "~/server/env.server";
import { redirectWithFlash } from "~/server/flash.server";
import { requireUser } from "~/server/guards.server";
import { isUuid } from "~/server/modules.server";
import { startDepositCheckout } from "~/server/quotes/deposit-checkout.server";
import { decideQuote, noteExpiry, recordViewed } from "~/server/quotes/quote-decisions.server";
import { toQuoteDocument } from "~/server/quotes/quote-document.server";
import { findCustomerQuote } from "~/server/quotes/quote-queries.server";

export const meta: Route.MetaFunction = ({ data }) => [{ title: data ? `${data.doc.number} from ${data.doc.teamName} · Kitwright` : "Quote · Kitwright" }];

const NOT_YOURS = "There is no such quote on your account. If you followed a link from an e-mail, sign in with the address it was sent to.";

export async function loader({ request, params }: Route.LoaderArgs) {
  const user = await requireUser(request);
  let found = await findCustomerQuote(user.id, params.quoteId);
  if (!found) throw new Response(NOT_YOURS, { status: 404 });
  const expired = await noteExpiry(found.quote.id);
  if (!expired && found.quote.status === "sent") await recordViewed(user.id, { userId: user.id, name: user.name }, found.quote.id);
  if (expired || found.quote.status === "sent") found = (await findCustomerQuote(user.id, params.quoteId))!;
  const { quote, revision, payments } = found;
  const returned = new URL(request.url).searchParams.get("payment");
  const last = payments.at(-1);
  return {
    quoteId: quote.id,
    status: effectiveStatus(quote.status, revision.valid_until, todayIso()),
    doc: toQuoteDocument(quote, revision),
    deposit: formatMoney(money(revision.deposit, quote.currency)),
    decidedName: quote.decided_name,
    decidedAt: quote.decided_at,
    comment: quote.decision_comment,
    paidAt: payments.find((p) => p.status === "paid")?.paid_at ?? null,
    lastFailure: last && last.status === "failed" ? (last.failure_message ?? "the card was declined.") : null,
    returned: returned === "done" || returned === "cancelled" ? (returned as "done" | "cancelled") : null,
  };
}

export async function action({ request, params }: Route.ActionArgs) {
  const user = await requireUser(request);
  // The id reaches uuid columns in every branch below; anything else is no quote at all.
  if (!isUuid(params.quoteId)) throw new Response(NOT_YOURS, { status: 404 });
  const actor = { userId: user.id, name: user.name };
  const formData = await request.formData();
  const intent = formData.get("intent");
  const here = `/my-quotes/${params.quoteId}`;
  if (intent === "pay") {
    const outcome = await startDepositCheckout({ quoteId: params.quoteId, customerUserId: user.id, origin: env.PUBLIC_URL });
    if (outcome.ok) throw redirect(outcome.url);
    if (outcome.error === "not_found") throw new Response(NOT_YOURS, { status: 404 });
    return data({ intent, result: null, message: outcome.message }, { status: outcome.error === "payments_unavailable" ? 503 : 409 });
  }
  if (intent === "approve" || intent === "decline") {
    const submission = parseWithZod(formData, { schema: intent === "approve" ? approveSchema : declineSchema });
    if (submission.status !== "success") return data({ intent, result: submission.reply(), message: null }, { status: 400 });
    const value = submission.value as { acceptedName?: string; comment?: string };
    const decision =
      intent === "approve" ? { approve: true as const, acceptedName: value.acceptedName! } : { approve: false as const, comment: value.comment! };
    const outcome = await decideQuote(user.id, actor, params.quoteId, decision);
    if (!outcome) throw new Response(NOT_YOURS, { status: 404 });
    if (!outcome.ok) return data({ intent, result: submission.reply({ formErrors: [outcome.message] }), message: null }, { status: outcome.status });
    return redirectWithFlash(here, {
      kind: "success",
      message:
        intent === "approve"
          ? "Thank you: the quote is approved. Pay the deposit below to confirm the order."
          : "The quote is declined; the installer has been told.",
    });
  }
  return data({ intent: null, result: null, message: "Unknown action." }, { status: 400 });
}

export default function MyQuote({ loaderData, actionData }: Route.ComponentProps) {
  const { status, doc } = loaderData;
  return (
    <>
      <PageHeader
        title={`${doc.number} · ${doc.title}`}
        lead={
          <span className="flex flex-wrap items-center gap-2">
            <QuoteStatusBadge status={status} /> from {doc.teamName}
          </span>
        }
        actions={
          <Link to={`/my-quotes/${loaderData.quoteId}/print`} className="rounded-md border border-copper px-4 py-2 font-medium text-copper-dark">
            Print view
          </Link>
        }
      />
      <div className="space-y-6">
        {customerCanDecide(status) ? (
          <CustomerDecision
            deposit={loaderData.deposit}
            approveResult={actionData?.intent === "approve" ? actionData.result : null}
            declineResult={actionData?.intent === "decline" ? actionData.result : null}
          />
        ) : null}
        {customerCanPay(status) ? (
          <CustomerDeposit
            deposit={loaderData.deposit}
            returned={loaderData.returned}
            lastFailure={loaderData.lastFailure}
            message={actionData?.intent === "pay" ? actionData.message : null}
          />
        ) : null}
        {status === "deposit_paid" ? (
          <Panel>
            <p role="status" className="font-semibold text-pass">
              ✓ Deposit of {loaderData.deposit} paid{loaderData.paidAt ? ` on ${formatDate(loaderData.paidAt)}` : ""}. Thank you — a receipt is in your e-mail,
              and {doc.teamName} will be in touch about the installation.
            </p>
          </Panel>
        ) : null}
        {status === "declined" ? (
          <Panel>
            <p>
              You declined this quote{loaderData.decidedAt ? ` on ${formatDate(loaderData.decidedAt)}` : ""}: “{loaderData.comment}”. {doc.teamName} may send
              you a revised one.
            </p>
          </Panel>
        ) : null}
        {status === "expired" ? (
          <Panel>
            <p>
              This quote was valid until {doc.validUntil}. Ask {doc.teamName} for a new one.
            </p>
          </Panel>
        ) : null}
        {loaderData.decidedName && (status === "approved" || status === "deposit_paid") ? (
          <p className="text-sm text-ink-soft">
            Approved by “{loaderData.decidedName}”{loaderData.decidedAt ? ` on ${formatDate(loaderData.decidedAt)}` : ""}.
          </p>
        ) : null}
        <QuoteDocument doc={doc} />
      </div>
    </>
  );
}
