// The cheapest offer of one part at each quantity, worked out once per quantity and remembered. Other
// offers of the same part at that quantity are dominated: swapping in the cheapest offer changes no
// check and lowers the total, so no cheaper valid kit is lost by skipping them.
import type { OfferPrice } from "./types";

export interface BestOffer {
  costMinor: number;
  offer: OfferPrice;
}

export class PartPrices {
  private readonly cost: number[] = [];
  private readonly which: number[] = [];
  constructor(readonly offers: readonly OfferPrice[]) {}

  /** Cheapest landed cost in minor units at `quantity`; NaN when no offer can be priced. */
  costAt(quantity: number): number {
    const known = this.cost[quantity];
    if (known !== undefined) return known;
    let best = NaN;
    let index = -1;
    this.offers.forEach((offer, i) => {
      const c = offer.costMinor(quantity);
      if (c !== null && !(c >= best)) {
        best = c;
        index = i;
      }
    });
    this.cost[quantity] = best;
    this.which[quantity] = index;
    return best;
  }

  best(quantity: number): BestOffer | null {
    const costMinor = this.costAt(quantity);
    return Number.isNaN(costMinor) ? null : { costMinor, offer: this.offers[this.which[quantity]] };
  }
}
