// Turns the installer's choices into the sizing domain's KitPlanInput, copying every figure from the
// team's site and load sheet and from the catalogue: this copy is the snapshot a saved plan keeps.
import { findLoadSheet } from "../load-sheets.server";
import { findSite, siteToForm } from "../sites.server";
import { findBatteryPart, findControllerPart, findInverterPart, findModulePart } from "./catalogue-parts.server";
import type { KitPlanInput } from "~/domain/sizing/plan-types";
import type { PlanChoices } from "~/lib/plan-choices";
import { toEngineSite } from "~/lib/site-forms";

import type { PlanSources } from "~/lib/plan-choices";
export type { PlanSources };

export type PlanInputsOutcome = { ok: true; input: KitPlanInput; sources: PlanSources } | { ok: false; fields: Record<string, string> };

export async function buildPlanInput(teamId: string, choices: PlanChoices): Promise<PlanInputsOutcome> {
  const [site, sheet, module, controller, battery, inverter] = await Promise.all([
    findSite(teamId, choices.siteId),
    findLoadSheet(teamId, choices.loadSheetId),
    findModulePart(choices.moduleId),
    findControllerPart(choices.controllerId),
    findBatteryPart(choices.batteryId),
    choices.inverterId ? findInverterPart(choices.inverterId) : Promise.resolve(null),
  ]);
  const fields: Record<string, string> = {};
  if (!site) fields.siteId = "No such site in your team.";
  if (!sheet || (site && sheet.site_id !== site.id)) fields.loadSheetId = "Choose a load sheet of this site.";
  if (!module) fields.moduleId = "No such module in the catalogue.";
  if (!controller) fields.controllerId = "No such charge controller in the catalogue.";
  if (!battery) fields.batteryId = "No such battery in the catalogue.";
  if (choices.inverterId && !inverter) fields.inverterId = "No such inverter in the catalogue.";
  if (!site || !sheet || !module || !controller || !battery || Object.keys(fields).length) return { ok: false, fields };

  const form = siteToForm(site);
  const d = choices.design;
  const input: KitPlanInput = {
    site: {
      ...toEngineSite(form),
      coldestTempC: form.coldestTempC,
      // Only when set: a snapshot without it plans on the hottest month's mean daily maximum, as before.
      ...(form.hottestTempC !== undefined ? { hottestTempC: form.hottestTempC } : {}),
      shadingDeratePct: form.shadingDeratePct,
    },
    appliances: sheet.appliances,
    systemVoltageV: choices.systemVoltageV,
    parts: { module: module.part, controller: controller.part, battery: battery.part, inverter: inverter?.part ?? null },
    design: {
      autonomyDays: d.autonomyDays,
      maxDepthOfDischargePct: d.maxDepthOfDischargePct,
      designMarginPct: d.designMarginPct,
      powerBasis: d.powerBasis,
      voltageDropTargetPct: d.voltageDropTargetPct,
      conductorSystem: d.conductorSystem,
      cableRuns: {
        arrayToController: { oneWayLengthM: d.arrayToControllerM },
        controllerToBattery: { oneWayLengthM: d.controllerToBatteryM },
        ...(inverter ? { batteryToInverter: { oneWayLengthM: d.batteryToInverterM } } : {}),
      },
      lossesPct: d.lossesPct,
      forcedLayout: d.modulesInSeries && d.stringsInParallel ? { modulesInSeries: d.modulesInSeries, stringsInParallel: d.stringsInParallel } : undefined,
      forcedBatteryStrings: d.batteryStrings,
      acceptableUnmetDaysPerYear: d.acceptableUnmetDaysPerYear,
      maxArrayAreaM2: d.maxArrayAreaM2,
      simulation: d.simulationSeed !== undefined ? { seed: d.simulationSeed } : undefined,
    },
  };
  return {
    ok: true,
    input,
    sources: {
      siteName: site.name,
      loadSheetName: sheet.name,
      parts: { module: module.label, controller: controller.label, battery: battery.label, inverter: inverter?.label ?? null },
    },
  };
}
