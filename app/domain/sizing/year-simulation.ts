// The simulated year of a kit plan: daily weather (weather-year.ts), the array's energy on each day
// (day-irradiance.ts scaling of the engine's monthly energy), and the battery's daily balance
// (battery-simulation.ts). The result states the days with unmet load. The battery does not start the
// reported year full: the same weather year is run once before it from full (a warm-up), and the
// reported year starts from the charge that warm-up ends 31 December with, as a bank in its second year
// would. Starting full would hand a northern site a free full charge going into its worst months.
import { simulateBattery } from "./battery-simulation";
import type { MonthTransposition } from "./day-irradiance";
import { expectedPlaneOfArrayKWhM2, planeOfArrayForDayKWhM2 } from "./day-irradiance";
import { DAYS_IN_YEAR, DEFAULT_DAY_TO_DAY_CORRELATION, DEFAULT_WEATHER_SEED, drawWeatherYear, monthOfDay } from "./weather-year";

export interface YearSimulationMonthInput {
  clearnessIndex: number;
  /** Whole array's energy to the battery bus on the month's average day (the engine's figure), Wh. */
  arrayWhPerDay: number;
  loadWhPerDay: number;
  usableCapacityWh: number;
}

export interface YearSimulationInput {
  months: readonly YearSimulationMonthInput[];
  transpositions: readonly MonthTransposition[];
  depthOfDischarge: number;
  roundTripEfficiency: number;
  seed?: number;
  dayToDayCorrelation?: number;
}

export interface SimulatedMonth {
  month: number;
  meanClearnessIndex: number;
  harvestKWh: number;
  loadKWh: number;
  unmetDays: number;
  unmetKWh: number;
  dumpedKWh: number;
  minStateOfChargePct: number;
}

export interface YearSimulation {
  seed: number;
  dayToDayCorrelation: number;
  /** Months (1–12) whose days were all held at the monthly mean (outside the distribution's range). */
  constantMonths: number[];
  /** Day by day from 1 January (365 values each), for charts. */
  days: {
    month: number[];
    clearnessIndex: number[];
    harvestWh: number[];
    loadWh: number[];
    stateOfChargePct: number[];
    unmetWh: number[];
    dumpedWh: number[];
  };
  months: SimulatedMonth[];
  unmetDays: number;
  unmetKWh: number;
  dumpedKWh: number;
  loadKWh: number;
  /** Share of the year's load that was met, %. */
  loadMetPct: number;
  minStateOfChargePct: number;
  /** State of charge the reported year starts from: the warm-up year's at the end of 31 December, %. */
  startStateOfChargePct: number;
}

