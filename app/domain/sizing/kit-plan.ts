// The kit plan: from a site, a load sheet, a system voltage, chosen parts and design choices to an
// array layout, a battery bank, inverter, cable and fuse figures, a simulated year and a list of checks.
// Pure: no I/O. planKit prepares the site itself; planKitForSite reuses a prepared site when many kits
// are compared for one site.
import { summarizeLoadSheet } from "../load/load-sheet";
import { prepareSiteProfile } from "../solar/site-profile";
import type { SiteProfile } from "../solar/site-profile";
import type { YieldOptions } from "../solar/yield-types";
import { sizeBatteryBank } from "./battery-bank";
import { inverterMaxDcCurrentA, sizeCableRuns } from "./cables";
import { capacityTemperatureFactor } from "./chemistry";
import type { MonthTransposition } from "./day-irradiance";
import { monthTranspositions } from "./day-irradiance";
import { fmt, MONTH_NAMES } from "./format";
import { DEFAULT_INVERTER_MARGIN_PCT } from "./inverter-checks";
import { planArray } from "./plan-array";
import { collectPlanChecks } from "./plan-checks";
import { PLAN_CAUTIONS, planAssumptions } from "./plan-notes";
import { PlanInputError, planInputIssues } from "./plan-input";
import type { InverterPlan, KitPlan, KitPlanInput, PlanSite } from "./plan-types";
import { protectionList } from "./protection";
import { simulateYear } from "./year-simulation";

/** What a kit plan needs of a site that does not depend on the parts: prepare once, plan many kits. */
export interface PreparedPlanSite {
  profile: SiteProfile;
  transpositions: MonthTransposition[];
}

export function preparePlanSite(site: PlanSite, options?: YieldOptions): PreparedPlanSite {
  return { profile: prepareSiteProfile(site, options), transpositions: monthTranspositions(site) };
}

export function planKit(input: KitPlanInput): KitPlan {
  const issues = planInputIssues(input);
  if (issues.length > 0) throw new PlanInputError(issues);
  return planKitForSite(preparePlanSite(input.site, input.yieldOptions), input);
}

/** As planKit, with the site prepared beforehand (it must be the same site as input.site). */
export function planKitForSite(prepared: PreparedPlanSite, input: KitPlanInput): KitPlan {
  const { site, systemVoltageV, parts, design } = input;
  const { module, controller, battery, inverter } = parts;
  const load = summarizeLoadSheet(
    input.appliances,
    inverter ? { efficiencyPct: inverter.efficiencyPct, idleDrawW: inverter.idleDrawW, onHoursPerDay: design.inverterOnHoursPerDay } : null,
  );

  // Array: energy per module, the worst month's module count and a layout (plan-array.ts).
  const { array, moduleYield, powerNote, hottestAirC, voltageNote } = planArray(
    prepared.profile,
    input,
    load.months.map((m) => m.totalWhPerDay),
  );
  const { layout } = array;
  const roundTripEfficiency = battery.roundTripEfficiencyPct / 100;

  // Battery: sized at its coldest monthly temperature; each month's usable energy follows that month's.
  const airMeanC = site.months.map((m) => (m.tMinC + m.tMaxC) / 2);
  const floorC = design.batteryMinTempC ?? -Infinity;
  const monthlyTempC = airMeanC.map((t) => Math.max(t, floorC));
  const bank = sizeBatteryBank({
    battery,
    systemVoltageV,
    dailyLoadWh: load.maxDailyWh,
    autonomyDays: design.autonomyDays,
    maxDepthOfDischargePct: design.maxDepthOfDischargePct,
    batteryTempC: Math.min(...monthlyTempC),
    stringsInParallel: design.forcedBatteryStrings,
  });
  const dod = bank.effectiveDodPct / 100;
  const monthlyUsableWh = monthlyTempC.map((t) => bank.bankNominalWh * dod * capacityTemperatureFactor(battery.chemistry, t));
  const coldestBatteryC = Math.max(Math.min(...site.months.map((m) => m.tMinC)), floorC);

  const inverterPlan: InverterPlan | null = inverter
    ? {
        continuousW: inverter.continuousW,
        surgeW: inverter.surgeW,
        continuousNeededW: load.peakAcW * (1 + (design.inverterMarginPct ?? DEFAULT_INVERTER_MARGIN_PCT) / 100),
        peakAcW: load.peakAcW,
        largestSurgeW: load.largestSurge?.surgeW ?? 0,
        startingDemandW: load.largestSurge?.startingDemandW ?? 0,
        maxDcCurrentA: inverterMaxDcCurrentA(inverter, systemVoltageV),
      }
    : null;

  const cables = sizeCableRuns({
    module,
    controller,
    battery,
    inverter,
    systemVoltageV,
    layout,
    runs: design.cableRuns,
    system: design.conductorSystem,
    dropTargetPct: design.voltageDropTargetPct,
  });
  const protection = protectionList(cables, layout);

  const simulation = simulateYear({
    months: prepared.profile.months.map((m, i) => ({
      clearnessIndex: m.clearnessIndex,
      arrayWhPerDay: array.months[i].arrayWhPerDay,
      loadWhPerDay: load.months[i].totalWhPerDay,
      usableCapacityWh: monthlyUsableWh[i],
    })),
    transpositions: prepared.transpositions,
    depthOfDischarge: dod,
    roundTripEfficiency,
    seed: design.simulation?.seed,
    dayToDayCorrelation: design.simulation?.dayToDayCorrelation,
  });

  const checks = collectPlanChecks({ input, load, array, bank, coldestBatteryC, simulation, cables });

  const batteryTempNote =
    design.batteryMinTempC === undefined
      ? `Battery temperature: follows each month's mean air temperature (an unheated enclosure); sized at the coldest month's ${fmt(bank.batteryTempC, 0)} °C, where it gives ${fmt(100 * bank.temperatureFactor, 0)} % of its capacity.`
      : `Battery temperature: never below ${fmt(design.batteryMinTempC, 0)} °C (heated space); sized at ${fmt(bank.batteryTempC, 0)} °C, where it gives ${fmt(100 * bank.temperatureFactor, 0)} % of its capacity.`;
  return {
    systemVoltageV,
    load,
    moduleYield,
    array,
    battery: { ...bank, monthlyTempC, monthlyUsableWh },
    inverter: inverterPlan,
    cables,
    protection,
    simulation,
    checks,
    assumptions: [
      powerNote,
      ...load.assumptions,
      ...moduleYield.assumptions,
      ...planAssumptions(site, design, controller, hottestAirC, batteryTempNote),
      ...(voltageNote ? [voltageNote] : []),
      ...(simulation.constantMonths.length > 0
        ? [
            `Simulated weather in ${simulation.constantMonths.map((m) => MONTH_NAMES[m - 1]).join(", ")}: every day at the month's mean clearness index ` +
              "(too dark or too clear for the daily distribution's fitted range).",
          ]
        : []),
    ],
    cautions: [...PLAN_CAUTIONS],
  };
}
