// A string too short to charge: which layout the plan falls back to when none is valid, and the energy a
// short string loses (in the module count, the monthly energy and the simulated year).
import { describe, expect, it } from "vitest";
import { planKit } from "~/domain/sizing/kit-plan";
import type { ControllerPart, ModulePart } from "~/domain/sizing/parts";
import type { KitPlanInput } from "~/domain/sizing/plan-types";
import { chooseLayout, listLayouts } from "~/domain/sizing/string-layout";
import type { LayoutContext } from "~/domain/sizing/string-layout";
import { mpptShortStringFactor, voltageFactorsBySeries } from "~/domain/sizing/string-voltage-harvest";
import { simulateYear } from "~/domain/sizing/year-simulation";
import { preparePlanSite } from "~/domain/sizing/kit-plan";
import { TEST_MODULE } from "../solar/yield-fixtures";
import { hutPlanInput } from "./plan-fixtures";

/** An invented 60-cell module (no real product): Vmp 31.0 V, Voc 37.8 V, NOCT 46 °C. */
const SIXTY: ModulePart = {
  pmaxW: 330,
  vmpV: 31.0,
  impA: 10.65,
  vocV: 37.8,
  iscA: 11.2,
  gammaPmaxPctPerC: -0.42,
  betaVocPctPerC: -0.32,
  alphaIscPctPerC: 0.06,
  noctC: 46,
  cellsInSeries: 60,
};
const MPPT_150V_60A: ControllerPart = {
  kind: "mppt",
  batteryVoltagesV: [12, 24, 48],
  maxPvVocV: 150,
  maxChargeCurrentA: 60,
  maxPvPowerW: { "24": 1600 },
  efficiencyPct: 98,
};

function context(overrides: Partial<LayoutContext> = {}): LayoutContext {
  return {
    module: SIXTY,
    controller: MPPT_150V_60A,
    systemVoltageV: 24,
    chargeVoltageV: 28.8, // gel: 14.4 V per 12 V
    coldestAirC: -18,
    hotCellC: 24 + ((46 - 20) / 800) * 1000, // NOCT model at 1000 W/m² on a 24 °C afternoon: 56.5 °C
    mpptHeadroomV: 5,
    ratingPowerW: 330,
    ...overrides,
  };
}

describe("the layout when none is valid", () => {
  // Voc at −18 °C: 37.8 × (1 + 0.0032 × 43) = 43.001 V → at most floor(150 / 43.001) = 3 in series.
  // Vmp at 56.5 °C (ΔT 31.5 K): 31.0 × (1 − 0.0042 × 31.5) / (1 + 0.0006 × 31.5) = 26.400 V; needed 28.8 + 5 = 33.8 V.
  // 4.84 modules needed → 1 × 5: 1650 W > 1600 W, 1650 × 0.98 / 24 = 67.4 A > 60 A, 26.4 V < 33.8 V (cannot charge well);
  // 2 × 3 and 3 × 2: 1980 W, 80.9 A (clip at the controller's limits), 52.8 V and 79.2 V (charge).
  const layouts = listLayouts(4.84, context());

  it("has no valid layout here — hand calculation", () => {
    expect(layouts.map((l) => `${l.modulesInSeries}×${l.stringsInParallel}`)).toEqual(["1×5", "2×3", "3×2"]);
    expect(layouts[0].stringVmpHotV).toBeCloseTo((31.0 * (1 - 0.0042 * 31.5)) / (1 + 0.0006 * 31.5), 9);
    expect(layouts[0].stringVmpNeededV).toBeCloseTo(33.8, 9);
    expect(layouts[0].vmpStatus).toBe("fail");
    expect(layouts[1].controllerOutputCurrentA).toBeCloseTo((1980 * 0.98) / 24, 9);
    expect(layouts.every((l) => !l.valid && l.vocOk)).toBe(true);
  });

  it("picks a layout that only clips at the current and power limits over a fewer-module one that cannot charge", () => {
    const chosen = chooseLayout(layouts, context());
    expect([chosen.modulesInSeries, chosen.stringsInParallel]).toEqual([3, 2]); // 6 modules, fewer strings than 2 × 3
    expect(chosen.vmpStatus).toBe("pass");
    expect(chosen.currentStatus).toBe("fail");
    expect(chosen.powerOk).toBe(false);
    expect(chosen.moduleCount).toBeGreaterThan(layouts[0].moduleCount); // the old rule (fewest modules safe on voltage) took 1 × 5
  });

  it("falls back to safe-on-voltage, then to the shortest string", () => {
    // 60 V controller: 2 × 43.0 V is too much, so only 1 × 5 is safe on voltage, and it cannot charge well.
    const oneOnly = context({ controller: { ...MPPT_150V_60A, maxPvVocV: 60 } });
    const chosen = chooseLayout(listLayouts(4.84, oneOnly), oneOnly);
    expect([chosen.modulesInSeries, chosen.vocOk, chosen.vmpStatus]).toEqual([1, true, "fail"]);
    // 40 V controller: even one module (43.0 V) is too much; the plan still shows the shortest string and its failures.
    const none = context({ controller: { ...MPPT_150V_60A, maxPvVocV: 40 } });
    const shortest = chooseLayout(listLayouts(4.84, none), none);
    expect([shortest.modulesInSeries, shortest.vocOk]).toEqual([1, false]);
  });
});

