// The search's building blocks: cheapest offer per quantity (dominance), the bounded candidate list,
// and candidates that cannot be priced. Invented prices in cents.
import { describe, expect, it } from "vitest";
import { PartPrices } from "~/domain/sourcing/alternatives/price-table";
import { searchAlternatives } from "~/domain/sourcing/alternatives/search";
import { compareCandidates, TopList, type Candidate } from "~/domain/sourcing/alternatives/top-list";
import { BATTERIES, offer, smallCatalogueInput } from "./catalogue";

describe("cheapest offer per quantity", () => {
  it("switches offer where a price break or per-order shipping makes another cheaper", () => {
    // A: 90.00 each + 25.00 per order; B: 95.00 each, 82.00 from 6 units, no shipping.
    const prices = new PartPrices([offer("A", 9000, 2500), offer("B", 9500, 0, [[6, 8200]])]);
    expect(prices.best(1)).toMatchObject({ costMinor: 9500, offer: { offerId: "B" } }); // 115.00 vs 95.00
    expect(prices.best(5)).toMatchObject({ costMinor: 47500, offer: { offerId: "A" } }); // 475.00 vs 475.00: first listed kept
    expect(prices.best(6)).toMatchObject({ costMinor: 49200, offer: { offerId: "B" } }); // 565.00 vs 492.00
  });

  it("says so when no offer can be priced", () => {
    const unpriced = { offerId: "X", supplierName: "S", costMinor: () => null };
    expect(new PartPrices([unpriced]).best(3)).toBeNull();
  });
});

describe("the bounded candidate list", () => {
  const c = (totalMinor: number, mi = 0): Candidate => ({
    totalMinor,
    moduleCount: 4,
    modulesInSeries: 2,
    stringsInParallel: 2,
    batteryStrings: 1,
    mi,
    ci: 0,
    bi: 0,
    ii: 0,
    moduleCostMinor: 0,
    batteryCount: 2,
    batteryCostMinor: 0,
  });

  it("keeps the cheapest in order and drops the dearest when full", () => {
    const top = new TopList(3);
    for (const t of [500, 100, 400, 300, 200, 600]) if (top.admits(t)) top.add(c(t));
    expect(top.items.map((x) => x.totalMinor)).toEqual([100, 200, 300]);
    expect(top.admits(301)).toBe(false);
  });

  it("orders equal totals by module count, strings, then list position", () => {
    expect(compareCandidates(c(100, 1), c(100, 0))).toBeGreaterThan(0);
    expect(compareCandidates({ ...c(100), moduleCount: 3 }, c(100))).toBeLessThan(0);
  });
});

it("counts candidates whose battery has no price in the quoting currency, and never lists them", () => {
  const noRate = BATTERIES.map((b) => (b.id === "bat-agm-100" ? { ...b, offers: [{ offerId: "gbp", supplierName: "S", costMinor: () => null }] } : b));
  const result = searchAlternatives(smallCatalogueInput({ batteries: noRate }));
  expect(result.pruned.find((p) => p.reason.startsWith("Candidates with no price"))?.count).toBeGreaterThan(0);
  expect(result.alternatives.some((a) => a.battery.id === "bat-agm-100")).toBe(false);
  expect(result.alternatives.length).toBe(10);
});
