// The reference for the optimiser: every part combination (no inverter included), every string length
// planKit lists with its fewest strings and up to two more strings in parallel, the autonomy bank and up
// to two more battery strings — each one planned IN FULL, kept when it meets the plan (meetsPlan: no
// failing check, unmet days within the target), priced with every offer; the cheapest passing layout and
// bank per set of parts. It never calls the search: it shares only the rule and the candidate set's size.
import { planKit, planKitForSite, preparePlanSite } from "~/domain/sizing/kit-plan";
import type { KitPlanInput } from "~/domain/sizing/plan-types";
import { meetsPlan } from "~/domain/sourcing/alternatives/meets-plan";
import { DEFAULT_EXTRA_ARRAY_STRINGS, DEFAULT_EXTRA_BATTERY_STRINGS, MAX_STRINGS_IN_PARALLEL } from "~/domain/sourcing/alternatives/search";
import type { AlternativesInput, CandidatePart } from "~/domain/sourcing/alternatives/types";

export interface BruteKit {
  key: string;
  totalMinor: number;
  moduleCount: number;
  stringsInParallel: number;
  batteryStrings: number;
}

function cheapest(part: CandidatePart<unknown>, quantity: number): number {
  return Math.min(...part.offers.map((o) => o.costMinor(quantity) ?? Infinity));
}

export function bruteForce(input: AlternativesInput, topN = 10): { kits: BruteKit[]; plansRun: number } {
  const best = new Map<string, BruteKit>();
  let plansRun = 0;
  const { batteryToInverter, ...runs } = input.base.design.cableRuns;
  const extraArray = input.extraArrayStrings ?? DEFAULT_EXTRA_ARRAY_STRINGS;
  const extraBattery = input.extraBatteryStrings ?? DEFAULT_EXTRA_BATTERY_STRINGS;
  // The site's sun and weather do not depend on the parts: prepared once, as planKit would each time.
  const prepared = preparePlanSite(input.base.site, input.base.yieldOptions);
  for (const m of input.modules)
    for (const c of input.controllers)
      for (const b of input.batteries)
        for (const i of [null, ...input.inverters]) {
          const unforced: KitPlanInput = {
            ...input.base,
            parts: { module: m.part, controller: c.part, battery: b.part, inverter: i?.part ?? null },
            design: { ...input.base.design, cableRuns: i && batteryToInverter ? { ...runs, batteryToInverter } : runs },
          };
          const first = planKit(unforced);
          plansRun += 1;
          const key = `${m.id}|${c.id}|${b.id}|${i?.id ?? "none"}`;
          for (const layout of first.array.layouts)
            for (let np = layout.stringsInParallel; np <= layout.stringsInParallel + extraArray; np++) {
              if (np > MAX_STRINGS_IN_PARALLEL) continue;
              const forced = { modulesInSeries: layout.modulesInSeries, stringsInParallel: np };
              const moduleCount = layout.modulesInSeries * np;
              for (let s = first.battery.stringsInParallel; s <= first.battery.stringsInParallel + extraBattery; s++) {
                const plan = planKitForSite(prepared, { ...unforced, design: { ...unforced.design, forcedLayout: forced, forcedBatteryStrings: s } });
                plansRun += 1;
                if (!meetsPlan(plan)) continue;
                const total = cheapest(m, moduleCount) + cheapest(c, 1) + cheapest(b, plan.battery.batteryCount) + (i ? cheapest(i, 1) : 0);
                const kit = { key, totalMinor: total, moduleCount, stringsInParallel: np, batteryStrings: s };
                const prev = best.get(key);
                if (!prev || order(kit, prev) < 0) best.set(key, kit);
              }
            }
        }
  return { kits: [...best.values()].sort(order).slice(0, topN), plansRun };
}

function order(a: BruteKit, b: BruteKit) {
  return (
    a.totalMinor - b.totalMinor ||
    a.moduleCount - b.moduleCount ||
    a.stringsInParallel - b.stringsInParallel ||
    a.batteryStrings - b.batteryStrings ||
    a.key.localeCompare(b.key)
  );
}
