// Module comparison rows: price per nameplate and per verified watt, modules and area for the energy
// target, and the ranking that flips when the verified power is counted. Figures are the demo
// scenario's (invented): QP-150P verified at 84 % of its 150 W, FM-120M at 99 % of its 120 W.
import { describe, expect, it } from "vitest";
import Decimal from "decimal.js";
import { DEFAULT_NEED, type ComparisonNeed } from "~/domain/sourcing/comparison-need";
import { moduleRow } from "~/domain/sourcing/module-rows";
import type { ModuleFigures, OfferFacts } from "~/domain/sourcing/offer-facts";
import { rankBy } from "~/domain/sourcing/ranking";

function module(id: string, pmaxW: number, verifiedPmaxW: number | null, lengthMm: number, widthMm: number): ModuleFigures {
  const areaM2 = (lengthMm * widthMm) / 1e6;
  return {
    id,
    maker: "Maker",
    model: id,
    pmaxW,
    verifiedPmaxW,
    verifiedReadingCount: verifiedPmaxW === null ? 0 : 5,
    verifiedRatio: verifiedPmaxW === null ? null : verifiedPmaxW / pmaxW,
    areaM2,
    nameplateDensityWm2: pmaxW / areaM2,
    measuredDensityWm2: verifiedPmaxW === null ? null : verifiedPmaxW / areaM2,
  };
}

function offer(id: string, partId: string, price: string, currency = "EUR"): OfferFacts {
  return {
    id,
    supplierId: "s",
    supplierName: "Supplier",
    partKind: "modules",
    partId,
    sku: "",
    terms: { currency, unitPrice: new Decimal(price), breaks: [], minimumOrder: 1, shippingPerUnit: new Decimal(0), shippingPerOrder: new Decimal("30.00") },
    leadTimeDays: 5,
    stock: 20,
    validUntil: null,
    notes: "",
  };
}

const need: ComparisonNeed = { ...DEFAULT_NEED, quantity: null, source: { kind: "typed" } };
const pricing = { quotingCurrency: "EUR", rates: [], asOf: "2026-12-01" };
const qp = module("QP-150P", 150, 126, 1480, 670);
const fm = module("FM-120M", 120, 118.8, 1070, 705);

describe("module comparison rows", () => {
  const qpRow = moduleRow(offer("o1", "QP-150P", "58.50"), qp, need, pricing);
  const fmRow = moduleRow(offer("o2", "FM-120M", "48.00"), fm, need, pricing);

  it("prices per nameplate and per verified watt in the quoting currency", () => {
    expect(qpRow.pricePerNameplateW).toEqual({ amount: "0.39", currency: "EUR" }); // 58.50 ÷ 150
    expect(new Decimal(qpRow.pricePerVerifiedW!.amount).toFixed(4)).toBe("0.4643"); // 58.50 ÷ 126
    expect(fmRow.pricePerNameplateW).toEqual({ amount: "0.4", currency: "EUR" }); // 48.00 ÷ 120
    expect(new Decimal(fmRow.pricePerVerifiedW!.amount).toFixed(4)).toBe("0.4040"); // 48.00 ÷ 118.8
  });

  it("counts modules on the verified power and lands that many", () => {
    // 2.4 kWh/day ÷ (3 h × 0.8) = 1000 W: 1000 ÷ 126 → 8 QP-150P; 1000 ÷ 118.8 → 9 FM-120M
    expect(qpRow.requiredArrayW).toBeCloseTo(1000, 6);
    expect(qpRow.quantityNeeded).toBe(8);
    expect(fmRow.quantityNeeded).toBe(9);
    // 8 × 58.50 + 30.00 = 498.00; 9 × 48.00 + 30.00 = 462.00
    expect(qpRow.landed).toEqual({ amount: "498.00", currency: "EUR" });
    expect(fmRow.landed).toEqual({ amount: "462.00", currency: "EUR" });
    // 8 × 0.9916 = 7.9328 m²; 9 × 0.754350 = 6.78915 m²
    expect(qpRow.areaNeededM2).toBeCloseTo(7.9328, 6);
    expect(fmRow.areaNeededM2).toBeCloseTo(6.78915, 6);
    expect(qpRow.powerBasis).toBe("verified");
  });

  it("ranks QP-150P first per nameplate watt and FM-120M first per verified watt", () => {
    const rows = [qpRow, fmRow];
    expect(rankBy(rows, (r) => r.pricePerNameplateW).map((r) => r.model)).toEqual(["QP-150P", "FM-120M"]);
    expect(rankBy(rows, (r) => r.pricePerVerifiedW).map((r) => r.model)).toEqual(["FM-120M", "QP-150P"]);
  });

  it("marks a module without readings: no verified price, counted on nameplate, ranked last", () => {
    const bare = moduleRow(offer("o3", "X", "20.00"), module("X", 100, null, 1000, 600), need, pricing);
    expect(bare.pricePerVerifiedW).toBeNull();
    expect(bare.verifiedRatio).toBeNull();
    expect(bare.powerBasis).toBe("nameplate");
    expect(bare.quantityNeeded).toBe(10); // 1000 ÷ 100
    expect(rankBy([bare, qpRow, fmRow], (r) => r.pricePerVerifiedW).map((r) => r.model)).toEqual(["FM-120M", "QP-150P", "X"]);
  });

  it("uses a typed quantity for every module when given", () => {
    const row = moduleRow(offer("o1", "QP-150P", "58.50"), qp, { ...need, quantity: 4 }, pricing);
    expect(row.quantityNeeded).toBe(4);
    expect(row.requiredArrayW).toBeNull();
  });

  it("leaves the quoting-currency figures empty, and says why, without a rate", () => {
    const row = moduleRow(offer("o4", "QP-150P", "50.00", "CHF"), qp, need, pricing);
    expect(row.pricePerNameplateW).toBeNull();
    expect(row.landed).toBeNull();
    expect(row.missingRate).toMatch(/No CHF → EUR rate/);
    expect(row.offerLanded).toEqual({ amount: "430.00", currency: "CHF" }); // 8 × 50.00 + 30.00
  });
});
