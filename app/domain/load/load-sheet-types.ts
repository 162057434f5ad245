// The customer's appliances and what they add up to, month by month.

export type ApplianceCircuit = "ac" | "dc";

export interface Appliance {
  name: string;
  /** Running power of one unit, W. */
  powerW: number;
  /** How many of these run at once (each at powerW). */
  quantity: number;
  hoursPerDay: number;
  /** Days of the week it runs, 0–7; the energy is averaged over the week. */
  daysPerWeek: number;
  circuit: ApplianceCircuit;
  /** Starting (surge) power of one unit, W; defaults to powerW (no surge). */
  surgeW?: number;
  /** Months it runs, 1–12; all year when absent. */
  months?: readonly number[];
}

/** What the inverter adds to the AC loads. */
export interface InverterLoadParams {
  efficiencyPct: number;
  idleDrawW: number;
  /** Hours a day the inverter is switched on in a month with AC loads (default 24). */
  onHoursPerDay?: number;
}

export interface LoadMonth {
  month: number;
  dcWhPerDay: number;
  /** AC energy at the appliances. */
  acWhPerDay: number;
  /** AC energy drawn from the battery through the inverter's efficiency. */
  acFromBatteryWhPerDay: number;
  inverterIdleWhPerDay: number;
  /** Everything the battery bus supplies: DC + AC through the inverter + inverter idle draw. */
  totalWhPerDay: number;
  /** All AC appliances running this month, running at once, W. */
  peakAcW: number;
  peakDcW: number;
}

export interface LargestSurge {
  appliance: string;
  /** Surge of one unit, W. */
  surgeW: number;
  /** The surge plus every other AC load of its busiest month running at the same time, W. */
  startingDemandW: number;
}

export interface LoadSummary {
  months: LoadMonth[];
  /** Highest peakAcW of the year, W. */
  peakAcW: number;
  peakDcW: number;
  /** Largest single AC surge (null with no AC loads). */
  largestSurge: LargestSurge | null;
  /** Highest monthly totalWhPerDay. */
  maxDailyWh: number;
  annualKWh: number;
  hasAcLoad: boolean;
  assumptions: string[];
}
