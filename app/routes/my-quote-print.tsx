import type { Route } from "./+types/my-quote-print";
import { PrintBar } from "~/components/quotes/print-bar";
import { QuoteDocument } from "~/components/quotes/quote-document";
import { requireUser } from "~/server/guards.server";
import { toQuoteDocument } from "~/server/quotes/quote-document.server";
import { findCustomerQuote } from "~/server/quotes/quote-queries.server";

export const meta: Route.MetaFunction = ({ data }) => [{ title: data ? `${data.doc.number} rev. ${data.doc.revision} · ${data.doc.teamName}` : "Quote" }];

export async function loader({ request, params }: Route.LoaderArgs) {
  const user = await requireUser(request);
  const found = await findCustomerQuote(user.id, params.quoteId);
  if (!found) throw new Response("There is no such quote on your account.", { status: 404 });
  return { quoteId: found.quote.id, doc: toQuoteDocument(found.quote, found.revision) };
}

export default function MyQuotePrint({ loaderData }: Route.ComponentProps) {
  // A4's printable width on screen too, so the chart is laid out at the width it prints at.
  return (
    <div className="mx-auto max-w-[190mm]">
      <PrintBar backTo={`/my-quotes/${loaderData.quoteId}`} backLabel="Back to the quote" />
      <QuoteDocument doc={loaderData.doc} />
    </div>
  );
}
