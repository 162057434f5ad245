// System losses given as named percentages, applied one after another (multiplicatively) and
// returned item by item so a user sees where the energy goes.

export interface LossesPct {
  soiling: number;
  mismatch: number;
  wiring: number;
}

export type LossKey = keyof LossesPct;

export const LOSS_LABELS: Record<LossKey, string> = {
  soiling: "Soiling",
  mismatch: "Module mismatch",
  wiring: "DC wiring",
};

const LOSS_ORDER: readonly LossKey[] = ["soiling", "mismatch", "wiring"];

export interface AppliedLosses {
  energyAfterWh: number;
  lostWh: Record<LossKey, number>;
}

/** Product of (1 − p/100) over all losses. */
export function combinedLossFactor(losses: LossesPct): number {
  return LOSS_ORDER.reduce((factor, key) => factor * (1 - losses[key] / 100), 1);
}

/** Applies each loss to what the previous ones left and reports the Wh each one took. */
export function applyLosses(energyWh: number, losses: LossesPct): AppliedLosses {
  let remainingWh = energyWh;
  const lostWh = { soiling: 0, mismatch: 0, wiring: 0 };
  for (const key of LOSS_ORDER) {
    const takenWh = (remainingWh * losses[key]) / 100;
    lostWh[key] = takenWh;
    remainingWh -= takenWh;
  }
  return { energyAfterWh: remainingWh, lostWh };
}
