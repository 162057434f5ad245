// The plan editor's text cells and their conversion to the plan's choices (see plan-choices.ts).
import type { PlanChoices } from "./plan-choices";
import { DEFAULT_DESIGN } from "./plan-choices";

export interface PlanEditorState {
  name: string;
  siteId: string;
  loadSheetId: string;
  systemVoltageV: string;
  moduleId: string;
  controllerId: string;
  batteryId: string;
  inverterId: string;
  powerBasis: "nameplate" | "verified";
  conductorSystem: "awg" | "mm2";
  numbers: Record<NumberField, string>;
}

export const NUMBER_FIELDS = {
  autonomyDays: { label: "Days of autonomy", unit: "days" },
  maxDepthOfDischargePct: { label: "Max depth of discharge (blank: the battery's own)", unit: "%" },
  designMarginPct: { label: "Design margin", unit: "%" },
  voltageDropTargetPct: { label: "Voltage-drop target", unit: "%" },
  arrayToControllerM: { label: "Array → controller, one way", unit: "m" },
  controllerToBatteryM: { label: "Controller → battery, one way", unit: "m" },
  batteryToInverterM: { label: "Battery → inverter, one way", unit: "m" },
  soiling: { label: "Soiling loss", unit: "%" },
  mismatch: { label: "Mismatch loss", unit: "%" },
  wiring: { label: "Wiring loss", unit: "%" },
  modulesInSeries: { label: "Modules in series (blank: planner's choice)", unit: "" },
  stringsInParallel: { label: "Strings in parallel (blank: planner's choice)", unit: "" },
  batteryStrings: { label: "Battery strings in parallel (blank: planner's choice)", unit: "" },
  acceptableUnmetDaysPerYear: { label: "Unmet-load days a year the customer accepts", unit: "days" },
  maxArrayAreaM2: { label: "Largest array area the site allows (blank: no limit)", unit: "m²" },
} as const;
export type NumberField = keyof typeof NUMBER_FIELDS;

const OPTIONAL: NumberField[] = [
  "maxDepthOfDischargePct",
  "modulesInSeries",
  "stringsInParallel",
  "batteryStrings",
  "acceptableUnmetDaysPerYear",
  "maxArrayAreaM2",
];

function text(value: number | undefined) {
  return value === undefined ? "" : String(value);
}

export function editorStateFrom(choices: Partial<PlanChoices> & { design?: PlanChoices["design"] }): PlanEditorState {
  const d = choices.design ?? DEFAULT_DESIGN;
  return {
    name: choices.name ?? "",
    siteId: choices.siteId ?? "",
    loadSheetId: choices.loadSheetId ?? "",
    systemVoltageV: String(choices.systemVoltageV ?? 24),
    moduleId: choices.moduleId ?? "",
    controllerId: choices.controllerId ?? "",
    batteryId: choices.batteryId ?? "",
    inverterId: choices.inverterId ?? "",
    powerBasis: d.powerBasis,
    conductorSystem: d.conductorSystem,
    numbers: {
      autonomyDays: text(d.autonomyDays),
      maxDepthOfDischargePct: text(d.maxDepthOfDischargePct),
      designMarginPct: text(d.designMarginPct),
      voltageDropTargetPct: text(d.voltageDropTargetPct),
      arrayToControllerM: text(d.arrayToControllerM),
      controllerToBatteryM: text(d.controllerToBatteryM),
      batteryToInverterM: text(d.batteryToInverterM),
      soiling: text(d.lossesPct.soiling),
      mismatch: text(d.lossesPct.mismatch),
      wiring: text(d.lossesPct.wiring),
      modulesInSeries: text(d.modulesInSeries),
      stringsInParallel: text(d.stringsInParallel),
      batteryStrings: text(d.batteryStrings),
      acceptableUnmetDaysPerYear: text(d.acceptableUnmetDaysPerYear),
      maxArrayAreaM2: text(d.maxArrayAreaM2),
    },
  };
}

function num(value: string, field: NumberField): number | string | undefined {
  const trimmed = value.trim();
  if (trimmed === "") return OPTIONAL.includes(field) ? undefined : "";
  const n = Number(trimmed.replace(",", "."));
  return Number.isFinite(n) ? n : trimmed;
}

/** The JSON the server validates; unreadable cells are passed as text so the server names them. */
export function choicesFromState(s: PlanEditorState) {
  const n = (f: NumberField) => num(s.numbers[f], f);
  return {
    name: s.name,
    siteId: s.siteId,
    loadSheetId: s.loadSheetId,
    systemVoltageV: Number(s.systemVoltageV),
    moduleId: s.moduleId,
    controllerId: s.controllerId,
    batteryId: s.batteryId,
    inverterId: s.inverterId || null,
    design: {
      autonomyDays: n("autonomyDays"),
      maxDepthOfDischargePct: n("maxDepthOfDischargePct"),
      designMarginPct: n("designMarginPct"),
      powerBasis: s.powerBasis,
      voltageDropTargetPct: n("voltageDropTargetPct"),
      conductorSystem: s.conductorSystem,
      arrayToControllerM: n("arrayToControllerM"),
      controllerToBatteryM: n("controllerToBatteryM"),
      batteryToInverterM: n("batteryToInverterM"),
      lossesPct: { soiling: n("soiling"), mismatch: n("mismatch"), wiring: n("wiring") },
      modulesInSeries: n("modulesInSeries"),
      stringsInParallel: n("stringsInParallel"),
      batteryStrings: n("batteryStrings"),
      acceptableUnmetDaysPerYear: n("acceptableUnmetDaysPerYear"),
      maxArrayAreaM2: n("maxArrayAreaM2"),
    },
  };
}

/** Where a field's server message lives ("design.lossesPct.soiling" for the soiling cell). */
export function errorPathFor(field: NumberField) {
  return ["soiling", "mismatch", "wiring"].includes(field) ? `design.lossesPct.${field}` : `design.${field}`;
}
