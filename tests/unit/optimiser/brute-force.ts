// The reference for the optimiser: every part combination (no inverter included), every layout planKit
// lists, the autonomy bank and two more strings — each one planned IN FULL with planKit, kept when no
// check fails, priced with every offer, the cheapest passing layout and bank per set of parts.
import { planKit } from "~/domain/sizing/kit-plan";
import type { KitPlanInput } from "~/domain/sizing/plan-types";
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
            for (let s = first.battery.stringsInParallel; s <= first.battery.stringsInParallel + 2; s++) {
              const forced = { modulesInSeries: layout.modulesInSeries, stringsInParallel: layout.stringsInParallel };
              const plan = planKit({ ...unforced, design: { ...unforced.design, forcedLayout: forced, forcedBatteryStrings: s } });
              plansRun += 1;
              if (plan.checks.some((x) => x.status === "fail")) continue;
              const total = cheapest(m, layout.moduleCount) + cheapest(c, 1) + cheapest(b, plan.battery.batteryCount) + (i ? cheapest(i, 1) : 0);
              const kit = { key, totalMinor: total, moduleCount: layout.moduleCount, stringsInParallel: layout.stringsInParallel, batteryStrings: s };
              const prev = best.get(key);
              if (!prev || order(kit, prev) < 0) best.set(key, kit);
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
