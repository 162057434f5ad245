// Three invented kit plans for the plan-page component tests, built by the real planner from the sizing
// fixtures: one that passes its safety checks, one whose string is too long for the controller on a cold
// morning and whose array and battery are too small (so the simulated year has unmet days), and a
// DC-only kit with no inverter.
import { planKit } from "~/domain/sizing/kit-plan";
import type { KitPlan, KitPlanInput } from "~/domain/sizing/plan-types";
import { hutPlanInput } from "../sizing/plan-fixtures";

export function passingPlanInput(): KitPlanInput {
  return hutPlanInput();
}

/**
 * 4 × 22.1 V × (1 + 0.003 × 50) = 101.66 V at −25 °C, above the controller's 100 V (see kit-plan.test.ts);
 * one string of four modules and one battery string are too little for the winter load.
 */
export function failingPlanInput(): KitPlanInput {
  return hutPlanInput({ forcedLayout: { modulesInSeries: 4, stringsInParallel: 1 }, forcedBatteryStrings: 1 });
}

export function dcOnlyPlanInput(): KitPlanInput {
  const base = hutPlanInput();
  return {
    ...base,
    appliances: [
      { name: "Lights", powerW: 8, quantity: 6, hoursPerDay: 4, daysPerWeek: 7, circuit: "dc" },
      { name: "Radio", powerW: 15, quantity: 1, hoursPerDay: 6, daysPerWeek: 7, circuit: "dc" },
    ],
    parts: { ...base.parts, inverter: null },
    design: { ...base.design, cableRuns: { arrayToController: { oneWayLengthM: 12 }, controllerToBattery: { oneWayLengthM: 2 } } },
  };
}

export function threePlans(): { passing: KitPlan; failing: KitPlan; dcOnly: KitPlan } {
  return { passing: planKit(passingPlanInput()), failing: planKit(failingPlanInput()), dcOnly: planKit(dcOnlyPlanInput()) };
}