export function simulateYear(input: YearSimulationInput): YearSimulation {
  const seed = input.seed ?? DEFAULT_WEATHER_SEED;
  const dayToDayCorrelation = input.dayToDayCorrelation ?? DEFAULT_DAY_TO_DAY_CORRELATION;
  const weather = drawWeatherYear(
    input.months.map((m) => m.clearnessIndex),
    seed,
    dayToDayCorrelation,
  );
  // Scale so that the expected day of each month delivers exactly the engine's monthly energy.
  const scaleWhPerKWhM2 = input.months.map((m, i) => {
    const expected = expectedPlaneOfArrayKWhM2(input.transpositions[i], weather.distributions[i]);
    return expected > 0 ? m.arrayWhPerDay / expected : 0;
  });
  const monthOf = monthOfDay();
  const harvestWh = new Array<number>(DAYS_IN_YEAR);
  const loadWh = new Array<number>(DAYS_IN_YEAR);
  const usableCapacityWh = new Array<number>(DAYS_IN_YEAR);
  for (let d = 0; d < DAYS_IN_YEAR; d++) {
    const i = monthOf[d] - 1;
    harvestWh[d] = scaleWhPerKWhM2[i] * planeOfArrayForDayKWhM2(input.transpositions[i], weather.clearnessIndex[d]);
    loadWh[d] = input.months[i].loadWhPerDay;
    usableCapacityWh[d] = input.months[i].usableCapacityWh;
  }
  const batteryInput = {
    harvestWh,
    loadWh,
    usableCapacityWh,
    depthOfDischarge: input.depthOfDischarge,
    roundTripEfficiency: input.roundTripEfficiency,
  };
  const startWh = steadyStartWh(batteryInput);
  const battery = simulateBattery({ ...batteryInput, initialStoredWh: startWh });
  // As the state of charge of 31 December (the day the warm-up ends on), on the same depth scale.
  const lastCapacityWh = usableCapacityWh[DAYS_IN_YEAR - 1];
  const startStateOfChargePct = lastCapacityWh > 0 ? 100 * (1 - input.depthOfDischarge * (1 - startWh / lastCapacityWh)) : 0;

  const months: SimulatedMonth[] = [];
  for (let m = 1; m <= 12; m++) {
    months.push({ month: m, meanClearnessIndex: 0, harvestKWh: 0, loadKWh: 0, unmetDays: 0, unmetKWh: 0, dumpedKWh: 0, minStateOfChargePct: 100 });
  }
  const dayCount = new Array<number>(12).fill(0);
  for (let d = 0; d < DAYS_IN_YEAR; d++) {
    const s = months[monthOf[d] - 1];
    dayCount[monthOf[d] - 1]++;
    s.meanClearnessIndex += weather.clearnessIndex[d];
    s.harvestKWh += harvestWh[d] / 1000;
    s.loadKWh += loadWh[d] / 1000;
    s.unmetKWh += battery.unmetWh[d] / 1000;
    s.dumpedKWh += battery.dumpedWh[d] / 1000;
    if (battery.unmetWh[d] > 0) s.unmetDays++;
    s.minStateOfChargePct = Math.min(s.minStateOfChargePct, battery.stateOfChargePct[d]);
  }
  months.forEach((s, i) => (s.meanClearnessIndex /= dayCount[i]));
  const loadKWh = months.reduce((sum, s) => sum + s.loadKWh, 0);
  const unmetKWh = months.reduce((sum, s) => sum + s.unmetKWh, 0);
  return {
    seed,
    dayToDayCorrelation,
    constantMonths: weather.distributions.flatMap((d, i) => (d.constant ? [i + 1] : [])),
    days: {
      month: Array.from(monthOf),
      clearnessIndex: Array.from(weather.clearnessIndex),
      harvestWh,
      loadWh,
      stateOfChargePct: battery.stateOfChargePct,
      unmetWh: battery.unmetWh,
      dumpedWh: battery.dumpedWh,
    },
    months,
    unmetDays: months.reduce((sum, s) => sum + s.unmetDays, 0),
    unmetKWh,
    dumpedKWh: months.reduce((sum, s) => sum + s.dumpedKWh, 0),
    loadKWh,
    loadMetPct: loadKWh > 0 ? 100 * (1 - unmetKWh / loadKWh) : 100,
    minStateOfChargePct: Math.min(...battery.stateOfChargePct),
    startStateOfChargePct,
  };
}

/** Warm-up passes at most; a bank that drains over several years stops here, still on the full side. */
export const MAX_WARM_UP_YEARS = 5;

/**
 * The charge to start 1 January from: the same weather year is run from a full battery, then again
 * from where it ended, until a year ends within 0.1 % of the capacity where it began (at most
 * MAX_WARM_UP_YEARS runs), so the reported year neither starts its worst months with a free full
 * charge nor with a deficit a real year would not carry.
 */
export function steadyStartWh(input: Parameters<typeof simulateBattery>[0]): number {
  let startWh = input.usableCapacityWh[0];
  for (let pass = 0; pass < MAX_WARM_UP_YEARS; pass++) {
    const endWh = simulateBattery({ ...input, initialStoredWh: startWh }).endStoredWh;
    const settled = Math.abs(endWh - startWh) <= 0.001 * input.usableCapacityWh[0];
    startWh = endWh;
    if (settled) break;
  }
  return startWh;
}
