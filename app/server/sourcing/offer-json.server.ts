// An offer as plain JSON (pages and /api/v1/offers): money as exact decimal text beside its currency.
import type { OfferListItem } from "./offers.server";
import type { OfferJson } from "~/lib/sourcing-types";
import type { OfferTerms } from "~/domain/money/price-breaks";
import { moneyText, rateText, roundedText } from "~/domain/sourcing/comparison-rows";
import { costOffer, type TeamPricing } from "~/domain/sourcing/offer-costing";

export function offerJson(o: OfferListItem): OfferJson {
  return {
    id: o.id,
    supplier: { id: o.supplierId, name: o.supplierName },
    part: { kind: o.partKind, id: o.partId, maker: o.maker, model: o.model },
    sku: o.sku,
    currency: o.terms.currency,
    unitPrice: o.text.unitPrice,
    priceBreaks: o.text.priceBreaks,
    minimumOrder: o.terms.minimumOrder,
    shippingPerUnit: o.text.shippingPerUnit,
    shippingPerOrder: o.text.shippingPerOrder,
    leadTimeDays: o.leadTimeDays,
    stock: o.stock,
    validUntil: o.validUntil,
    expired: o.expired,
    notes: o.notes,
    updatedAt: o.updatedAt.toISOString(),
  };
}

/** The landed cost of `quantity` units as JSON: offer currency, quoting currency and the rate used. */
export function landedJson(terms: OfferTerms, quantity: number, pricing: TeamPricing) {
  const c = costOffer(terms, quantity, pricing);
  return {
    quantityNeeded: quantity,
    quantityBought: c.landed.quantityBought,
    unitPrice: moneyText(c.landed.unitPrice),
    goods: roundedText(c.landed.goods),
    shipping: roundedText(c.landed.shipping),
    total: roundedText(c.landed.total),
    totalInQuotingCurrency: c.totalQuoting ? roundedText(c.totalQuoting) : null,
    rate: rateText(c.rate),
    missingRate: c.missingRate,
  };
}
