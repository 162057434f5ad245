// What the kit plan needs of its input, as field paths and plain messages, so an API or form can show
// them at the field. planKit throws PlanInputError with these when any are present.
import { applianceIssues } from "../load/load-sheet";
import type { KitPlanInput } from "./plan-types";
import { SYSTEM_VOLTAGES } from "./parts";

export interface PlanInputIssue {
  path: string;
  message: string;
}

export class PlanInputError extends Error {
  readonly issues: PlanInputIssue[];
  constructor(issues: PlanInputIssue[]) {
    super(`The kit plan cannot be worked out: ${issues.map((i) => `${i.path}: ${i.message}`).join(" ")}`);
    this.name = "PlanInputError";
    this.issues = issues;
  }
}

function positive(issues: PlanInputIssue[], path: string, value: number | undefined, label: string) {
  if (!(typeof value === "number" && Number.isFinite(value) && value > 0)) issues.push({ path, message: `${label} must be more than 0.` });
}

function within(issues: PlanInputIssue[], path: string, value: number | undefined, min: number, max: number, label: string) {
  if (!(typeof value === "number" && value >= min && value <= max)) issues.push({ path, message: `${label} must be between ${min} and ${max}.` });
}

export function planInputIssues(input: KitPlanInput): PlanInputIssue[] {
  const issues: PlanInputIssue[] = [];
  const { site, parts, design } = input;
  if (site.months?.length !== 12) issues.push({ path: "site.months", message: "Give exactly 12 months, January to December." });
  within(issues, "site.coldestTempC", site.coldestTempC, -70, 40, "The coldest expected temperature (°C)");
  if (site.hottestTempC !== undefined) within(issues, "site.hottestTempC", site.hottestTempC, -40, 60, "The hottest expected temperature (°C)");
  if (site.shadingDeratePct !== undefined) within(issues, "site.shadingDeratePct", site.shadingDeratePct, 0, 90, "Shading loss (%)");
  if (!SYSTEM_VOLTAGES.includes(input.systemVoltageV)) issues.push({ path: "systemVoltageV", message: "System voltage must be 12, 24 or 48 V." });
  input.appliances.forEach((appliance, index) => {
    for (const [field, message] of Object.entries(applianceIssues(appliance))) issues.push({ path: `appliances.${index}.${field}`, message });
  });
  const m = parts.module;
  for (const key of ["pmaxW", "vmpV", "impA", "vocV", "iscA", "noctC"] as const) positive(issues, `parts.module.${key}`, m[key], `Module ${key}`);
  if (m.vmpV >= m.vocV) issues.push({ path: "parts.module.vmpV", message: "Module Vmp must be below Voc." });
  if (m.impA >= m.iscA) issues.push({ path: "parts.module.impA", message: "Module Imp must be below Isc." });
  positive(issues, "parts.controller.maxPvVocV", parts.controller.maxPvVocV, "Controller maximum PV voltage");
  positive(issues, "parts.controller.maxChargeCurrentA", parts.controller.maxChargeCurrentA, "Controller charge current");
  within(issues, "parts.controller.efficiencyPct", parts.controller.efficiencyPct, 50, 100, "Controller efficiency (%)");
  const b = parts.battery;
  positive(issues, "parts.battery.nominalVoltageV", b.nominalVoltageV, "Battery voltage");
  positive(issues, "parts.battery.capacityAh", b.capacityAh, "Battery capacity");
  positive(issues, "parts.battery.capacityHourRateH", b.capacityHourRateH, "Battery capacity hour rate");
  within(issues, "parts.battery.usableDodPct", b.usableDodPct, 1, 100, "Usable depth of discharge (%)");
  within(issues, "parts.battery.roundTripEfficiencyPct", b.roundTripEfficiencyPct, 50, 100, "Round-trip efficiency (%)");
  if (parts.inverter) {
    positive(issues, "parts.inverter.continuousW", parts.inverter.continuousW, "Inverter continuous power");
    within(issues, "parts.inverter.efficiencyPct", parts.inverter.efficiencyPct, 50, 100, "Inverter efficiency (%)");
    within(issues, "parts.inverter.idleDrawW", parts.inverter.idleDrawW, 0, 1000, "Inverter idle draw (W)");
  }
  within(issues, "design.autonomyDays", design.autonomyDays, 0.5, 30, "Days of autonomy");
  within(issues, "design.designMarginPct", design.designMarginPct, 0, 200, "Design margin (%)");
  within(issues, "design.voltageDropTargetPct", design.voltageDropTargetPct, 0.1, 20, "Voltage-drop target (%)");
  if (design.maxDepthOfDischargePct !== undefined)
    within(issues, "design.maxDepthOfDischargePct", design.maxDepthOfDischargePct, 5, 100, "Maximum depth of discharge (%)");
  for (const key of ["arrayToController", "controllerToBattery", "batteryToInverter"] as const) {
    const run = design.cableRuns[key];
    if (run) within(issues, `design.cableRuns.${key}.oneWayLengthM`, run.oneWayLengthM, 0, 1000, "Cable length (m)");
  }
  if (design.forcedLayout) {
    const { modulesInSeries, stringsInParallel } = design.forcedLayout;
    if (!(Number.isInteger(modulesInSeries) && modulesInSeries >= 1 && modulesInSeries <= 100)) {
      issues.push({ path: "design.forcedLayout.modulesInSeries", message: "Modules in series must be a whole number from 1 to 100." });
    }
    if (!(Number.isInteger(stringsInParallel) && stringsInParallel >= 1 && stringsInParallel <= 200)) {
      issues.push({ path: "design.forcedLayout.stringsInParallel", message: "Strings in parallel must be a whole number from 1 to 200." });
    }
  }
  if (design.forcedBatteryStrings !== undefined && !(Number.isInteger(design.forcedBatteryStrings) && design.forcedBatteryStrings >= 1)) {
    issues.push({ path: "design.forcedBatteryStrings", message: "Battery strings must be a whole number, at least 1." });
  }
  const corr = design.simulation?.dayToDayCorrelation;
  if (corr !== undefined && !(corr >= 0 && corr < 1))
    issues.push({ path: "design.simulation.dayToDayCorrelation", message: "Day-to-day correlation must be from 0 up to (not including) 1." });
  return issues;
}
