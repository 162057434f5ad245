// The simulated year's verdict: days on which the battery could not meet the load.
import type { PlanCheck } from "./checks";
import { figure } from "./checks";
import { fmt, MONTH_NAMES } from "./format";
import type { YearSimulation } from "./year-simulation";

/** More unmet days than this share of the year is a failure (Kitwright's own threshold, no source). */
export const UNMET_DAYS_FAIL_SHARE = 0.1;

export function simulationCheck(simulation: YearSimulation, acceptableUnmetDays: number): PlanCheck {
  const { unmetDays } = simulation;
  let status: PlanCheck["status"] = "pass";
  if (unmetDays > acceptableUnmetDays) status = unmetDays > UNMET_DAYS_FAIL_SHARE * 365 ? "fail" : "warn";
  const worst = simulation.months.reduce((w, m) => (m.unmetDays > w.unmetDays ? m : w), simulation.months[0]);
  const sentence =
    unmetDays === 0
      ? `In a simulated year of daily weather the battery met the load every day; its lowest state of charge was ${fmt(simulation.minStateOfChargePct, 0)} %.`
      : `In a simulated year of daily weather the load went unmet on ${unmetDays} day(s) (${fmt(simulation.unmetKWh, 1)} kWh, ${fmt(100 - simulation.loadMetPct, 1)} % of the year's load), most in ${MONTH_NAMES[worst.month - 1]}` +
        (status === "pass" ? `, within the ${acceptableUnmetDays} accepted.` : ". A larger array or battery, or less load in the dark months, would help.");
  return {
    id: "simulation.unmet-days",
    kind: "performance",
    status,
    title: "Simulated year",
    sentence,
    figures: [
      figure("Days with unmet load", unmetDays, "days/year"),
      figure("Unmet energy", simulation.unmetKWh, "kWh/year"),
      figure("Energy dumped when full", simulation.dumpedKWh, "kWh/year"),
      figure("Lowest state of charge", simulation.minStateOfChargePct, "%"),
      figure("State of charge on 1 January (after warm-up years)", simulation.startStateOfChargePct, "%"),
      figure("Weather seed", simulation.seed, ""),
    ],
    basis:
      "Daily clearness index from Bendt, Collares-Pereira & Rabl (1981), seeded; daily battery energy balance, " +
      `starting 1 January at the ${fmt(simulation.startStateOfChargePct, 0)} % state of charge that warm-up runs of the same year settle on.`,
  };
}
