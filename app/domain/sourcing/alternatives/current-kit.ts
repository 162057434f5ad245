// The current plan's own kit priced the way every alternative is priced: each part at its cheapest valid
// offer for the plan's quantity (PartPrices), so the page can say what each alternative saves or costs
// more. A part with no valid offer, or none priced in the quoting currency, leaves the kit uncosted and
// is named.
import type { KitPlan } from "../../sizing/plan-types";
import { meetsPlan } from "./meets-plan";
import { PartPrices } from "./price-table";
import type { AlternativesInput, CandidatePart, CurrentKitCost } from "./types";

export function currentKitCost(input: AlternativesInput, plan: KitPlan | null): CurrentKitCost {
  if (!plan) return { totalMinor: null, moduleCount: null, batteryCount: null, meetsPlan: null, problems: ["the current plan cannot be worked out"] };
  const cur = input.current;
  const labels = input.currentLabels;
  const lines: [readonly CandidatePart<unknown>[], string, number, string][] = [
    [input.modules, cur.moduleId, plan.array.layout.moduleCount, labels?.module ?? "the current module"],
    [input.controllers, cur.controllerId, 1, labels?.controller ?? "the current charge controller"],
    [input.batteries, cur.batteryId, plan.battery.batteryCount, labels?.battery ?? "the current battery"],
  ];
  if (cur.inverterId) lines.push([input.inverters, cur.inverterId, 1, labels?.inverter ?? "the current inverter"]);
  let total = 0;
  const problems: string[] = [];
  for (const [list, id, quantity, label] of lines) {
    const part = list.find((p) => p.id === id);
    const cost = part ? new PartPrices(part.offers).costAt(quantity) : NaN;
    if (!part) problems.push(`no valid offer for ${label}`);
    else if (Number.isNaN(cost)) problems.push(`no price in ${input.currency} for ${label} (an exchange rate is missing)`);
    else total += cost;
  }
  return {
    totalMinor: problems.length ? null : total,
    moduleCount: plan.array.layout.moduleCount,
    batteryCount: plan.battery.batteryCount,
    meetsPlan: meetsPlan(plan),
    problems,
  };
}
