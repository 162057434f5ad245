// The current plan's own kit, priced as every alternative is priced (cheapest valid offer per part at
// the plan's quantity), and what each alternative saves or costs more. Invented prices in euro cents
// (catalogue.ts); the hand sums are written out.
import { describe, expect, it } from "vitest";
import { searchAlternatives } from "~/domain/sourcing/alternatives/search";
import { againstCurrent, alternativesJson, currentKitSentence } from "~/lib/alternatives-view";
import { BATTERIES, smallCatalogueInput } from "./catalogue";

const labels = { module: "Mod 100", controller: "MPPT 30", battery: "AGM 200", inverter: "Inverter 1000" };

describe("the current kit's landed total", () => {
  it("adds each part's cheapest offer at the plan's quantity", () => {
    // The hut plan with mod-100, ctl-mppt-30, bat-agm-200, inv-1000: 6 modules, 6 batteries.
    // Modules: offer B's break from 6 units, 6 × 82.00 = 492.00 (offer A: 6 × 90.00 + 25.00 = 565.00).
    // Controller 210.00; batteries 6 × 360.00 + 50.00 = 2 210.00; inverter 320.00.
    // Total 492.00 + 210.00 + 2 210.00 + 320.00 = 3 232.00 EUR.
    const result = searchAlternatives(smallCatalogueInput({ currentLabels: labels }));
    expect(result.current).toEqual({ totalMinor: 323200, moduleCount: 6, batteryCount: 6, meetsPlan: true, problems: [] });
    expect(currentKitSentence(result.current, "EUR")).toBe("Your current kit: EUR 3,232.00 at the team's cheapest offers (6 modules, 6 batteries).");
    const view = alternativesJson({ planId: "p", revision: 1, result, offerCount: 12, ratesUsed: [], searchMs: 1 })!;
    expect(view.currentKit.landedCost).toBe("3232.00");
    // The cheapest alternative is 2 972.00 EUR (alternatives.test.ts): it saves 260.00 EUR.
    expect(view.alternatives[0].totalLandedCost).toBe("2972.00");
    expect(view.alternatives[0].againstCurrentKit).toEqual({ difference: "-260.00", words: "saves EUR 260.00" });
  });

  it("says which part has no valid offer, or no price in the quoting currency", () => {
    const noOffer = searchAlternatives(smallCatalogueInput({ currentLabels: labels, batteries: BATTERIES.filter((b) => b.id !== "bat-agm-200") }));
    expect(noOffer.current.totalMinor).toBeNull();
    expect(currentKitSentence(noOffer.current, "EUR")).toBe("Your current kit cannot be costed: no valid offer for AGM 200.");
    expect(againstCurrent(100000, noOffer.current, "EUR")).toBeNull();

    const unpriced = BATTERIES.map((b) => (b.id === "bat-agm-200" ? { ...b, offers: [{ offerId: "gbp", supplierName: "S", costMinor: () => null }] } : b));
    const noRate = searchAlternatives(smallCatalogueInput({ currentLabels: labels, batteries: unpriced }));
    expect(noRate.current.problems).toEqual(["no price in EUR for AGM 200 (an exchange rate is missing)"]);
  });

  it("words a dearer or equal kit as such", () => {
    const current = { totalMinor: 323200, moduleCount: 6, batteryCount: 6, meetsPlan: true, problems: [] };
    expect(againstCurrent(330000, current, "EUR")).toEqual({ difference: "68.00", words: "costs EUR 68.00 more" });
    expect(againstCurrent(323200, current, "EUR")).toEqual({ difference: "0.00", words: "same cost" });
  });

  it("says when the current kit itself misses the plan's unmet-days target", () => {
    const current = { totalMinor: 179200, moduleCount: 6, batteryCount: 2, meetsPlan: false, problems: [] };
    expect(currentKitSentence(current, "EUR")).toBe(
      "Your current kit: EUR 1,792.00 at the team's cheapest offers (6 modules, 2 batteries). It does not itself meet every check and the unmet-days target of this plan.",
    );
  });
});
