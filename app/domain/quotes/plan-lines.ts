// The kit's parts as quote lines: how many of each part the plan needs, at the cost of the offer the
// installer buys it from. A part with no offer gets a zero cost line that says so, never a guess.
import type { KitPlan } from "../sizing/plan-types";
import type { OfferPartKind } from "../sourcing/offer-facts";
import type { EnteredLine } from "./quote-lines";

export interface PlanPartNeed {
  partKind: OfferPartKind;
  partId: string;
  label: string;
  quantity: number;
}

export interface ChosenOffer {
  offerId: string;
  supplierName: string;
  /** Landed cost per unit at this quantity, in the quote's currency, decimal text rounded to the minor unit. */
  unitCost: string;
}

export function partNeeds(
  plan: KitPlan,
  ids: { moduleId: string; controllerId: string; batteryId: string; inverterId: string | null },
  labels: Record<string, string>,
): PlanPartNeed[] {
  const needs: PlanPartNeed[] = [
    { partKind: "modules", partId: ids.moduleId, label: labels[ids.moduleId] ?? "PV module", quantity: plan.array.layout.moduleCount },
    { partKind: "controllers", partId: ids.controllerId, label: labels[ids.controllerId] ?? "Charge controller", quantity: 1 },
    { partKind: "batteries", partId: ids.batteryId, label: labels[ids.batteryId] ?? "Battery", quantity: plan.battery.batteryCount },
  ];
  if (ids.inverterId && plan.inverter) {
    needs.push({ partKind: "inverters", partId: ids.inverterId, label: labels[ids.inverterId] ?? "Inverter", quantity: 1 });
  }
  return needs.filter((n) => n.quantity > 0);
}

export function partLine(need: PlanPartNeed, offer: ChosenOffer | null): EnteredLine {
  return {
    kind: "part",
    description: offer ? `${need.label} (from ${offer.supplierName})` : `${need.label} (no offer on file: enter the cost)`,
    quantity: String(need.quantity),
    unitCost: offer ? offer.unitCost : "0",
    marginPct: null,
    discountPct: null,
    taxRatePct: null,
    partKind: need.partKind,
    partId: need.partId,
    offerId: offer?.offerId ?? null,
  };
}

/** Lines every installation has besides the parts; the installer fills in the costs. */
export function startingExtraLines(): EnteredLine[] {
  const blank = { marginPct: null, discountPct: null, taxRatePct: null, partKind: null, partId: null, offerId: null, unitCost: "0" };
  return [
    { ...blank, kind: "labour", description: "Installation labour (hours)", quantity: "8" },
    { ...blank, kind: "mounting", description: "Mounting frame and fixings", quantity: "1" },
    { ...blank, kind: "freight", description: "Freight to site", quantity: "1" },
  ];
}
