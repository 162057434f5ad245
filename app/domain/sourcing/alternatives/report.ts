// From the cheapest candidates to the kits shown: each is re-planned in full (planKit with the
// candidate's parts, string layout and battery strings forced) and kept only when it meets the plan (no
// check fails and the unmet-days target holds: meets-plan.ts); one row per set of parts (its cheapest
// passing layout and bank), with cost per delivered kWh and what differs from the current plan, and the
// current kit costed the same way.
import Decimal from "decimal.js";
import { minorDigits } from "../../money/money";
import { planKitForSite, type PreparedPlanSite } from "../../sizing/kit-plan";
import type { KitPlan, KitPlanInput } from "../../sizing/plan-types";
import { currentKitCost } from "./current-kit";
import { kitVerdict, unmetTargetNote } from "./meets-plan";
import { PartPrices } from "./price-table";
import type { Candidate } from "./top-list";
import type { AlternativesInput, CandidatePart, ChosenPart, KitAlternative } from "./types";

const DAYS_IN_MONTH = [31, 28, 31, 30, 31, 30, 31, 31, 30, 31, 30, 31];
export const DEFAULT_LIFETIME_YEARS = 10;
export const DEFAULT_TOP_N = 10;
export const DEFAULT_MAX_FULL_CHECKS = 400;

/** The plan input for one candidate: its parts, with its string layout and battery strings forced. */
export function candidateInput(input: AlternativesInput, c: Candidate): KitPlanInput {
  const inverter = c.ii >= 0 ? input.inverters[c.ii].part : null;
  const { batteryToInverter, ...runs } = input.base.design.cableRuns;
  return {
    ...input.base,
    parts: { module: input.modules[c.mi].part, controller: input.controllers[c.ci].part, battery: input.batteries[c.bi].part, inverter },
    design: {
      ...input.base.design,
      cableRuns: inverter && batteryToInverter ? { ...runs, batteryToInverter } : runs,
      forcedLayout: { modulesInSeries: c.modulesInSeries, stringsInParallel: c.stringsInParallel },
      forcedBatteryStrings: c.batteryStrings,
    },
  };
}

/** Energy the appliances use in a year (before inverter and battery losses), kWh. */
export function deliveredKWhPerYear(plan: KitPlan): number {
  return plan.load.months.reduce((sum, m, i) => sum + ((m.dcWhPerDay + m.acWhPerDay) * DAYS_IN_MONTH[i]) / 1000, 0);
}

function chosen<P>(part: CandidatePart<P>, quantity: number, costMinor: number): ChosenPart {
  const best = new PartPrices(part.offers).best(quantity);
  return { id: part.id, label: part.label, offerId: best?.offer.offerId ?? "", supplierName: best?.offer.supplierName ?? "", quantity, costMinor };
}

function differences(input: AlternativesInput, current: KitPlan | null, alt: KitAlternative, plan: KitPlan): string[] {
  const out: string[] = [];
  const cur = input.current;
  const label = (list: readonly CandidatePart<unknown>[], id: string | null) => list.find((p) => p.id === id)?.label ?? "the current one";
  if (alt.module.id !== cur.moduleId) out.push(`Module: ${alt.module.label} instead of ${label(input.modules, cur.moduleId)}`);
  if (alt.controller.id !== cur.controllerId) out.push(`Controller: ${alt.controller.label} instead of ${label(input.controllers, cur.controllerId)}`);
  if (alt.battery.id !== cur.batteryId) out.push(`Battery: ${alt.battery.label} instead of ${label(input.batteries, cur.batteryId)}`);
  if ((alt.inverter?.id ?? null) !== cur.inverterId)
    out.push(`Inverter: ${alt.inverter?.label ?? "none"} instead of ${label(input.inverters, cur.inverterId)}`);
  const np = alt.layout.stringsInParallel;
  const layout = `${alt.layout.modulesInSeries} in series × ${np} ${np === 1 ? "string" : "strings"}`;
  const curLayout = current ? `${current.array.layout.modulesInSeries} × ${current.array.layout.stringsInParallel}` : null;
  if (!current || current.array.layout.moduleCount !== alt.module.quantity || curLayout !== `${alt.layout.modulesInSeries} × ${alt.layout.stringsInParallel}`)
    out.push(`${alt.module.quantity} modules, ${layout}${current ? ` (now ${current.array.layout.moduleCount}, ${curLayout})` : ""}`);
  if (!current || current.battery.batteryCount !== plan.battery.batteryCount)
    out.push(`${plan.battery.batteryCount} batteries${current ? ` (now ${current.battery.batteryCount})` : ""}`);
  return out.length ? out : ["Same parts and layout as the current plan (a cheaper offer or bank)."];
}

