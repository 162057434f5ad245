// Monthly energy per module at a site — the entry point behind POST /api/v1/yield — plus a
// cheap ranking of many modules against one prepared site profile.
import type { ControllerSpec } from "./controller";
import type { LossesPct } from "./losses";
import { annualKWh, moduleYieldFromProfile, monthlyYieldFromProfile } from "./module-yield";
import { prepareSiteProfile } from "./site-profile";
import type { SiteProfile } from "./site-profile";
import type { ModuleSpec, YieldInput, YieldResult } from "./yield-types";

export function estimateMonthlyYield(input: YieldInput): YieldResult {
  const profile = prepareSiteProfile(input.site, input.options);
  return moduleYieldFromProfile(profile, input.module, input.controller, input.lossesPct);
}

export interface ModuleRanking {
  /** Index of the module in the list given. */
  index: number;
  annualKWh: number;
  worstMonth: number;
  worstMonthEnergyWhPerDay: number;
}

/**
 * Ranks modules for one site, best first. Off-grid kits are sized for the worst month, so the
 * default order is by worst-month energy; "annual" orders by the year's total.
 */
export function rankModulesForSite(
  profile: SiteProfile,
  modules: readonly ModuleSpec[],
  controller: ControllerSpec,
  lossesPct: LossesPct,
  by: "worstMonth" | "annual" = "worstMonth",
): ModuleRanking[] {
  const rankings = modules.map((module, index): ModuleRanking => {
    const months = monthlyYieldFromProfile(profile, module, controller, lossesPct);
    let worst = months[0];
    for (const m of months) if (m.energyWhPerDay < worst.energyWhPerDay) worst = m;
    return {
      index,
      annualKWh: annualKWh(months),
      worstMonth: worst.month,
      worstMonthEnergyWhPerDay: worst.energyWhPerDay,
    };
  });
  const key = by === "annual" ? (r: ModuleRanking) => r.annualKWh : (r: ModuleRanking) => r.worstMonthEnergyWhPerDay;
  return rankings.sort((a, b) => key(b) - key(a));
}

export { prepareSiteProfile } from "./site-profile";
export { moduleYieldFromProfile } from "./module-yield";
