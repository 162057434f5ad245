// The simulated year does not start with a free full battery: a warm-up run of the same weather year
// from full sets the charge on 1 January.
import { describe, expect, it } from "vitest";
import { simulateBattery } from "~/domain/sizing/battery-simulation";
import { planKit } from "~/domain/sizing/kit-plan";
import { hutPlanInput } from "./plan-fixtures";

describe("the battery's starting charge", () => {
  it("carries a given starting charge into the first day — hand calculation", () => {
    // Usable 1000 Wh, start at 300 Wh. Day 1: 300 + 0 − 600 → unmet 300, empty. Day 2: 0 + 1000 × 0.8 − 100 = 700.
    const r = simulateBattery({
      harvestWh: [0, 1000],
      loadWh: [600, 100],
      usableCapacityWh: [1000, 1000],
      depthOfDischarge: 0.5,
      roundTripEfficiency: 0.8,
      initialStoredWh: 300,
    });
    expect(r.unmetWh).toEqual([300, 0]);
    expect(r.endStoredWh).toBeCloseTo(700, 9);
    expect(r.stateOfChargePct[1]).toBeCloseTo(85, 9); // 100 − 50 × (1 − 0.7)
  });

  // The hut at 43° N with one string of three modules and one battery string: short in winter.
  const input = hutPlanInput({ forcedLayout: { modulesInSeries: 3, stringsInParallel: 1 }, forcedBatteryStrings: 1 });
  const plan = planKit(input);
  const days = plan.simulation.days;
  const startFull = {
    harvestWh: days.harvestWh,
    loadWh: days.loadWh,
    usableCapacityWh: days.month.map((m) => plan.battery.monthlyUsableWh[m - 1]),
    depthOfDischarge: plan.battery.effectiveDodPct / 100,
    roundTripEfficiency: input.parts.battery.roundTripEfficiencyPct / 100,
  };
  // The old simulation, built here explicitly: the same days, the battery full on 1 January.
  const old = simulateBattery(startFull);

  it("starts the reported year from the warm-up's 31 December state of charge", () => {
    // The warm-up is exactly that start-full run of the same weather year.
    expect(plan.simulation.startStateOfChargePct).toBe(old.stateOfChargePct[364]);
    expect(plan.simulation.startStateOfChargePct).toBeLessThan(100);
    const reported = simulateBattery({ ...startFull, initialStoredWh: old.endStoredWh });
    expect(plan.simulation.days.stateOfChargePct).toEqual(reported.stateOfChargePct);
    expect(plan.simulation.days.unmetWh).toEqual(reported.unmetWh);
    expect(plan.checks.find((c) => c.id === "simulation.unmet-days")?.basis).toMatch(/warm-up/);
    expect(plan.assumptions.some((a) => /first run once from a full battery/.test(a))).toBe(true);
  });

  it("counts at least as many unmet days as starting full — here more, in January", () => {
    const oldUnmetDays = old.unmetWh.filter((w) => w > 0).length;
    expect(plan.simulation.unmetDays).toBeGreaterThanOrEqual(oldUnmetDays);
    expect(plan.simulation.unmetDays).toBeGreaterThan(oldUnmetDays);
    const oldJanuary = old.unmetWh.slice(0, 31).filter((w) => w > 0).length;
    expect(plan.simulation.months[0].unmetDays).toBeGreaterThan(oldJanuary);
  });

  it("stays repeatable for a seed", () => {
    const again = planKit(input);
    expect(again.simulation).toEqual(plan.simulation);
  });
});
