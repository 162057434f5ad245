// A quote with mixed tax rates, margin, a discount and a deposit, worked out by hand below.
import { describe, expect, it } from "vitest";
import { moneyText } from "~/domain/money/money";
import { quoteTotals } from "~/domain/money/quote-totals";

describe("quote totals", () => {
  const lines = [
    // 4 modules at cost 84.50, margin 18 %: unit price 99.71 → 4 × 99.71 = 398.84, tax 20 %
    { description: "Module", quantity: 4, unitCost: "84.50", marginPct: 18, discountPct: 0, taxRatePct: 20 },
    // 1 battery at cost 612.40, margin 15 % = 704.26; discount 5 % → 669.047 → 669.05, tax 20 %
    { description: "Battery", quantity: 1, unitCost: "612.40", marginPct: 15, discountPct: 5, taxRatePct: 20 },
    // 6 h labour at 55.00, no margin, reduced tax 5 %: 330.00
    { description: "Labour", quantity: 6, unitCost: "55.00", marginPct: 0, discountPct: 0, taxRatePct: 5 },
    // Freight 38.20 at 0 %
    { description: "Freight", quantity: 1, unitCost: "38.20", marginPct: 0, discountPct: 0, taxRatePct: 0 },
  ];

  it("adds up to the cent: net 1436.09, tax 230.08, gross 1666.17, deposit 30 % 499.85, balance 1166.32", () => {
    const t = quoteTotals(lines, "EUR", 30);
    expect(t.lines.map((l) => moneyText(l.lineNet))).toEqual(["398.84", "669.05", "330.00", "38.20"]);
    // 20 % band: 398.84 + 669.05 = 1067.89 → tax 213.578 → 213.58
    // 5 % band: 330.00 → 16.50;   0 % band: 38.20 → 0.00
    expect(t.taxBands.map((b) => [b.ratePct, moneyText(b.net), moneyText(b.tax)])).toEqual([
      ["20", "1067.89", "213.58"],
      ["5", "330.00", "16.50"],
      ["0", "38.20", "0.00"],
    ]);
    expect(moneyText(t.net)).toBe("1436.09"); // 1067.89 + 330.00 + 38.20
    expect(moneyText(t.tax)).toBe("230.08"); // 213.58 + 16.50 + 0
    expect(moneyText(t.gross)).toBe("1666.17");
    // Deposit 30 %: 1666.17 × 0.3 = 499.851 → 499.85; balance 1666.17 − 499.85 = 1166.32
    expect(moneyText(t.deposit)).toBe("499.85");
    expect(moneyText(t.balance)).toBe("1166.32");
  });

  it("prices unit lines at the shown unit price times quantity when there is no discount", () => {
    const t = quoteTotals([lines[0]], "EUR", 0);
    expect(moneyText(t.lines[0].unitPrice)).toBe("99.71"); // 84.50 × 1.18 = 99.71 exactly
    expect(moneyText(t.deposit)).toBe("0.00");
  });

  it("builds a line from the rounded unit price the customer sees", () => {
    // cost 10.00 at 12.345 % margin → 11.2345 → shown 11.23; 3 × 11.23 = 33.69 (not 3 × 11.2345 = 33.70)
    const t = quoteTotals([{ description: "Fuse", quantity: 3, unitCost: "10.00", marginPct: "12.345", discountPct: 0, taxRatePct: 0 }], "EUR", 0);
    expect(moneyText(t.lines[0].unitPrice)).toBe("11.23");
    expect(moneyText(t.lines[0].lineNet)).toBe("33.69");
  });
});
