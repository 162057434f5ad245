// Battery state of charge through a year, one energy balance per day. Assumptions (stated in the plan):
// the battery starts full unless told its starting charge (the year simulation starts it from a warm-up
// year's end, year-simulation.ts); everything the array delivers passes into the battery with the round-trip
// efficiency charged on the way in (daytime loads fed straight from the array escape that loss, so this
// errs on the safe side); loads are taken from the usable energy; when the battery is full the rest of the
// day's array energy is not taken (dumped); when it reaches its depth-of-discharge floor the rest of the
// day's load goes unmet. Charge-current limits within the day are not modelled.

export interface BatterySimulationInput {
  /** Array energy delivered to the battery bus each day, Wh (365 values). */
  harvestWh: ArrayLike<number>;
  /** Load drawn from the battery bus each day, Wh. */
  loadWh: ArrayLike<number>;
  /** Usable energy between full and the depth-of-discharge floor each day, Wh (temperature-corrected). */
  usableCapacityWh: ArrayLike<number>;
  /** Depth of discharge the usable energy stands for, 0–1 (to express the charge as a state of charge). */
  depthOfDischarge: number;
  roundTripEfficiency: number;
  /** Usable energy stored before the first day, Wh; full (the first day's usable energy) when absent. */
  initialStoredWh?: number;
}

export interface BatteryDayResults {
  /** State of charge at the end of each day, % of the (temperature-corrected) bank. */
  stateOfChargePct: number[];
  unmetWh: number[];
  dumpedWh: number[];
  /** Usable energy stored at the end of the last day, Wh (to carry into a following run). */
  endStoredWh: number;
}

export function simulateBattery(input: BatterySimulationInput): BatteryDayResults {
  const { harvestWh, loadWh, usableCapacityWh, depthOfDischarge, roundTripEfficiency } = input;
  const days = harvestWh.length;
  const stateOfChargePct: number[] = new Array(days);
  const unmetWh: number[] = new Array(days);
  const dumpedWh: number[] = new Array(days);
  let storedWh = input.initialStoredWh ?? usableCapacityWh[0];
  for (let d = 0; d < days; d++) {
    const capacityWh = usableCapacityWh[d];
    storedWh = Math.min(storedWh, capacityWh); // a colder month makes part of the charge unavailable
    let available = storedWh + harvestWh[d] * roundTripEfficiency - loadWh[d];
    let unmet = 0;
    let dumped = 0;
    if (available < 0) {
      unmet = -available;
      available = 0;
    } else if (available > capacityWh) {
      dumped = (available - capacityWh) / roundTripEfficiency;
      available = capacityWh;
    }
    storedWh = available;
    unmetWh[d] = unmet;
    dumpedWh[d] = dumped;
    stateOfChargePct[d] = capacityWh > 0 ? 100 * (1 - depthOfDischarge * (1 - storedWh / capacityWh)) : 0;
  }
  return { stateOfChargePct, unmetWh, dumpedWh, endStoredWh: storedWh };
}
