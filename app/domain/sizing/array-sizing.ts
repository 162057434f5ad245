// How many modules the load needs: per month, the array must deliver the load from the battery bus
// divided by the battery's round-trip efficiency (everything is taken to pass through the battery, the
// safe side) times (1 + design margin); the module count is the largest month's need:
//   modules_m = load_m ÷ η_rt × (1 + margin) ÷ energy per module_m,   modules = max_m modules_m.
import type { ModuleSpec } from "../solar/yield-types";
import type { ModulePart } from "./parts";
import type { ArrayMonth } from "./plan-types";

export interface ModuleForEnergy {
  spec: ModuleSpec;
  basisUsed: "nameplate" | "verified";
  note: string;
}

/**
 * The module the energy is computed with. On the verified basis, the field-read STC power replaces the
 * nameplate, with Imp and Isc scaled by the same ratio (voltages kept), so Vmp·Imp stays the power.
 */
export function moduleForEnergy(module: ModulePart, basis: "nameplate" | "verified"): ModuleForEnergy {
  const verified = module.verifiedPmaxW ?? null;
  if (basis === "verified" && verified !== null && verified > 0) {
    const ratio = verified / module.pmaxW;
    const readings = module.verifiedReadingCount ?? 0;
    return {
      spec: { ...module, pmaxW: verified, impA: module.impA * ratio, iscA: module.iscA * ratio },
      basisUsed: "verified",
      note: `Module power: verified ${verified.toFixed(1)} W at STC from ${readings} approved field reading(s) (nameplate ${module.pmaxW} W, ${(100 * ratio).toFixed(0)} %).`,
    };
  }
  return {
    spec: module,
    basisUsed: "nameplate",
    note:
      basis === "verified"
        ? `Verified power was asked for, but this module has no approved field readings: its nameplate ${module.pmaxW} W is used.`
        : `Module power: nameplate ${module.pmaxW} W at STC.`,
  };
}

export function arrayMonths(
  energyPerModuleWhPerDay: readonly number[],
  loadWhPerDay: readonly number[],
  roundTripEfficiency: number,
  designMarginPct: number,
): ArrayMonth[] {
  return energyPerModuleWhPerDay.map((energy, i) => {
    const load = loadWhPerDay[i];
    const required = (load / roundTripEfficiency) * (1 + designMarginPct / 100);
    const modulesNeeded = load <= 0 ? 0 : energy > 0 ? required / energy : null;
    return {
      month: i + 1,
      energyPerModuleWhPerDay: energy,
      loadWhPerDay: load,
      requiredArrayWhPerDay: required,
      modulesNeeded,
      arrayWhPerDay: 0,
      coverage: null,
    };
  });
}

/** The month that needs the most modules (dark months excluded: no count helps there). */
export function modulesRequired(months: readonly ArrayMonth[]): { designMonth: number | null; modulesRequired: number } {
  let designMonth: number | null = null;
  let most = 0;
  for (const m of months) {
    if (m.modulesNeeded !== null && m.modulesNeeded > most) {
      most = m.modulesNeeded;
      designMonth = m.month;
    }
  }
  return { designMonth, modulesRequired: most };
}

/** Fills in the chosen array's energy and its coverage of each month's requirement. */
export function withArray(months: readonly ArrayMonth[], moduleCount: number): ArrayMonth[] {
  return months.map((m) => {
    const arrayWhPerDay = moduleCount * m.energyPerModuleWhPerDay;
    return { ...m, arrayWhPerDay, coverage: m.requiredArrayWhPerDay > 0 ? arrayWhPerDay / m.requiredArrayWhPerDay : null };
  });
}
