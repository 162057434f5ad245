// Totals of a load sheet per month: Wh/day at the battery bus (DC loads as they are, AC loads
// through the inverter's efficiency plus its idle draw), the peak simultaneous AC power and the
// largest surge. Weekly use is averaged over the week (common practice for load sheets).
import type { Appliance, InverterLoadParams, LoadMonth, LoadSummary, LargestSurge } from "./load-sheet-types";

const DAYS_IN_MONTH = [31, 28, 31, 30, 31, 30, 31, 31, 30, 31, 30, 31];
export const DEFAULT_INVERTER_ON_HOURS_PER_DAY = 24;

export function runsInMonth(appliance: Appliance, month: number): boolean {
  return appliance.months === undefined || appliance.months.includes(month);
}

/** Average Wh/day of one appliance line over a week: P·n·h·(days/7). */
export function applianceWhPerDay(appliance: Appliance): number {
  return (appliance.powerW * appliance.quantity * appliance.hoursPerDay * appliance.daysPerWeek) / 7;
}

export function applianceSurgeW(appliance: Appliance): number {
  return Math.max(appliance.surgeW ?? appliance.powerW, appliance.powerW);
}

/** Plain-words problems with one appliance line, keyed by field (empty when fine). */
export function applianceIssues(appliance: Appliance): Partial<Record<keyof Appliance, string>> {
  const issues: Partial<Record<keyof Appliance, string>> = {};
  if (!appliance.name || appliance.name.trim() === "") issues.name = "Give the appliance a name.";
  if (!(appliance.powerW >= 0)) issues.powerW = "Power must be 0 W or more.";
  if (!(Number.isInteger(appliance.quantity) && appliance.quantity >= 1)) issues.quantity = "How many run at once must be a whole number, at least 1.";
  if (!(appliance.hoursPerDay >= 0 && appliance.hoursPerDay <= 24)) issues.hoursPerDay = "Hours per day must be between 0 and 24.";
  if (!(appliance.daysPerWeek >= 0 && appliance.daysPerWeek <= 7)) issues.daysPerWeek = "Days per week must be between 0 and 7.";
  if (appliance.circuit !== "ac" && appliance.circuit !== "dc") issues.circuit = 'The circuit must be "ac" or "dc".';
  if (appliance.surgeW !== undefined && !(appliance.surgeW >= appliance.powerW)) issues.surgeW = "Surge power must be at least the running power.";
  if (appliance.months !== undefined && !appliance.months.every((m) => Number.isInteger(m) && m >= 1 && m <= 12)) {
    issues.months = "Months must be numbers from 1 (January) to 12 (December).";
  }
  return issues;
}

/**
 * Monthly totals of a load sheet. `inverter` null means no inverter was chosen: AC loads are then
 * counted at the appliances (the kit plan fails its inverter check).
 */
export function summarizeLoadSheet(appliances: readonly Appliance[], inverter: InverterLoadParams | null): LoadSummary {
  appliances.forEach((appliance, index) => {
    const issues = Object.values(applianceIssues(appliance));
    if (issues.length > 0) throw new RangeError(`appliance ${index + 1} (${appliance.name}): ${issues.join(" ")}`);
  });
  const efficiency = inverter ? inverter.efficiencyPct / 100 : 1;
  const onHours = inverter?.onHoursPerDay ?? DEFAULT_INVERTER_ON_HOURS_PER_DAY;
  const months: LoadMonth[] = [];
  for (let month = 1; month <= 12; month++) {
    let dcWhPerDay = 0;
    let acWhPerDay = 0;
    let peakAcW = 0;
    let peakDcW = 0;
    for (const appliance of appliances) {
      if (!runsInMonth(appliance, month) || appliance.daysPerWeek === 0 || appliance.hoursPerDay === 0) continue;
      const runningW = appliance.powerW * appliance.quantity;
      if (appliance.circuit === "ac") {
        acWhPerDay += applianceWhPerDay(appliance);
        peakAcW += runningW;
      } else {
        dcWhPerDay += applianceWhPerDay(appliance);
        peakDcW += runningW;
      }
    }
    const hasAc = peakAcW > 0;
    const acFromBatteryWhPerDay = acWhPerDay / efficiency;
    const inverterIdleWhPerDay = inverter && hasAc ? inverter.idleDrawW * onHours : 0;
    months.push({
      month,
      dcWhPerDay,
      acWhPerDay,
      acFromBatteryWhPerDay,
      inverterIdleWhPerDay,
      totalWhPerDay: dcWhPerDay + acFromBatteryWhPerDay + inverterIdleWhPerDay,
      peakAcW,
      peakDcW,
    });
  }
  const peakAcW = Math.max(...months.map((m) => m.peakAcW));
  return {
    months,
    peakAcW,
    peakDcW: Math.max(...months.map((m) => m.peakDcW)),
    largestSurge: findLargestSurge(appliances, months),
    maxDailyWh: Math.max(...months.map((m) => m.totalWhPerDay)),
    annualKWh: months.reduce((sum, m) => sum + (m.totalWhPerDay * DAYS_IN_MONTH[m.month - 1]) / 1000, 0),
    hasAcLoad: peakAcW > 0,
    assumptions: describeLoadAssumptions(inverter, onHours),
  };
}

/** The biggest single starting surge, and what the inverter sees when it happens with everything else on. */
function findLargestSurge(appliances: readonly Appliance[], months: readonly LoadMonth[]): LargestSurge | null {
  let best: LargestSurge | null = null;
  for (const appliance of appliances) {
    if (appliance.circuit !== "ac" || appliance.powerW === 0 || appliance.hoursPerDay === 0 || appliance.daysPerWeek === 0) continue;
    const surgeW = applianceSurgeW(appliance);
    let startingDemandW = 0;
    for (const m of months) {
      if (!runsInMonth(appliance, m.month)) continue;
      // One unit starts while the rest of the AC load (including its own other units) runs.
      startingDemandW = Math.max(startingDemandW, m.peakAcW - appliance.powerW + surgeW);
    }
    if (!best || surgeW > best.surgeW || (surgeW === best.surgeW && startingDemandW > best.startingDemandW)) {
      best = { appliance: appliance.name, surgeW, startingDemandW };
    }
  }
  return best;
}

function describeLoadAssumptions(inverter: InverterLoadParams | null, onHours: number): string[] {
  const notes = [
    "Energy per appliance = power × how many run at once × hours per day × days per week ÷ 7 (weekly use spread over the week).",
    "Peak AC power assumes every AC appliance of the month may run at the same time (the safe side for the inverter).",
  ];
  if (inverter) {
    notes.push(
      `AC energy is drawn from the battery through the inverter at ${inverter.efficiencyPct} % efficiency, plus its idle draw of ` +
        `${inverter.idleDrawW} W for ${onHours} h a day in months with AC loads (both counted, which errs on the safe side).`,
    );
  } else {
    notes.push("No inverter chosen: AC loads are counted at the appliances, without conversion losses.");
  }
  return notes;
}
