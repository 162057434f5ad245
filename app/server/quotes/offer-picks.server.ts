// The team's valid offers for a part at a quantity, cheapest landed cost first (in the quoting
// currency, app/domain/sourcing/offer-costing.ts). A new quote starts from the cheapest; the editor
// lets the installer switch a line to any other.
import Decimal from "decimal.js";
import type { Executor } from "./quote-events.server";
import { listValidOffers } from "../sourcing/offers.server";
import type { ChosenOffer, PlanPartNeed } from "~/domain/quotes/plan-lines";
import { costOffer, type TeamPricing } from "~/domain/sourcing/offer-costing";

export async function offersFor(
  trx: Executor,
  teamId: string,
  need: Pick<PlanPartNeed, "partKind" | "partId" | "quantity">,
  pricing: TeamPricing,
): Promise<ChosenOffer[]> {
  const offers = await listValidOffers(trx, teamId, { partKind: need.partKind, partIds: [need.partId], asOf: pricing.asOf });
  const priced: { offer: (typeof offers)[number]; total: Decimal }[] = [];
  for (const offer of offers) {
    const costing = costOffer(offer.terms, need.quantity, pricing);
    if (costing.totalQuoting) priced.push({ offer, total: costing.totalQuoting.amount });
  }
  priced.sort((a, b) => a.total.comparedTo(b.total));
  // Landed cost per unit (shipping and breaks spread over the quantity), to four places: the line's
  // price is rounded once, later, in quote-totals.ts.
  return priced.map(({ offer, total }) => ({
    offerId: offer.id,
    supplierName: offer.supplierName,
    unitCost: total.dividedBy(need.quantity).toDecimalPlaces(4, Decimal.ROUND_HALF_UP).toFixed(),
  }));
}

export async function cheapestOffer(trx: Executor, teamId: string, need: PlanPartNeed, pricing: TeamPricing): Promise<ChosenOffer | null> {
  return (await offersFor(trx, teamId, need, pricing))[0] ?? null;
}
