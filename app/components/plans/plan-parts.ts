// What the plan page may know about the chosen parts beyond the KitPlan itself (from the plan's stored
// input): a KitPlanInput["parts"] fits this shape. Every field is optional so the components degrade to
// the plan's own figures when the page has less.
import type { BatteryPart, ControllerPart, InverterPart, ModulePart } from "~/domain/sizing/parts";

export interface PlanPartFacts {
  module?: Pick<ModulePart, "pmaxW"> & Partial<Pick<ModulePart, "verifiedPmaxW" | "verifiedReadingCount">>;
  controller?: Pick<ControllerPart, "kind" | "maxPvVocV" | "maxChargeCurrentA">;
  battery?: Pick<BatteryPart, "chemistry" | "nominalVoltageV" | "capacityAh"> & Partial<Pick<BatteryPart, "capacityHourRateH" | "usableDodPct">>;
  inverter?: Pick<InverterPart, "efficiencyPct" | "idleDrawW"> | null;
}

/** Where the module power the energy was worked out with came from, in words. */
export function powerBasisWords(basis: "nameplate" | "verified", readingCount: number | null | undefined): string {
  if (basis === "nameplate") return "nameplate";
  if (readingCount === null || readingCount === undefined) return "verified from approved field readings";
  return `verified from ${readingCount} field reading${readingCount === 1 ? "" : "s"}`;
}
