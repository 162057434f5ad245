// Every check of a kit plan, in the order a reader goes through the kit: controller and array (its
// area when the site sets a limit), battery, inverter, protection and cables, then the simulated year.
import type { LoadSummary } from "../load/load-sheet-types";
import { arrayAreaCheck } from "./area-check";
import { arrayEnergyCheck, darkMonthsCheck, pwmMatchCheck, vmpHotCheck, vocColdCheck } from "./array-checks";
import type { BatteryBankSizing } from "./battery-bank";
import {
  batteryArrangementCheck,
  batteryCapacityCheck,
  batteryColdCheck,
  chargeRateCheck,
  depthOfDischargeCheck,
  dischargeRateCheck,
  parallelStringsCheck,
} from "./battery-checks";
import { cableChecks, stringFuseCheck } from "./cable-checks";
import type { CableRunSizing } from "./cables";
import type { PlanCheck } from "./checks";
import { controllerCurrentCheck, controllerPowerCheck, controllerVoltageCheck } from "./controller-checks";
import { DEFAULT_INVERTER_MARGIN_PCT, inverterChecks } from "./inverter-checks";
import type { ArrayPlan, KitPlanInput } from "./plan-types";
import { simulationCheck } from "./simulation-check";
import type { YearSimulation } from "./year-simulation";

export interface PlanCheckContext {
  input: KitPlanInput;
  load: LoadSummary;
  array: ArrayPlan;
  bank: BatteryBankSizing;
  /** Coldest temperature the battery may be charged at, °C. */
  coldestBatteryC: number;
  simulation: YearSimulation;
  cables: readonly CableRunSizing[];
}

export function collectPlanChecks(ctx: PlanCheckContext): PlanCheck[] {
  const { input, load, array, bank } = ctx;
  const { systemVoltageV, design } = input;
  const { module, controller, battery, inverter } = input.parts;
  const { layout } = array;
  const inverterEfficiency = inverter ? inverter.efficiencyPct / 100 : 1;
  // Heaviest draw: every load at once, AC through the inverter.
  const peakDischargeA = (load.peakAcW / inverterEfficiency + load.peakDcW) / systemVoltageV;
  const chargeCurrentA = Math.min(
    controller.kind === "mppt" ? layout.controllerOutputCurrentA : layout.stringsInParallel * module.impA,
    controller.maxChargeCurrentA,
  );
  const dark = darkMonthsCheck(array);
  const area = arrayAreaCheck(module, layout.moduleCount, design.maxArrayAreaM2);
  return [
    controllerVoltageCheck(controller, systemVoltageV),
    vocColdCheck(array, module, controller),
    vmpHotCheck(array, module, controller, systemVoltageV),
    ...(controller.kind === "pwm" ? [pwmMatchCheck(array, module, systemVoltageV)] : []),
    controllerCurrentCheck(controller, layout, systemVoltageV),
    ...(controller.kind === "mppt" ? [controllerPowerCheck(controller, layout, systemVoltageV)] : []),
    arrayEnergyCheck(array, design.designMarginPct),
    ...(dark ? [dark] : []),
    ...(area ? [area] : []),
    batteryArrangementCheck(bank, battery, systemVoltageV),
    batteryCapacityCheck(bank, design.autonomyDays, load.maxDailyWh),
    depthOfDischargeCheck(battery, design.maxDepthOfDischargePct),
    parallelStringsCheck(bank, battery),
    batteryColdCheck(battery, bank, ctx.coldestBatteryC),
    dischargeRateCheck(battery, bank, peakDischargeA),
    chargeRateCheck(battery, bank, chargeCurrentA),
    ...inverterChecks(inverter, load, systemVoltageV, design.inverterMarginPct ?? DEFAULT_INVERTER_MARGIN_PCT),
    stringFuseCheck(module, layout),
    ...ctx.cables.flatMap(cableChecks),
    simulationCheck(ctx.simulation, design.acceptableUnmetDaysPerYear ?? 0),
  ];
}
