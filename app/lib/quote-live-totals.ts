// The editor's running totals: the same domain arithmetic as the server, over whatever the installer
// has typed so far. A line that does not read as numbers yet is left out and counted, never guessed.
import { priceEnteredLines, type EnteredLine } from "~/domain/quotes/quote-lines";
import type { QuoteLineKind } from "~/domain/quotes/quote-types";
import { decimalProblem } from "~/domain/sourcing/decimal-text";

export interface TypedLine {
  kind?: string;
  description?: string;
  quantity?: string;
  unitCost?: string;
  marginPct?: string;
  discountPct?: string;
  taxRatePct?: string;
}

export interface TypedDefaults {
  marginPct?: string;
  discountPct?: string;
  taxRatePct?: string;
  depositPct?: string;
}

function ok(text: string | undefined, maxDecimals = 4) {
  return text !== undefined && text.trim() !== "" && decimalProblem(text, "x", { maxDecimals }) === null;
}

function optional(text: string | undefined) {
  return text === undefined || text.trim() === "" ? null : ok(text) ? text.trim() : undefined;
}

export function liveTotals(lines: readonly TypedLine[], defaults: TypedDefaults, currency: string) {
  if (!ok(defaults.marginPct) || !ok(defaults.discountPct) || !ok(defaults.taxRatePct) || !ok(defaults.depositPct)) return null;
  const entered: EnteredLine[] = [];
  let skipped = 0;
  for (const l of lines) {
    const [m, d, t] = [optional(l.marginPct), optional(l.discountPct), optional(l.taxRatePct)];
    if (!ok(l.quantity) || !ok(l.unitCost) || m === undefined || d === undefined || t === undefined) {
      skipped += 1;
      continue;
    }
    entered.push({
      kind: (l.kind ?? "extra") as QuoteLineKind,
      description: l.description ?? "",
      quantity: l.quantity!.trim(),
      unitCost: l.unitCost!.trim(),
      marginPct: m,
      discountPct: d,
      taxRatePct: t,
      partKind: null,
      partId: null,
      offerId: null,
    });
  }
  const totals = priceEnteredLines(
    entered,
    { marginPct: defaults.marginPct!.trim(), discountPct: defaults.discountPct!.trim(), taxRatePct: defaults.taxRatePct!.trim() },
    currency,
    defaults.depositPct!.trim(),
  );
  return { totals, skipped };
}
