import type { Route } from "./+types/quote-print";
import { PrintBar } from "~/components/quotes/print-bar";
import { QuoteDocument } from "~/components/quotes/quote-document";
import { requireTeamMember } from "~/server/guards.server";
import { toQuoteDocument } from "~/server/quotes/quote-document.server";
import { findTeamQuote } from "~/server/quotes/quote-queries.server";

export const meta: Route.MetaFunction = ({ data }) => [{ title: data ? `${data.doc.number} rev. ${data.doc.revision} · ${data.doc.teamName}` : "Quote" }];

export async function loader({ request, params }: Route.LoaderArgs) {
  const { team } = await requireTeamMember(request);
  const n = Number(new URL(request.url).searchParams.get("revision"));
  const found = await findTeamQuote(team.teamId, params.quoteId, Number.isInteger(n) && n > 0 ? n : undefined);
  if (!found) throw new Response("There is no such quote in your team.", { status: 404 });
  return { quoteId: found.quote.id, doc: toQuoteDocument(found.quote, found.revision), sent: found.revision.sent_at !== null };
}

export default function QuotePrint({ loaderData }: Route.ComponentProps) {
  // A4's printable width on screen too, so the chart is laid out at the width it prints at.
  return (
    <div className="mx-auto max-w-[190mm]">
      <PrintBar backTo={`/quotes/${loaderData.quoteId}`} backLabel="Back to the quote" />
      {!loaderData.sent ? <p className="no-print mb-3 text-sm text-warn">⚠ This revision has not been sent yet: it is a draft.</p> : null}
      <QuoteDocument doc={loaderData.doc} />
    </div>
  );
}
