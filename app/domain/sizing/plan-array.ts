// The array of a kit plan: the engine's energy per module, shading, the worst month's module count
// and a string layout. A layout whose string voltage falls short of what the controller needs to charge
// gets less energy (string-voltage-harvest.ts), so its module count, the chosen array's monthly energy
// and the simulated year all use the reduced figures.
import { moduleYieldFromProfile } from "../solar/module-yield";
import type { SiteProfile } from "../solar/site-profile";
import type { YieldResult } from "../solar/yield-types";
import { arrayMonths, moduleForEnergy, modulesRequired, withArray } from "./array-sizing";
import { bankChargeVoltageV } from "./chemistry";
import { fmt, MONTH_NAMES } from "./format";
import type { ArrayMonth, ArrayPlan, KitPlanInput } from "./plan-types";
import { DEFAULT_MPPT_HEADROOM_V, chooseLayout, listLayouts } from "./string-layout";
import type { LayoutContext } from "./string-layout";
import { designHotAirC, hotCellTemperatureC } from "./string-voltage";
import { voltageFactorsBySeries } from "./string-voltage-harvest";

export interface PlannedArray {
  array: ArrayPlan;
  moduleYield: YieldResult;
  /** How the module power was chosen (nameplate or verified), in plain words. */
  powerNote: string;
  hottestAirC: number;
  /** Plain words on the energy a short string loses, when it loses any. */
  voltageNote: string | null;
}

export function planArray(profile: SiteProfile, input: KitPlanInput, loadWhPerDay: readonly number[]): PlannedArray {
  const { site, systemVoltageV, parts, design } = input;
  const { module, controller, battery } = parts;
  const energyModule = moduleForEnergy(module, design.powerBasis);
  const moduleYield = moduleYieldFromProfile(
    profile,
    energyModule.spec,
    { kind: controller.kind, batteryVoltageV: systemVoltageV, efficiencyPct: controller.efficiencyPct },
    design.lossesPct,
  );
  const shadingFactor = 1 - (site.shadingDeratePct ?? 0) / 100;
  const energyWh = moduleYield.months.map((m) => m.energyWhPerDay * shadingFactor);
  const roundTripEfficiency = battery.roundTripEfficiencyPct / 100;
  const hottestAirC = designHotAirC(site);
  const ctx: LayoutContext = {
    module,
    controller,
    systemVoltageV,
    chargeVoltageV: bankChargeVoltageV(systemVoltageV, battery.chemistry),
    coldestAirC: site.coldestTempC,
    hotCellC: hotCellTemperatureC(hottestAirC, module.noctC),
    mpptHeadroomV: design.mpptHeadroomV ?? DEFAULT_MPPT_HEADROOM_V,
    ratingPowerW: Math.max(module.pmaxW, energyModule.spec.pmaxW),
  };
  const factorsFor = voltageFactorsBySeries(
    ctx,
    site.months.map((m) => m.tMaxC),
    hottestAirC,
  );
  const monthsWith = (factors: readonly number[] | null): ArrayMonth[] => {
    const energy = factors ? energyWh.map((e, i) => e * factors[i]) : energyWh;
    const months = arrayMonths(energy, loadWhPerDay, roundTripEfficiency, design.designMarginPct);
    return months.map((m, i) => ({ ...m, voltageFactor: factors ? factors[i] : 1 }));
  };
  const fullNeed = modulesRequired(monthsWith(null)).modulesRequired;
  const layouts = listLayouts((ns) => {
    const factors = factorsFor(ns);
    return factors ? modulesRequired(monthsWith(factors)).modulesRequired : fullNeed;
  }, ctx);
  const layout = chooseLayout(layouts, ctx, design.forcedLayout);
  const unfilled = monthsWith(factorsFor(layout.modulesInSeries));
  const need = modulesRequired(unfilled);
  const array: ArrayPlan = {
    powerBasisUsed: energyModule.basisUsed,
    modulePmaxUsedW: energyModule.spec.pmaxW,
    months: withArray(unfilled, layout.moduleCount),
    designMonth: need.designMonth,
    modulesRequired: need.modulesRequired,
    layouts,
    layout,
    layoutForced: design.forcedLayout !== undefined,
    coldestAirC: ctx.coldestAirC,
    hotCellC: ctx.hotCellC,
    chargeVoltageV: ctx.chargeVoltageV,
  };
  return { array, moduleYield, powerNote: energyModule.note, hottestAirC, voltageNote: voltageNote(array, controller.kind) };
}

function voltageNote(array: ArrayPlan, kind: "mppt" | "pwm"): string | null {
  const cut = array.months.filter((m) => (m.voltageFactor ?? 1) < 1);
  if (cut.length === 0) return null;
  const names = cut.map((m) => MONTH_NAMES[m.month - 1]).join(", ");
  const factors = cut.map((m) => 100 * (m.voltageFactor ?? 1));
  const [low, high] = [fmt(Math.min(...factors), 0), fmt(Math.max(...factors), 0)];
  const range = low === high ? `${low} %` : `${low}–${high} %`;
  return kind === "mppt"
    ? `Short string: on a hot afternoon (each month's mean daily maximum air plus the NOCT rise at full sun) a string of ${array.layout.modulesInSeries} module(s) ` +
        `stays below the ${fmt(array.layout.stringVmpNeededV)} V the tracker needs to charge in ${names}. The tracker then works away from the modules' maximum power, ` +
        `so the energy of those months is cut to the power on a straight line from the maximum power point to the open-circuit voltage (${range} kept; nothing where even the open-circuit voltage falls short) — Kitwright's own simple rule, meant to err on the safe side, ` +
        "in the module count, the monthly energy and the simulated year."
    : `String length on a PWM controller: a string of ${array.layout.modulesInSeries} module(s) does not match the battery, so in ${names} the array is counted at ` +
        `${range} of the matching string's energy (nothing where even its hot-afternoon open-circuit voltage cannot reach the charging voltage) — Kitwright's own simple rule.`;
}