describe("the energy a short string loses", () => {
  const tMaxC = [0, 5, 10, 15, 20, 24, 24, 22, 18, 12, 6, 1];

  it("MPPT: a month keeps the power on a straight line from Vmp to Voc at the needed voltage — hand calculation", () => {
    const factorsFor = voltageFactorsBySeries(context(), tMaxC, 24);
    const one = factorsFor(1)!;
    // P/Pmp = (V/Vmp)·(Voc − V)/(Voc − Vmp) at V = 33.8 V (Kitwright's own rule, string-voltage-harvest.ts).
    // June at 24 °C: cell 56.5 °C, ΔT 31.5 K: Vmp 26.400 V (above); Voc 37.8 × (1 − 0.0032 × 31.5) = 33.990 V.
    // (33.8 / 26.400) × (33.990 − 33.8) / (33.990 − 26.400) = 1.2803 × 0.02503 = 0.0320.
    expect(one[5]).toBeCloseTo(0.032, 4);
    // January at 0 °C: cell 32.5 °C, ΔT 7.5 K: Vmp 31.0 × (1 − 0.0315) / (1 + 0.0045) = 29.889 V;
    // Voc 37.8 × (1 − 0.024) = 36.893 V: (33.8 / 29.889) × (36.893 − 33.8) / (36.893 − 29.889) = 0.4994.
    expect(one[0]).toBeCloseTo(0.4994, 4);
    expect(mpptShortStringFactor(29.889, 36.8928, 33.8)).toBeCloseTo(0.4994, 4);
    // Two in series: 52.8 V on the hottest afternoon, above 33.8 V: the engine's full figures.
    expect(factorsFor(2)).toBeNull();
    // A design high above every month's mean maximum does not cut a month the string charges in.
    expect(voltageFactorsBySeries(context(), tMaxC, 40)(2)).toBeNull();
  });

  it("MPPT: the rule's ends — full power from Vmp up, nothing once even Voc falls short", () => {
    expect(mpptShortStringFactor(34, 40, 33.8)).toBe(1);
    expect(mpptShortStringFactor(30, 33.8, 33.8)).toBe(0);
    expect(mpptShortStringFactor(30, 33, 33.8)).toBe(0);
    // Just above Vmp the line starts at full power: V = Vmp gives (1)·(1) = 1.
    expect(mpptShortStringFactor(33.79, 40, 33.8)).toBeCloseTo(1, 2);
  });

  it("PWM: a string shorter than the match gives nothing, a longer one the match's share", () => {
    // 36-cell module (Vmp 18.2 V) on 24 V PWM: the match is 2 in series. Needed: 29.4 V (AGM) + 0.5 V drop = 29.9 V.
    const pwm = context({
      module: { ...TEST_MODULE, cellsInSeries: 36 },
      controller: { kind: "pwm", batteryVoltagesV: [12, 24], maxPvVocV: 100, maxChargeCurrentA: 30, maxPvPowerW: {}, efficiencyPct: 98 },
      chargeVoltageV: 29.4,
    });
    const factorsFor = voltageFactorsBySeries(pwm, tMaxC, 24);
    expect(factorsFor(2)).toBeNull(); // the engine already holds the matching string at the battery's voltage
    // One module: even in January (cell 0 + 31.25 °C) Voc is 22.1 × (1 − 0.003 × 6.25) = 21.7 V < 29.9 V → nothing, every month.
    expect(factorsFor(1)).toEqual(new Array(12).fill(0));
    // Three: Voc at 24 °C + 31.25 K = 55.25 °C: 3 × 22.1 × (1 − 0.003 × 30.25) = 60.3 V reaches 29.9 V → 2/3 of the energy.
    expect(factorsFor(3)!.every((f) => Math.abs(f - 2 / 3) < 1e-12)).toBe(true);
  });
});

