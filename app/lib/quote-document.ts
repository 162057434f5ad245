// Everything a quote document shows, in plain serialisable form: built on the server from a stored
// revision, rendered by the print view, the customer's page and the installer's preview alike.
import type { TotalsFigures } from "~/components/quotes/quote-totals-table";
import type { ShownLine } from "~/components/quotes/quote-lines-table";
import type { QuotePlanSnapshot } from "~/domain/quotes/quote-types";

export interface QuoteDocumentData {
  number: string;
  revision: number;
  title: string;
  teamName: string;
  customerName: string;
  customerEmail: string;
  issuedOn: string;
  validUntil: string;
  terms: string;
  lines: ShownLine[];
  totals: TotalsFigures;
  plan: QuotePlanSnapshot;
}
