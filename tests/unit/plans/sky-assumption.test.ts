// A sky preset instead of measured irradiation is an assumption, said in the same words on the plan's key
// figures, the energy chart's caption and the customer's quote (old quotes without it still render).
import { describe, expect, it } from "vitest";
import { EnergyVsLoadChart } from "~/components/plans/energy-vs-load-chart";
import { PlanKeyFigures } from "~/components/plans/plan-key-figures";
import { QuoteDocument } from "~/components/quotes/quote-document";
import { snapshotFromPlan } from "~/domain/quotes/plan-snapshot";
import { planKit } from "~/domain/sizing/kit-plan";
import type { KitPlanInput } from "~/domain/sizing/plan-types";
import { skyAssumptionOfMonths, skyAssumptionOfPreset, skyAssumptionSentence, skyAssumptionShort, SKY_PRESETS } from "~/domain/solar/sky-assumption";
import type { QuoteDocumentData } from "~/lib/quote-document";
import { toEngineSite } from "~/lib/site-forms";
import { hutPlanInput } from "../sizing/plan-fixtures";
import { markup, textOf } from "./render";

const TEMPERATE = "Sunshine estimated for typical temperate, mixed skies (clearness index 0.50), not measured at the site.";

/** The hut's plan with the site on a preset, the way the plan service builds it (toEngineSite). */
function presetPlanInput(preset: keyof typeof SKY_PRESETS): KitPlanInput {
  const base = hutPlanInput();
  const engine = toEngineSite({
    ...base.site,
    irradianceSource: "clearness-preset",
    clearnessPreset: preset,
    months: base.site.months.map((m) => ({ tMaxC: m.tMaxC, tMinC: m.tMinC })),
  });
  return { ...base, site: { ...base.site, months: engine.months } };
}

const measuredPlan = planKit(hutPlanInput());
const presetPlan = planKit(presetPlanInput("temperate"));

describe("the sky assumption's words", () => {
  it("names the preset and its clearness index in plain words", () => {
    expect(skyAssumptionSentence(skyAssumptionOfPreset("temperate")!)).toBe(TEMPERATE);
    expect(skyAssumptionShort(skyAssumptionOfPreset("arid")!)).toBe("Assumed sky: arid, mostly clear skies, clearness index 0.65");
    expect(skyAssumptionOfPreset(null)).toBeNull();
    expect(skyAssumptionOfPreset("stormy")).toBeNull();
  });

  it("reads the assumption back from a plan's months, and finds none in measured months", () => {
    expect(skyAssumptionOfMonths(presetPlan.moduleYield.months)).toMatchObject({ preset: "temperate", clearnessMin: 0.5, clearnessMax: 0.5 });
    expect(skyAssumptionOfMonths(planKit(presetPlanInput("overcast")).moduleYield.months)?.preset).toBe("overcast");
    expect(skyAssumptionOfMonths(measuredPlan.moduleYield.months)).toBeNull();
    expect(skyAssumptionOfMonths(undefined)).toBeNull();
  });

  it("says so when the clearness is not a preset's, or only some months are assumed", () => {
    const months = Array.from({ length: 12 }, (_, i) => ({
      month: i + 1,
      irradianceSource: i < 2 ? ("clearness-index" as const) : ("measured" as const),
      clearnessIndex: i === 0 ? 0.42 : 0.47,
    }));
    expect(skyAssumptionSentence(skyAssumptionOfMonths(months)!)).toBe(
      "Sunshine estimated for an assumed sky for Jan, Feb (clearness index 0.42–0.47), not measured at the site.",
    );
  });
});

describe("where the plan shows it", () => {
  it("puts it above the key figures of a preset plan only", () => {
    expect(textOf(markup(PlanKeyFigures, { plan: presetPlan }))).toContain(`Assumption: ${TEMPERATE}`);
    expect(textOf(markup(PlanKeyFigures, { plan: measuredPlan }))).not.toContain("Sunshine assumed");
  });

  it("puts it in the energy-vs-load chart's caption", () => {
    const caption = (plan: typeof presetPlan) => textOf(markup(EnergyVsLoadChart, { plan }).split('data-testid="energy-chart-caption"')[1]);
    expect(caption(presetPlan)).toContain(TEMPERATE);
    expect(caption(measuredPlan)).not.toContain("Sunshine assumed");
  });
});

describe("the customer's quote", () => {
  const meta = { planName: "Hut kit", planRevision: 2, siteName: "Vell hut", autonomyDays: 3, overrides: [] };

  function doc(plan: QuoteDocumentData["plan"]): QuoteDocumentData {
    return {
      number: "Q-0007",
      revision: 1,
      title: "Kit",
      teamName: "Tallowmere Power Works",
      customerName: "Mira Tallow",
      customerEmail: "mira@example.test",
      issuedOn: "1 Dec 2026",
      validUntil: "31 Dec 2026",
      terms: "Deposit on order.",
      lines: [],
      totals: { currency: "EUR", net: "0.00", taxBands: [], gross: "0.00", depositPct: "30", deposit: "0.00" },
      plan,
    };
  }

  function energySection(html: string) {
    const text = textOf(html);
    return text.slice(text.indexOf("Energy you can expect"), text.indexOf("How the design was checked"));
  }

  it("keeps the assumption in the quote's plan snapshot and shows it in the energy section", () => {
    const snapshot = snapshotFromPlan(presetPlan, meta);
    expect(snapshot.skyAssumption?.preset).toBe("temperate");
    // The snapshot is stored as JSON: what is read back must still render the same words.
    const stored = JSON.parse(JSON.stringify(snapshot));
    expect(energySection(markup(QuoteDocument, { doc: doc(stored) }))).toContain(`Assumption: ${TEMPERATE}`);
  });

  it("says nothing of a sky for measured irradiation, and renders an old snapshot that predates the field", () => {
    const measured = snapshotFromPlan(measuredPlan, meta);
    expect(measured.skyAssumption).toBeNull();
    expect(energySection(markup(QuoteDocument, { doc: doc(measured) }))).not.toContain("Sunshine assumed");
    const { skyAssumption: _dropped, ...old } = snapshotFromPlan(presetPlan, meta);
    const html = markup(QuoteDocument, { doc: doc(old) });
    expect(textOf(html)).toContain("Energy you can expect");
    expect(textOf(html)).not.toContain("Sunshine assumed");
  });
});