describe("a plan whose string cannot charge well", () => {
  // The hut (Madison, 43° N) with the 60-cell module on 24 V AGM: 29.4 V + 5 V = 34.4 V needed.
  function sixtyCellHut(design: Partial<KitPlanInput["design"]>): KitPlanInput {
    const base = hutPlanInput(design);
    return { ...base, parts: { ...base.parts, module: SIXTY, controller: MPPT_150V_60A } };
  }
  const input = sixtyCellHut({ forcedLayout: { modulesInSeries: 1, stringsInParallel: 2 }, forcedBatteryStrings: 1 });
  const plan = planKit(input);

  it("cuts each month's energy per module by the voltage factor — hand calculation", () => {
    const factors = plan.array.months.map((m) => m.voltageFactor!);
    // January (mean max −4 °C): cell 28.5 °C, ΔT 3.5 K: Vmp 31.0 × (1 − 0.0147) / (1 + 0.0021) = 30.480 V,
    // Voc 37.8 × (1 − 0.0112) = 37.377 V: (34.4 / 30.480) × (37.377 − 34.4) / (37.377 − 30.480) = 0.4871.
    expect(factors[0]).toBeCloseTo(0.4871, 4);
    // July (28 °C): cell 60.5 °C, ΔT 35.5 K: Voc 37.8 × (1 − 0.1136) = 33.506 V < 34.4 V: the string cannot charge.
    expect(factors[6]).toBe(0);
    plan.array.months.forEach((m, i) => {
      expect(m.energyPerModuleWhPerDay).toBeCloseTo(plan.moduleYield.months[i].energyWhPerDay * factors[i], 9);
      expect(m.arrayWhPerDay).toBeCloseTo(2 * m.energyPerModuleWhPerDay, 9);
    });
    // The worst month's module count uses the cut energy: more modules than the engine's full figures need.
    const full = planKit(sixtyCellHut({ forcedLayout: { modulesInSeries: 2, stringsInParallel: 1 } }));
    expect(full.array.months.every((m) => m.voltageFactor === 1)).toBe(true);
    expect(plan.array.modulesRequired).toBeGreaterThan(full.array.modulesRequired * 1.1);
    expect(plan.checks.find((c) => c.id === "array.vmp-hot")?.sentence).toMatch(/count the lost energy/);
    expect(plan.assumptions.some((a) => /Short string: .* straight line from the maximum power point to the open-circuit voltage/.test(a))).toBe(true);
  });

  it("simulates the year with the cut energy: same weather, less harvest, more unmet days", () => {
    const prepared = preparePlanSite(input.site);
    const dod = plan.battery.effectiveDodPct / 100;
    const yearWith = (arrayWh: (i: number) => number) =>
      simulateYear({
        months: plan.array.months.map((m, i) => ({
          clearnessIndex: prepared.profile.months[i].clearnessIndex,
          arrayWhPerDay: arrayWh(i),
          loadWhPerDay: m.loadWhPerDay,
          usableCapacityWh: plan.battery.monthlyUsableWh[i],
        })),
        transpositions: prepared.transpositions,
        depthOfDischarge: dod,
        roundTripEfficiency: 0.85,
      });
    // What the old planner simulated: the engine's full energy for the same two modules.
    const uncut = yearWith((i) => 2 * plan.moduleYield.months[i].energyWhPerDay);
    expect(yearWith((i) => plan.array.months[i].arrayWhPerDay)).toEqual(plan.simulation);
    plan.simulation.months.forEach((m, i) => expect(m.harvestKWh).toBeCloseTo(uncut.months[i].harvestKWh * plan.array.months[i].voltageFactor!, 9));
    expect(plan.simulation.unmetDays).toBeGreaterThan(uncut.unmetDays);
    expect(plan.checks.find((c) => c.id === "simulation.unmet-days")?.status).not.toBe("pass");
  });
});
