// Invented inputs for the kit-plan tests (no real product, site or customer). The irradiation is
// Duffie & Beckman Example 2.19.1 (Madison, 43°N) as in the yield tests; everything else is made up.
import type { KitPlanInput } from "~/domain/sizing/plan-types";
import { madisonSite, TEST_MODULE } from "../solar/yield-fixtures";

export function hutPlanInput(overrides: Partial<KitPlanInput["design"]> = {}): KitPlanInput {
  return {
    site: { ...madisonSite(), coldestTempC: -25 },
    appliances: [
      { name: "Fridge", powerW: 60, quantity: 1, hoursPerDay: 10, daysPerWeek: 7, circuit: "ac", surgeW: 400 },
      { name: "Lights", powerW: 8, quantity: 6, hoursPerDay: 4, daysPerWeek: 7, circuit: "dc" },
      { name: "Pump", powerW: 400, quantity: 1, hoursPerDay: 0.5, daysPerWeek: 3, circuit: "ac", surgeW: 1200, months: [5, 6, 7, 8, 9] },
    ],
    systemVoltageV: 24,
    parts: {
      module: { ...TEST_MODULE, cellsInSeries: 36 },
      controller: { kind: "mppt", batteryVoltagesV: [12, 24], maxPvVocV: 100, maxChargeCurrentA: 30, maxPvPowerW: { "12": 400, "24": 800 }, efficiencyPct: 97 },
      battery: {
        chemistry: "lead-acid-agm",
        nominalVoltageV: 12,
        capacityAh: 200,
        capacityHourRateH: 20,
        usableDodPct: 50,
        cycleLife: 1200,
        roundTripEfficiencyPct: 85,
      },
      inverter: { continuousW: 1000, surgeW: 2000, dcInputVoltageV: 24, efficiencyPct: 90, idleDrawW: 8 },
    },
    design: {
      autonomyDays: 3,
      designMarginPct: 20,
      powerBasis: "nameplate",
      voltageDropTargetPct: 3,
      conductorSystem: "awg",
      cableRuns: { arrayToController: { oneWayLengthM: 12 }, controllerToBattery: { oneWayLengthM: 2 }, batteryToInverter: { oneWayLengthM: 1.5 } },
      lossesPct: { soiling: 2, mismatch: 2, wiring: 1 },
      ...overrides,
    },
  };
}
