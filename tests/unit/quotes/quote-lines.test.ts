// A quote's lines with quote-wide defaults, worked out by hand (the arithmetic itself: quote-totals.ts,
// tested in tests/unit/money/quote-totals.test.ts).
import { describe, expect, it } from "vitest";
import { moneyText } from "~/domain/money/money";
import { effectiveLine, priceEnteredLines, type EnteredLine } from "~/domain/quotes/quote-lines";

const blank = { marginPct: null, discountPct: null, taxRatePct: null, partKind: null, partId: null, offerId: null } as const;
const defaults = { marginPct: "25", discountPct: "10", taxRatePct: "20" };

describe("quote lines with quote-wide defaults", () => {
  it("fills only what a line leaves blank", () => {
    const line: EnteredLine = { ...blank, kind: "labour", description: "Labour", quantity: "6", unitCost: "50", taxRatePct: "5" };
    expect(effectiveLine(line, defaults)).toMatchObject({ marginPct: "25", discountPct: "10", taxRatePct: "5" });
  });

  it("prices mixed lines to the cent", () => {
    const lines: EnteredLine[] = [
      // 2 × (80.00 × 1.25 = 100.00) = 200.00, less 10 % = 180.00, tax 20 %
      { ...blank, kind: "part", description: "Module", quantity: "2", unitCost: "80.00" },
      // 6 × (50.00 × 1.00 = 50.00) = 300.00, no discount, tax 5 %
      { ...blank, kind: "labour", description: "Labour", quantity: "6", unitCost: "50.00", marginPct: "0", discountPct: "0", taxRatePct: "5" },
      // 1 × (33.33 × 1.25 = 41.6625 → 41.66), less 10 % = 37.494 → 37.49, tax 20 %
      { ...blank, kind: "extra", description: "Labels", quantity: "1", unitCost: "33.33" },
    ];
    const t = priceEnteredLines(lines, defaults, "EUR", "40");
    expect(t.lines.map((l) => moneyText(l.lineNet))).toEqual(["180.00", "300.00", "37.49"]);
    // 20 % on 217.49 = 43.498 → 43.50; 5 % on 300.00 = 15.00
    expect(t.taxBands.map((b) => [b.ratePct, moneyText(b.net), moneyText(b.tax)])).toEqual([
      ["20", "217.49", "43.50"],
      ["5", "300.00", "15.00"],
    ]);
    expect(moneyText(t.net)).toBe("517.49");
    expect(moneyText(t.gross)).toBe("575.99"); // 517.49 + 43.50 + 15.00
    expect(moneyText(t.deposit)).toBe("230.40"); // 575.99 × 0.40 = 230.396
    expect(moneyText(t.balance)).toBe("345.59");
  });
});

describe("the plan's cabling as a quote line", () => {
  it("names each run's conductor, both conductors' length and its fuse, within the 300 characters a line holds", async () => {
    const { cablingLine } = await import("~/domain/quotes/plan-lines");
    const run = (label: string, conductor: string, oneWayLengthM: number, protectionA: number | null) =>
      ({ label, conductor: { label: conductor }, oneWayLengthM, protectionA }) as never;
    const plan = { cables: [run("Array to charge controller", "4 mm²", 15, 20), run("Charge controller to battery", "16 mm²", 2, 80)] } as never;
    expect(cablingLine(plan)!.description).toBe(
      "Cables and protection as sized in the plan: array to charge controller 4 mm² × 30 m, 20 A fuse; charge controller to battery 16 mm² × 4 m, 80 A fuse",
    );
    const many = { cables: Array.from({ length: 12 }, (_, i) => run(`Run number ${i} with a long name`, "10 mm²", 12.5, 63)) } as never;
    const line = cablingLine(many)!;
    expect(line.description.length).toBeLessThanOrEqual(300);
    expect(line.description).toMatch(/more in the plan$/);
  });
});
