// For the editor: every part line's alternatives among the team's valid offers, at the line's quantity.
import { db } from "../db.server";
import { loadTeamPricing } from "../sourcing/settings.server";
import { offersFor } from "./offer-picks.server";
import type { ChosenOffer } from "~/domain/quotes/plan-lines";
import type { QuoteEditorForm } from "~/lib/quote-forms";

export function partKey(partKind: string, partId: string) {
  return `${partKind}:${partId}`;
}

/** Keyed by partKey(kind, id), so that lines added or removed in the editor keep their choices. */
export async function lineOfferChoices(teamId: string, lines: QuoteEditorForm["lines"]): Promise<Record<string, ChosenOffer[]>> {
  const pricing = await loadTeamPricing(db, teamId);
  const out: Record<string, ChosenOffer[]> = {};
  await Promise.all(
    lines.map(async (line) => {
      const quantity = Math.ceil(Number(line.quantity));
      if (!line.partKind || !line.partId || !Number.isFinite(quantity) || quantity < 1) return;
      out[partKey(line.partKind, line.partId)] = await offersFor(db, teamId, { partKind: line.partKind, partId: line.partId, quantity }, pricing);
    }),
  );
  return out;
}
