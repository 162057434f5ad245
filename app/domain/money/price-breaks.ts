// Supplier offers: a unit price that falls with quantity, a minimum order, and shipping per unit and
// per order. Everything stays in the offer's currency; conversion happens after.
import Decimal from "decimal.js";
import { money, roundMoney, type Money } from "./money";

export interface PriceBreak {
  /** From this quantity upwards… */
  minQuantity: number;
  /** …each unit costs this. */
  unitPrice: Decimal;
}

export interface OfferTerms {
  currency: string;
  /** The price from quantity 1 (or from the minimum order). */
  unitPrice: Decimal;
  breaks: readonly PriceBreak[];
  minimumOrder: number;
  shippingPerUnit: Decimal;
  shippingPerOrder: Decimal;
}

export interface LandedCost {
  /** Units bought: the quantity needed, raised to the minimum order. */
  quantityBought: number;
  unitPrice: Money;
  goods: Money;
  shipping: Money;
  total: Money;
}

export function unitPriceFor(terms: OfferTerms, quantity: number): Decimal {
  let price = terms.unitPrice;
  let bestFrom = 0;
  for (const b of terms.breaks) {
    if (quantity >= b.minQuantity && b.minQuantity >= bestFrom) {
      price = b.unitPrice;
      bestFrom = b.minQuantity;
    }
  }
  return price;
}

/** Landed cost of `quantityNeeded` units, each line rounded once to the currency's minor unit. */
export function landedCost(terms: OfferTerms, quantityNeeded: number): LandedCost {
  if (!Number.isInteger(quantityNeeded) || quantityNeeded < 1) throw new RangeError("Quantity must be a whole number of at least 1");
  const quantityBought = Math.max(quantityNeeded, terms.minimumOrder);
  const unit = unitPriceFor(terms, quantityBought);
  const goods = roundMoney(money(unit.times(quantityBought), terms.currency));
  const shipping = roundMoney(money(terms.shippingPerUnit.times(quantityBought).plus(terms.shippingPerOrder), terms.currency));
  return {
    quantityBought,
    unitPrice: money(unit, terms.currency),
    goods,
    shipping,
    total: money(goods.amount.plus(shipping.amount), terms.currency),
  };
}
