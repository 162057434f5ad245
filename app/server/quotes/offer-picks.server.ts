// For each part a plan needs, the team's cheapest valid offer at that quantity (landed cost in the
// quoting currency, app/domain/sourcing/offer-costing.ts). The installer can change any line after.
import Decimal from "decimal.js";
import type { Executor } from "./quote-events.server";
import { listValidOffers } from "../sourcing/offers.server";
import type { ChosenOffer, PlanPartNeed } from "~/domain/quotes/plan-lines";
import { costOffer, type TeamPricing } from "~/domain/sourcing/offer-costing";

export async function cheapestOffer(trx: Executor, teamId: string, need: PlanPartNeed, pricing: TeamPricing): Promise<ChosenOffer | null> {
  const offers = await listValidOffers(trx, teamId, { partKind: need.partKind, partIds: [need.partId], asOf: pricing.asOf });
  let best: { offer: (typeof offers)[number]; total: Decimal } | null = null;
  for (const offer of offers) {
    const costing = costOffer(offer.terms, need.quantity, pricing);
    if (!costing.totalQuoting) continue;
    if (!best || costing.totalQuoting.amount.lt(best.total)) best = { offer, total: costing.totalQuoting.amount };
  }
  if (!best) return null;
  // Landed cost per unit (shipping and breaks spread over the quantity), to four places: the line's
  // price is rounded once, later, in quote-totals.ts.
  const unitCost = best.total.dividedBy(need.quantity).toDecimalPlaces(4, Decimal.ROUND_HALF_UP);
  return { offerId: best.offer.id, supplierName: best.offer.supplierName, unitCost: unitCost.toFixed() };
}
