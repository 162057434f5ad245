// The list of fuses and breakers a kit needs, from its cable runs and string count.
import type { CableRunSizing } from "./cables";
import { fmt } from "./format";
import { PV_MAX_CURRENT_FACTOR, CONTINUOUS_DUTY_FACTOR, nextStandardRatingA, stringFusesNeeded } from "./fuses";
import type { ProtectionItem } from "./plan-types";
import type { LayoutEvaluation } from "./string-layout";

const WHERE: Record<CableRunSizing["id"], string> = {
  "array-to-controller": "PV disconnect / breaker before the controller",
  "controller-to-battery": "Fuse or breaker between controller and battery, close to the battery",
  "battery-to-inverter": "Fuse or breaker between battery and inverter, close to the battery",
};

/** Isc of one string as the layout counted it (scaled up when verified power exceeds nameplate). */
export function stringIscA(layout: LayoutEvaluation): number {
  return layout.arrayMaxCurrentA / (PV_MAX_CURRENT_FACTOR * layout.stringsInParallel);
}

export function protectionList(cables: readonly CableRunSizing[], layout: LayoutEvaluation): ProtectionItem[] {
  const items: ProtectionItem[] = [];
  if (stringFusesNeeded(layout.stringsInParallel)) {
    items.push({
      id: "pv-string-fuses",
      where: "Each PV string, in the combiner",
      ratingA: nextStandardRatingA(PV_MAX_CURRENT_FACTOR * CONTINUOUS_DUTY_FACTOR * stringIscA(layout)),
      count: layout.stringsInParallel,
      basis: "≥ 1.56 × Isc, next standard rating, DC-rated (NEC 690.8, 690.9).",
    });
  }
  for (const run of cables) {
    items.push({
      id: run.id,
      where: WHERE[run.id],
      ratingA: run.protectionA,
      count: 1,
      basis: `≥ 1.25 × ${fmt(run.maxCircuitCurrentA)} A circuit current, next standard rating, DC-rated.`,
    });
  }
  return items;
}
