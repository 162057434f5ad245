// Money arithmetic, every expected value worked by hand in the comment beside it.
import { describe, expect, it } from "vitest";
import Decimal from "decimal.js";
import { addMoney, formatMoney, money, moneyText, roundMoney, sumMoney } from "~/domain/money/money";
import { convertMoney, MissingRateError, type ExchangeRate } from "~/domain/money/currency-conversion";
import { landedCost, unitPriceFor, type OfferTerms } from "~/domain/money/price-breaks";

describe("money", () => {
  it("adds without binary float error", () => {
    // 0.1 + 0.2 = 0.3 exactly in decimal (a float gives 0.30000000000000004).
    expect(moneyText(addMoney(money("0.1", "EUR"), money("0.2", "EUR")))).toBe("0.30");
    // 1000 × 0.07 = 70.00
    expect(
      moneyText(
        sumMoney(
          Array.from({ length: 1000 }, () => money("0.07", "EUR")),
          "EUR",
        ),
      ),
    ).toBe("70.00");
  });

  it("rounds half away from zero to the currency's minor unit (ISO 4217 exponents)", () => {
    expect(moneyText(roundMoney(money("2.345", "EUR")))).toBe("2.35");
    expect(moneyText(roundMoney(money("-2.345", "EUR")))).toBe("-2.35");
    expect(moneyText(roundMoney(money("1234.5", "JPY")))).toBe("1235"); // JPY has no minor unit
    expect(moneyText(roundMoney(money("1.2345", "KWD")))).toBe("1.235"); // KWD has three
  });

  it("refuses to add different currencies", () => {
    expect(() => addMoney(money(1, "EUR"), money(1, "USD"))).toThrow(/without a conversion/);
  });

  it("formats for people with grouping and the code", () => {
    expect(formatMoney(money("1234567.5", "EUR"))).toBe("EUR 1,234,567.50");
    expect(formatMoney(money("-12.5", "EUR"))).toBe("EUR −12.50");
  });
});

describe("currency conversion with the team's rates", () => {
  const rates: ExchangeRate[] = [
    { from: "USD", to: "EUR", rate: new Decimal("0.90"), asOf: "2026-10-01" },
    { from: "USD", to: "EUR", rate: new Decimal("0.92"), asOf: "2026-11-15" },
    { from: "EUR", to: "GBP", rate: new Decimal("0.85"), asOf: "2026-11-01" },
  ];

  it("uses the newest rate on or before the date, and says which", () => {
    // 250 USD × 0.92 = 230.00 EUR (rate of 15 November)
    const now = convertMoney(money(250, "USD"), "EUR", rates, "2026-11-30");
    expect(moneyText(now.result)).toBe("230.00");
    expect(now.rate?.asOf).toBe("2026-11-15");
    // On 1 November only the October rate existed: 250 × 0.90 = 225.00 EUR
    expect(moneyText(convertMoney(money(250, "USD"), "EUR", rates, "2026-11-01").result)).toBe("225.00");
  });

  it("inverts a reverse rate exactly enough for money", () => {
    // 170 GBP ÷ 0.85 = 200.00 EUR
    expect(moneyText(roundMoney(convertMoney(money(170, "GBP"), "EUR", rates).result))).toBe("200.00");
  });

  it("names the missing pair instead of guessing", () => {
    expect(() => convertMoney(money(1, "JPY"), "EUR", rates)).toThrow(MissingRateError);
  });
});

describe("price breaks, minimum order and shipping", () => {
  const terms: OfferTerms = {
    currency: "EUR",
    unitPrice: new Decimal("89.90"),
    breaks: [
      { minQuantity: 10, unitPrice: new Decimal("84.50") },
      { minQuantity: 50, unitPrice: new Decimal("79.95") },
    ],
    minimumOrder: 4,
    shippingPerUnit: new Decimal("3.10"),
    shippingPerOrder: new Decimal("45.00"),
  };

  it("picks the break for the quantity", () => {
    expect(unitPriceFor(terms, 9).toString()).toBe("89.9");
    expect(unitPriceFor(terms, 10).toString()).toBe("84.5");
    expect(unitPriceFor(terms, 75).toString()).toBe("79.95");
  });

  it("lands 12 units: 12 × 84.50 = 1014.00 goods, 12 × 3.10 + 45 = 82.20 shipping, 1096.20 in all", () => {
    const cost = landedCost(terms, 12);
    expect(moneyText(cost.goods)).toBe("1014.00");
    expect(moneyText(cost.shipping)).toBe("82.20");
    expect(moneyText(cost.total)).toBe("1096.20");
  });

  it("raises a small need to the minimum order: 2 needed → 4 bought, 4 × 89.90 + 4 × 3.10 + 45 = 417.00", () => {
    const cost = landedCost(terms, 2);
    expect(cost.quantityBought).toBe(4);
    expect(moneyText(cost.total)).toBe("417.00");
  });

  it("rejects a fractional or zero quantity", () => {
    expect(() => landedCost(terms, 0)).toThrow(RangeError);
    expect(() => landedCost(terms, 2.5)).toThrow(RangeError);
  });
});
