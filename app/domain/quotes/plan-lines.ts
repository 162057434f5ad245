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

/**
 * The plan's cable runs and their fuses or breakers in one line, so the quote names what was sized
 * (two conductors a run, out and back); the installer prices it from their own cable stock.
 */
export function cablingLine(plan: KitPlan): EnteredLine | null {
  const runs = plan.cables.filter((c) => c.conductor !== null);
  if (!runs.length) return null;
  const words = runs.map(
    (c) => `${c.label.toLowerCase()} ${c.conductor!.label} × ${round1(2 * c.oneWayLengthM)} m${c.protectionA ? `, ${c.protectionA} A fuse` : ""}`,
  );
  const head = "Cables and protection as sized in the plan: ";
  // A line's description holds 300 characters: name as many runs as fit, and say the rest are in the plan.
  let description = head + words.join("; ");
  for (let n = words.length - 1; description.length > 300 && n > 0; n--) description = `${head}${words.slice(0, n).join("; ")}; more in the plan`;
  return { ...BLANK, kind: "extra", description: description.slice(0, 300), quantity: "1" };
}

function round1(value: number) {
  return Math.round(value * 10) / 10;
}

const BLANK = { marginPct: null, discountPct: null, taxRatePct: null, partKind: null, partId: null, offerId: null, unitCost: "0" };

/** Lines every installation has besides the parts; the installer fills in the costs. */
export function startingExtraLines(): EnteredLine[] {
  const blank = BLANK;
  return [
    { ...blank, kind: "labour", description: "Installation labour (hours)", quantity: "8" },
    { ...blank, kind: "mounting", description: "Mounting frame and fixings", quantity: "1" },
    { ...blank, kind: "freight", description: "Freight to site", quantity: "1" },
  ];
}
