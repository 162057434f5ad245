// What a saved kit plan asks of each kind of part, in the comparison's own terms (the URL fields of
// the comparison page), so that offers can be compared for that plan.
import type { KitPlan } from "../sizing/plan-types";

export interface PlanNeedValues {
  /** Array energy the design month requires, kWh/day. */
  energy: number;
  /** In-plane irradiation of the design month, kWh/m²/day = peak sun hours. */
  sun: number;
  /** The share of STC energy the plan's own module loses to temperature, controller and named losses, %. */
  losses: number;
  /** The plan's own battery count (the comparison counts each model for the bank instead). */
  batteries: number;
  bank: number;
  /** Usable energy the plan's bank must hold (heaviest month's daily load × autonomy days), kWh. */
  store: number;
  /** Battery temperature the plan's bank is sized at, °C. */
  batteryTempC: number;
  /** The plan's design limit on depth of discharge, %, when it sets one. */
  dodLimitPct: number | null;
  array: number;
  peak: number | null;
}

/**
 * The losses are those of the plan's own module at the site (energy per module ÷ (its STC power × sun
 * hours)); other modules are compared as if they lost the same share, which the page states.
 */
export function needFromPlan(plan: KitPlan, design: { maxDepthOfDischargePct?: number } = {}): PlanNeedValues {
  const designMonth = plan.array.designMonth ?? plan.moduleYield.worstMonth;
  const month = plan.array.months[designMonth - 1];
  const sun = plan.moduleYield.months[designMonth - 1].poaKWhM2Day;
  const stcEnergyWh = plan.array.modulePmaxUsedW * sun;
  const lossesPct = stcEnergyWh > 0 ? Math.min(60, Math.max(0, 100 * (1 - month.energyPerModuleWhPerDay / stcEnergyWh))) : 20;
  return {
    energy: month.requiredArrayWhPerDay / 1000,
    sun,
    losses: lossesPct,
    batteries: plan.battery.batteryCount,
    bank: plan.systemVoltageV,
    store: plan.battery.requiredUsableWh / 1000,
    batteryTempC: plan.battery.batteryTempC,
    dodLimitPct: design.maxDepthOfDischargePct ?? null,
    array: plan.array.layout.arrayStcPowerW,
    peak: plan.inverter ? plan.inverter.continuousNeededW : null,
  };
}
