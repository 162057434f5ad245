// An offer's landed cost in its own currency and in the team's quoting currency, with the rate used.
// Every expected value is worked out by hand beside it.
import { describe, expect, it } from "vitest";
import Decimal from "decimal.js";
import { moneyText } from "~/domain/money/money";
import type { OfferTerms } from "~/domain/money/price-breaks";
import { costOffer, type TeamPricing } from "~/domain/sourcing/offer-costing";

const gbpTerms: OfferTerms = {
  currency: "GBP",
  unitPrice: new Decimal("45.00"),
  breaks: [{ minQuantity: 10, unitPrice: new Decimal("42.50") }],
  minimumOrder: 2,
  shippingPerUnit: new Decimal("1.20"),
  shippingPerOrder: new Decimal("25.00"),
};

const pricing = (rates: TeamPricing["rates"], asOf = "2026-12-01"): TeamPricing => ({ quotingCurrency: "EUR", rates, asOf });

describe("costing an offer for a quantity", () => {
  it("12 units in GBP: 12 × 42.50 = 510.00 goods, 12 × 1.20 + 25.00 = 39.40 shipping, 549.40; × 1.1725 = 644.1715 → EUR 644.17", () => {
    const c = costOffer(gbpTerms, 12, pricing([{ from: "GBP", to: "EUR", rate: new Decimal("1.1725"), asOf: "2026-11-20" }]));
    expect(moneyText(c.landed.goods)).toBe("510.00");
    expect(moneyText(c.landed.shipping)).toBe("39.40");
    expect(moneyText(c.landed.total)).toBe("549.40");
    expect(c.totalQuoting!.amount.toFixed()).toBe("644.17");
    expect(c.totalQuoting!.currency).toBe("EUR");
    // Unit price converted but not rounded: 42.50 × 1.1725 = 49.83125
    expect(c.unitPriceQuoting!.amount.toFixed()).toBe("49.83125");
    expect(c.rate).toMatchObject({ from: "GBP", to: "EUR", asOf: "2026-11-20" });
    expect(c.rate!.rate.toFixed()).toBe("1.1725");
  });

  it("uses the newest rate dated on or before the day, never a later one", () => {
    const rates = [
      { from: "GBP", to: "EUR", rate: new Decimal("1.15"), asOf: "2026-10-01" },
      { from: "GBP", to: "EUR", rate: new Decimal("1.20"), asOf: "2026-12-05" },
    ];
    // 2 units (the minimum order): 2 × 45.00 + 2 × 1.20 + 25.00 = 117.40 GBP; × 1.15 = 135.01 EUR
    const c = costOffer(gbpTerms, 1, pricing(rates));
    expect(c.landed.quantityBought).toBe(2);
    expect(moneyText(c.landed.total)).toBe("117.40");
    expect(c.totalQuoting!.amount.toFixed()).toBe("135.01");
    expect(c.rate!.asOf).toBe("2026-10-01");
  });

  it("inverts a rate entered the other way: 549.40 GBP ÷ 0.85 = 646.3529… → EUR 646.35", () => {
    const c = costOffer(gbpTerms, 12, pricing([{ from: "EUR", to: "GBP", rate: new Decimal("0.85"), asOf: "2026-11-01" }]));
    expect(c.totalQuoting!.amount.toFixed()).toBe("646.35");
    expect(c.rate).toMatchObject({ from: "GBP", to: "EUR", asOf: "2026-11-01" });
  });

  it("reports a missing rate instead of guessing, and still lands the cost in the offer's currency", () => {
    const c = costOffer({ ...gbpTerms, currency: "USD" }, 12, pricing([]));
    expect(c.missingRate).toEqual({ from: "USD", to: "EUR" });
    expect(c.totalQuoting).toBeNull();
    expect(c.unitPriceQuoting).toBeNull();
    expect(moneyText(c.landed.total)).toBe("549.40");
  });

  it("needs no rate in the quoting currency itself", () => {
    const c = costOffer({ ...gbpTerms, currency: "EUR" }, 12, pricing([]));
    expect(c.rate).toBeNull();
    expect(c.totalQuoting!.amount.toFixed()).toBe("549.4");
  });

  it("adds 0.1 and 0.2 exactly: one unit at 0.10 with 0.20 shipping lands at 0.30, ten at 3.00", () => {
    const terms: OfferTerms = {
      currency: "EUR",
      unitPrice: new Decimal("0.1"),
      breaks: [],
      minimumOrder: 1,
      shippingPerUnit: new Decimal("0.2"),
      shippingPerOrder: new Decimal(0),
    };
    expect(costOffer(terms, 1, pricing([])).totalQuoting!.amount.toFixed(2)).toBe("0.30");
    expect(costOffer(terms, 1, pricing([])).totalQuoting!.amount.eq("0.3")).toBe(true);
    // A float would give 0.1 + 0.2 = 0.30000000000000004 and 10 × 0.1 + 10 × 0.2 = 3.0000000000000004.
    expect(costOffer(terms, 10, pricing([])).totalQuoting!.amount.toFixed()).toBe("3");
  });
});
