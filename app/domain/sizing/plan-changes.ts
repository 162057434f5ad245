// What differs between a saved plan and the same choices worked out again with today's data: the
// plan page says it in plain words before the installer re-plans, so nothing changes silently.
import type { KitPlan, KitPlanInput } from "./plan-types";

const MONTHS = ["Jan", "Feb", "Mar", "Apr", "May", "Jun", "Jul", "Aug", "Sep", "Oct", "Nov", "Dec"];

/**
 * Deep inequality that ignores key order and keys holding undefined: a saved snapshot comes back
 * from PostgreSQL's jsonb with its keys reordered and undefined values dropped.
 */
export function differs(a: unknown, b: unknown): boolean {
  if (a === b) return false;
  if (typeof a !== "object" || typeof b !== "object" || a === null || b === null) return !(a === undefined && b === undefined);
  if (Array.isArray(a) !== Array.isArray(b)) return true;
  const keys = (o: object) => Object.keys(o).filter((k) => (o as Record<string, unknown>)[k] !== undefined);
  const [ka, kb] = [keys(a), keys(b)];
  if (ka.length !== kb.length) return true;
  return ka.some((k) => differs((a as Record<string, unknown>)[k], (b as Record<string, unknown>)[k]));
}

function fmt(value: number | null | undefined, unit: string, digits = 0) {
  return value === null || value === undefined ? "none" : `${value.toFixed(digits)} ${unit}`;
}

export function describeInputChanges(saved: KitPlanInput, current: KitPlanInput): string[] {
  const changes: string[] = [];
  const [sm, cm] = [saved.parts.module, current.parts.module];
  if (sm.pmaxW !== cm.pmaxW) changes.push(`Module nameplate power: ${fmt(sm.pmaxW, "W")} → ${fmt(cm.pmaxW, "W")}.`);
  if ((sm.verifiedPmaxW ?? null) !== (cm.verifiedPmaxW ?? null) || (sm.verifiedReadingCount ?? 0) !== (cm.verifiedReadingCount ?? 0)) {
    changes.push(
      `Module verified power: ${fmt(sm.verifiedPmaxW, "W", 1)} from ${sm.verifiedReadingCount ?? 0} readings → ${fmt(cm.verifiedPmaxW, "W", 1)} from ${cm.verifiedReadingCount ?? 0} readings.`,
    );
  }
  const { verifiedPmaxW: _a, verifiedReadingCount: _b, pmaxW: _c, ...smRest } = sm;
  const { verifiedPmaxW: _d, verifiedReadingCount: _e, pmaxW: _f, ...cmRest } = cm;
  // Plans saved before the module's area was recorded in the snapshot did not use it: its arrival is
  // not a change of the catalogue.
  if (smRest.areaM2 === undefined) delete cmRest.areaM2;
  if (differs(smRest, cmRest)) changes.push("Other module figures in the catalogue changed.");
  if (differs(saved.parts.controller, current.parts.controller)) changes.push("The charge controller's catalogue figures changed.");
  if (differs(saved.parts.battery, current.parts.battery)) changes.push("The battery's catalogue figures changed.");
  if (differs(saved.parts.inverter, current.parts.inverter)) changes.push("The inverter's catalogue figures changed.");
  if (saved.site.coldestTempC !== current.site.coldestTempC)
    changes.push(`Coldest expected temperature: ${saved.site.coldestTempC} °C → ${current.site.coldestTempC} °C.`);
  // Plans saved before sites had a design high carry none: a value set since is the installer's choice,
  // and it moves the hot-afternoon check, so it is named like any other change.
  const [sh, ch] = [saved.site.hottestTempC ?? null, current.site.hottestTempC ?? null];
  if (sh !== ch) changes.push(`Hottest expected temperature: ${sh === null ? "none" : `${sh} °C`} → ${ch === null ? "none" : `${ch} °C`}.`);
  const monthChanges = saved.site.months.map((m, i) => (differs(m, current.site.months[i]) ? MONTHS[i] : null)).filter(Boolean);
  if (monthChanges.length) changes.push(`Site climate changed in ${monthChanges.join(", ")}.`);
  const { months: _g, coldestTempC: _h, hottestTempC: _k, ...siteRest } = saved.site;
  const { months: _i, coldestTempC: _j, hottestTempC: _l, ...currentSiteRest } = current.site;
  if (differs(siteRest, currentSiteRest)) changes.push("The site's place, orientation, albedo or shading changed.");
  if (differs(saved.appliances, current.appliances)) changes.push("The load sheet changed.");
  return changes;
}

export function describeResultChanges(saved: KitPlan, current: KitPlan): string[] {
  const changes: string[] = [];
  const [sl, cl] = [saved.array.layout, current.array.layout];
  if (sl.moduleCount !== cl.moduleCount || sl.modulesInSeries !== cl.modulesInSeries) {
    changes.push(
      `Modules: ${sl.modulesInSeries} × ${sl.stringsInParallel} (${sl.moduleCount}) → ${cl.modulesInSeries} × ${cl.stringsInParallel} (${cl.moduleCount}).`,
    );
  }
  if (saved.simulation.unmetDays !== current.simulation.unmetDays)
    changes.push(`Days with unmet load a year: ${saved.simulation.unmetDays} → ${current.simulation.unmetDays}.`);
  const status = (plan: KitPlan) => new Map(plan.checks.map((c) => [c.id, c]));
  const before = status(saved);
  for (const check of current.checks) {
    const old = before.get(check.id);
    if (old && old.status !== check.status) changes.push(`Check "${check.title}": ${old.status} → ${check.status}.`);
  }
  return changes;
}
