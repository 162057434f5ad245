// Overcurrent protection ratings from circuit currents.
import { STANDARD_FUSE_RATINGS_A } from "../../../data/conductors/fuse-ratings";

/**
 * PV source circuit: maximum current = 1.25 × Isc (NEC 690.8(A)(1)); the conductor and the fuse are
 * sized at 1.25 × that again, so 1.56 × Isc (NEC 690.8(B), 690.9(B)).
 */
export const PV_MAX_CURRENT_FACTOR = 1.25;
export const CONTINUOUS_DUTY_FACTOR = 1.25;

/** Smallest standard rating at or above the current; null when above the list (use parallel protection or ask a specialist). */
export function nextStandardRatingA(currentA: number): number | null {
  for (const rating of STANDARD_FUSE_RATINGS_A) if (rating >= currentA - 1e-9) return rating;
  return null;
}

/**
 * String fuses are needed only when three or more strings are in parallel: with two, the other string
 * cannot feed more than one string's Isc into a fault (NEC 690.9(A) — from memory).
 */
export function stringFusesNeeded(stringsInParallel: number): boolean {
  return stringsInParallel >= 3;
}