export function buildAlternatives(input: AlternativesInput, prepared: PreparedPlanSite, sorted: readonly Candidate[]) {
  const topN = input.topN ?? DEFAULT_TOP_N;
  const maxYears = input.lifetimeYears ?? DEFAULT_LIFETIME_YEARS;
  const scale = new Decimal(10).pow(minorDigits(input.currency));
  const current = safePlan(prepared, input.base);
  const seen = new Set<string>();
  const alternatives: KitAlternative[] = [];
  let fullChecks = 0;
  let fullCheckFailures = 0;
  let overUnmetDays = 0;
  for (const c of sorted) {
    if (alternatives.length >= topN) break;
    const key = `${c.mi}|${c.ci}|${c.bi}|${c.ii}`;
    if (seen.has(key)) continue; // a cheaper layout or bank of these parts already passed
    fullChecks += 1;
    const plan = planKitForSite(prepared, candidateInput(input, c));
    const verdict = kitVerdict(plan);
    if (!verdict.meets) {
      fullCheckFailures += 1;
      if (verdict.overUnmetDays) overUnmetDays += 1;
      continue;
    }
    seen.add(key);
    const battery = input.batteries[c.bi];
    const lifetimeYears = Math.min(maxYears, battery.part.cycleLife / 365);
    const delivered = deliveredKWhPerYear(plan);
    const inverter = c.ii >= 0 ? input.inverters[c.ii] : null;
    const inverterCost = c.totalMinor - c.moduleCostMinor - c.batteryCostMinor - new PartPrices(input.controllers[c.ci].offers).costAt(1);
    const alt: KitAlternative = {
      module: chosen(input.modules[c.mi], c.moduleCount, c.moduleCostMinor),
      controller: chosen(input.controllers[c.ci], 1, new PartPrices(input.controllers[c.ci].offers).costAt(1)),
      battery: chosen(battery, c.batteryCount, c.batteryCostMinor),
      inverter: inverter ? chosen(inverter, 1, inverterCost) : null,
      layout: { modulesInSeries: c.modulesInSeries, stringsInParallel: c.stringsInParallel },
      batteryStrings: c.batteryStrings,
      totalMinor: c.totalMinor,
      deliveredKWhPerYear: delivered,
      lifetimeYears,
      costPerKWh: delivered > 0 ? new Decimal(c.totalMinor).div(scale).div(new Decimal(delivered).times(lifetimeYears)).toDecimalPlaces(4).toFixed() : "",
      warnings: plan.checks.filter((check) => check.status === "warn").length,
      differences: [],
      isCurrentParts: false,
    };
    alt.differences = differences(input, current, alt, plan);
    const cur = input.current;
    alt.isCurrentParts =
      alt.module.id === cur.moduleId &&
      alt.controller.id === cur.controllerId &&
      alt.battery.id === cur.batteryId &&
      (alt.inverter?.id ?? null) === cur.inverterId;
    alternatives.push(alt);
  }
  const acceptedUnmetDays = input.base.design.acceptableUnmetDaysPerYear ?? 0;
  return {
    alternatives,
    fullChecks,
    fullCheckFailures,
    overUnmetDays,
    acceptedUnmetDays,
    targetNote: unmetTargetNote({ listed: alternatives.length, topN, fullChecks, overUnmetDays, acceptedDays: acceptedUnmetDays }),
    current: currentKitCost(input, current),
    exhausted: alternatives.length < topN && sorted.length >= (input.maxFullChecks ?? DEFAULT_MAX_FULL_CHECKS),
    lifetimeNote: `Cost per delivered kWh = total landed cost ÷ (the load's energy at the appliances over a year × lifetime), the lifetime being the shorter of ${maxYears} years and the battery's rated cycles at one cycle a day (common practice, no source). Replacement parts, labour and interest are not included.`,
  };
}

function safePlan(prepared: PreparedPlanSite, base: KitPlanInput): KitPlan | null {
  try {
    return planKitForSite(prepared, base);
  } catch {
    return null;
  }
}
