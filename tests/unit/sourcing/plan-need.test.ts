import { describe, expect, it } from "vitest";
import { planKit } from "~/domain/sizing/kit-plan";
import { needFromPlan } from "~/domain/sourcing/plan-need";
import { hutPlanInput } from "../sizing/plan-fixtures";

describe("a saved plan's need, for comparing offers", () => {
  it("gives back the plan's own module count when its own module is compared", () => {
    const plan = planKit(hutPlanInput());
    const need = needFromPlan(plan);
    // Modules needed = energy ÷ (STC W × sun hours × (1 − losses)) is, for the plan's own module, the
    // design month's fractional count (the comparison rounds it up).
    const perModuleWh = plan.array.modulePmaxUsedW * need.sun * (1 - need.losses / 100);
    const design = plan.array.months[(plan.array.designMonth ?? 1) - 1];
    expect((need.energy * 1000) / perModuleWh).toBeCloseTo(design.modulesNeeded!, 6);
    expect(need.bank).toBe(plan.systemVoltageV);
    expect(need.batteries).toBe(plan.battery.batteryCount);
    expect(need.array).toBe(plan.array.layout.arrayStcPowerW);
  });
});
