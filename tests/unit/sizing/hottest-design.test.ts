// A site's hottest expected air temperature (a design high) drives the hot-afternoon string voltage
// check and the optimiser's string lengths, while each month's energy keeps its own mean maximum.
//
// Hand figures: the invented 36-cell test module (Vmp 18.2 V, γ −0.40 %/°C, α +0.05 %/°C, NOCT 45 °C)
// on the Madison hut (hottest month's mean daily maximum 28 °C, July), 24 V AGM: charging voltage
// 2 × 14.7 = 29.4 V, plus a 1 V tracker headroom = 30.4 V needed.
// Cell temperature: the NOCT model at full sun, Tc = Ta + (NOCT − 20)/800 × 1000 (hotCellTemperatureC in
// string-voltage.ts, noctCellTemperatureC in cell-temperature.ts): a rise of (45 − 20) × 1.25 = 31.25 K.
// Vmp at the cell temperature as the yield engine shifts it: Vmp × (1 + γΔT)/(1 + αΔT) (translateKeyPoints).
//   No design high: 28 + 31.25 = 59.25 °C, ΔT 34.25 K: 18.2 × (1 − 0.137)/(1 + 0.017125) = 15.4422 V; × 2 = 30.884 V ≥ 30.4 V.
//   Design high 38 °C: 38 + 31.25 = 69.25 °C, ΔT 44.25 K: 18.2 × (1 − 0.177)/(1 + 0.022125) = 14.6544 V; × 2 = 29.309 V < 30.4 V.
import { describe, expect, it } from "vitest";
import { planKit } from "~/domain/sizing/kit-plan";
import { planInputIssues } from "~/domain/sizing/plan-input";
import type { KitPlan, KitPlanInput } from "~/domain/sizing/plan-types";
import { voltageValidSeries, type ModulePair } from "~/domain/sourcing/alternatives/precompute";
import { hutPlanInput } from "./plan-fixtures";

const VMP_NO_DESIGN_HIGH_V = (18.2 * (1 - 0.004 * 34.25)) / (1 + 0.0005 * 34.25);
const VMP_AT_38_C_V = (18.2 * (1 - 0.004 * 44.25)) / (1 + 0.0005 * 44.25);

function hut(hottestTempC?: number): KitPlanInput {
  const input = hutPlanInput({ mpptHeadroomV: 1, forcedLayout: { modulesInSeries: 2, stringsInParallel: 4 } });
  return hottestTempC === undefined ? input : { ...input, site: { ...input.site, hottestTempC } };
}

function vmpHot(plan: KitPlan) {
  const check = plan.checks.find((c) => c.id === "array.vmp-hot")!;
  const value = (label: string) => check.figures.find((f) => f.label === label)!.value;
  return { check, cellC: value("Hottest cell temperature"), moduleVmpV: value("Module Vmp at that temperature") };
}

describe("the hot-afternoon check with a design high", () => {
  const without = planKit(hut());
  const withHigh = planKit(hut(38));

  it("takes the hottest month's mean maximum when the site has no design high — hand calculation", () => {
    const { check, cellC, moduleVmpV } = vmpHot(without);
    expect(VMP_NO_DESIGN_HIGH_V).toBeCloseTo(15.4422, 4);
    expect(cellC).toBeCloseTo(59.25, 9);
    expect(moduleVmpV).toBeCloseTo(VMP_NO_DESIGN_HIGH_V, 9);
    expect(without.array.layout.stringVmpHotV).toBeCloseTo(30.884, 3);
    expect(without.array.layout.stringVmpNeededV).toBeCloseTo(30.4, 9);
    expect(check.status).toBe("pass");
    expect(without.assumptions.join(" ")).toMatch(/cells at 28 °C air \(the hottest month's mean daily maximum\)/);
  });

  it("uses the design high when given, and fails a string that only passed on the monthly mean — hand calculation", () => {
    const { check, cellC, moduleVmpV } = vmpHot(withHigh);
    expect(VMP_AT_38_C_V).toBeCloseTo(14.6544, 4);
    expect(cellC).toBeCloseTo(69.25, 9);
    expect(moduleVmpV).toBeCloseTo(VMP_AT_38_C_V, 9);
    expect(withHigh.array.layout.stringVmpHotV).toBeCloseTo(29.309, 3);
    expect(check.status).toBe("fail");
    // ceil(30.4 / 14.6544) = ceil(2.074) = 3.
    expect(check.sentence).toMatch(/Put at least 3 in series/);
    expect(withHigh.assumptions.join(" ")).toMatch(/cells at 38 °C air \(the site's hottest expected temperature\)/);
  });

  it("leaves each month's energy on the month's own mean maximum (no month reaches the design high)", () => {
    // July, the hottest month, still gives 30.884 V ≥ 30.4 V: no month's energy is cut, with or without the design high.
    expect(withHigh.array.months.map((m) => m.voltageFactor)).toEqual(new Array(12).fill(1));
    expect(withHigh.array.months.map((m) => m.energyPerModuleWhPerDay)).toEqual(without.array.months.map((m) => m.energyPerModuleWhPerDay));
    expect(withHigh.array.modulesRequired).toBe(without.array.modulesRequired);
    // Without a lost month the failing check does not claim the energy figures count a loss.
    expect(vmpHot(withHigh).check.sentence).not.toMatch(/count the lost energy/);
  });

  it("refuses a design high outside −40…60 °C at the field", () => {
    expect(planInputIssues(hut(61))).toEqual([{ path: "site.hottestTempC", message: "The hottest expected temperature (°C) must be between -40 and 60." }]);
    expect(planInputIssues(hut(60))).toEqual([]);
  });
});

describe("the optimiser's string lengths with a design high", () => {
  function pair(input: KitPlanInput): ModulePair {
    return {
      module: { id: "m", label: "Test module", part: input.parts.module, offers: [] },
      controller: { id: "c", label: "Test controller", part: input.parts.controller, offers: [] },
      energyWhPerDay: new Float64Array(12),
      ratingPowerW: input.parts.module.pmaxW,
      seriesByChargeVoltage: new Map(),
    };
  }

  it("drops a string length whose Vmp passes only on the monthly mean — hand calculation", () => {
    // Cold side (−25 °C): 22.1 × (1 + 0.003 × 50) = 25.415 V per module; 100 V controller → at most 3 in series.
    // Hot side: one module never reaches 30.4 V; two pass at 59.25 °C (30.884 V) and fail at 69.25 °C (29.309 V).
    expect(voltageValidSeries(pair(hut()), hut(), 29.4)).toEqual([2, 3]);
    expect(voltageValidSeries(pair(hut(38)), hut(38), 29.4)).toEqual([3]);
  });
});
