// Inputs and outputs of the kit-alternatives search (search.ts). Money enters as exact integer minor
// units (cents) of the team's quoting currency, so ranking adds integers and never floats.
import type { KitPlanInput } from "../../sizing/plan-types";
import type { BatteryPart, ControllerPart, InverterPart, ModulePart } from "../../sizing/parts";
import type { StringLayout } from "../../sizing/string-layout";

export interface OfferPrice {
  offerId: string;
  supplierName: string;
  /** Landed total for this quantity in the quoting currency's minor units (an exact integer); null when it cannot be priced (no exchange rate). */
  costMinor(quantity: number): number | null;
}

export interface CandidatePart<P> {
  id: string;
  label: string;
  part: P;
  /** The team's valid offers for this part (at least one). */
  offers: readonly OfferPrice[];
}

export interface PartIds {
  moduleId: string;
  controllerId: string;
  batteryId: string;
  inverterId: string | null;
}

export interface AlternativesInput {
  /** The saved plan's input: site, loads, system voltage, design. Its parts are the current kit. */
  base: KitPlanInput;
  current: PartIds;
  /** Names of the current parts, for saying which has no offer. */
  currentLabels?: { module: string; controller: string; battery: string; inverter: string | null };
  currency: string;
  modules: readonly CandidatePart<ModulePart>[];
  controllers: readonly CandidatePart<ControllerPart>[];
  batteries: readonly CandidatePart<BatteryPart>[];
  inverters: readonly CandidatePart<InverterPart>[];
  /** How many kits to return (10). */
  topN?: number;
  /** Battery banks tried: the autonomy size and up to this many extra parallel strings (2). */
  extraBatteryStrings?: number;
  /** Arrays tried per string length: the fewest modules the worst month needs and up to this many extra parallel strings (2). */
  extraArrayStrings?: number;
  /** Cheapest candidates kept for the full re-check (400); the search says when that was not enough. */
  maxFullChecks?: number;
  /** Years a kit is costed over at most (10); a battery with fewer rated cycles shortens it. */
  lifetimeYears?: number;
}

export interface ChosenPart {
  id: string;
  label: string;
  offerId: string;
  supplierName: string;
  quantity: number;
  costMinor: number;
}

export interface KitAlternative {
  module: ChosenPart;
  controller: ChosenPart;
  battery: ChosenPart;
  inverter: ChosenPart | null;
  layout: StringLayout;
  batteryStrings: number;
  totalMinor: number;
  /** Delivered load energy a year (at the appliances), kWh. */
  deliveredKWhPerYear: number;
  lifetimeYears: number;
  /** Total ÷ (delivered kWh a year × lifetime), quoting currency per kWh, decimal text. */
  costPerKWh: string;
  warnings: number;
  differences: string[];
  isCurrentParts: boolean;
}

export interface PruneCount {
  reason: string;
  count: number;
}

export interface CurrentKitCost {
  /** The current kit at the team's cheapest valid offers, minor units; null when a part cannot be costed. */
  totalMinor: number | null;
  moduleCount: number | null;
  batteryCount: number | null;
  /** Whether the current kit itself meets every check and the unmet-days target (null: it cannot be planned). */
  meetsPlan: boolean | null;
  /** Why it cannot be costed, in plain words ("no valid offer for …"). */
  problems: string[];
}

export interface AlternativesResult {
  alternatives: KitAlternative[];
  currency: string;
  /** Part combinations × string layouts × battery banks priced and checked cheaply. */
  considered: number;
  /** Offer combinations never enumerated: another offer of the same part was cheaper at that quantity. */
  dominatedOfferCombinations: number;
  pruned: PruneCount[];
  fullChecks: number;
  /** Re-planned kits dropped: a check failed or the unmet-days target was missed. */
  fullCheckFailures: number;
  /** Of those, the kits whose simulated year had more unmet-load days than the plan accepts. */
  overUnmetDays: number;
  /** Unmet-load days a year the plan accepts. */
  acceptedUnmetDays: number;
  /** Set when the unmet-days target left the list empty or short, in plain words. */
  targetNote: string | null;
  current: CurrentKitCost;
  /** True when the kept cheapest candidates ran out before topN kits passed: the list may be short. */
  exhausted: boolean;
  lifetimeNote: string;
}
