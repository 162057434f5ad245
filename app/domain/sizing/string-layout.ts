// Series × parallel arrangements of the modules on the charge controller.
// MPPT: modules in series Ns such that the string's cold-morning Voc stays below the controller's
// maximum input voltage and its hot-afternoon Vmp stays above the battery's charging voltage plus a
// headroom the tracker needs; strings in parallel Np = ⌈modules needed / Ns⌉.
// PWM: the string must match the battery (the yield engine's pwmModulesInSeries: "12 V class"
// modules, Vmp ≈ 18 V, one per 12 V nominal).
import { PWM_SWITCH_AND_CABLE_DROP_V, pwmModulesInSeries } from "../solar/controller";
import { PV_MAX_CURRENT_FACTOR } from "./fuses";
import type { ControllerPart, ModulePart, SystemVoltage } from "./parts";
import { nec6907aFactor, vmpAtCellTemperatureV, vocAtTemperatureV } from "./string-voltage";

/**
 * Voltage an MPPT string's Vmp must keep above the battery's charging voltage, V. Common practice, no
 * source: many trackers want the array a few volts above the battery to charge at all; check the
 * controller's manual.
 */
export const DEFAULT_MPPT_HEADROOM_V = 5;
/** Longest string considered when listing layouts. */
export const MAX_MODULES_IN_SERIES = 40;

export interface LayoutContext {
  module: ModulePart;
  controller: ControllerPart;
  systemVoltageV: SystemVoltage;
  /** Highest charging voltage of the bank (chemistry per 12 V × system voltage / 12), V. */
  chargeVoltageV: number;
  coldestAirC: number;
  hotCellC: number;
  mpptHeadroomV: number;
  /** Module power used for current and power ratings (the larger of nameplate and verified), W. */
  ratingPowerW: number;
}

export interface StringLayout {
  modulesInSeries: number;
  stringsInParallel: number;
}

export interface LayoutEvaluation extends StringLayout {
  moduleCount: number;
  stringVocColdV: number;
  /** String Voc by NEC Table 690.7(A) (null below −40 °C). */
  stringVocNecTableV: number | null;
  stringVmpHotV: number;
  /** Vmp the string must keep: MPPT charging voltage + headroom; PWM charging voltage + switch drop. */
  stringVmpNeededV: number;
  arrayStcPowerW: number;
  /** 1.25 × Isc × strings (NEC 690.8(A)(1)), A. */
  arrayMaxCurrentA: number;
  /** Current the controller must deliver to the battery at the array's STC power (MPPT) or pass through (PWM), A. */
  controllerOutputCurrentA: number;
  vocOk: boolean;
  vmpOk: boolean;
  /**
   * Hot-afternoon voltage verdict. MPPT: fail below the needed Vmp. PWM: the module is pulled along its
   * curve to the battery's voltage, so a low Vmp only trims the harvest (warn, already in the energy
   * figures) unless even the hot Voc cannot reach the charging voltage (fail).
   */
  vmpStatus: "pass" | "warn" | "fail";
  /** Controller current within its rating (for MPPT with the 1.25 margin: "warn" between 1.0 and 1.25). */
  currentStatus: "pass" | "warn" | "fail";
  /** Array STC power within the controller's rated PV power for this battery voltage (MPPT; always true for PWM). */
  powerOk: boolean;
  /** PWM only: the string length the battery needs. */
  matchesPwm: boolean;
  valid: boolean;
  /** Short reasons a layout is not valid, in plain words. */
  problems: string[];
}

/** Vmp a string must keep to charge: MPPT charging voltage + headroom; PWM charging voltage + switch drop, V. */
export function neededStringVoltageV(ctx: Pick<LayoutContext, "controller" | "chargeVoltageV" | "mpptHeadroomV">): number {
  return ctx.controller.kind === "mppt" ? ctx.chargeVoltageV + ctx.mpptHeadroomV : ctx.chargeVoltageV + PWM_SWITCH_AND_CABLE_DROP_V;
}

export function evaluateLayout(layout: StringLayout, ctx: LayoutContext): LayoutEvaluation {
  const { module, controller, systemVoltageV } = ctx;
  const { modulesInSeries: ns, stringsInParallel: np } = layout;
  const stringVocColdV = ns * vocAtTemperatureV(module, ctx.coldestAirC);
  const necFactor = nec6907aFactor(ctx.coldestAirC);
  const stringVmpHotV = ns * vmpAtCellTemperatureV(module, ctx.hotCellC);
  const isMppt = controller.kind === "mppt";
  const stringVmpNeededV = neededStringVoltageV(ctx);
  const arrayStcPowerW = ns * np * ctx.ratingPowerW;
  const arrayMaxCurrentA = PV_MAX_CURRENT_FACTOR * np * module.iscA * Math.max(1, ctx.ratingPowerW / module.pmaxW);
  const controllerOutputCurrentA = isMppt ? (arrayStcPowerW * controller.efficiencyPct) / 100 / systemVoltageV : arrayMaxCurrentA;
  const ratedPowerW = controller.maxPvPowerW[String(systemVoltageV)];

  const vocOk = stringVocColdV <= controller.maxPvVocV;
  const vmpOk = stringVmpHotV >= stringVmpNeededV;
  const hotVocReaches = ns * vocAtTemperatureV(module, ctx.hotCellC) > stringVmpNeededV;
  const vmpStatus = vmpOk ? "pass" : !isMppt && hotVocReaches ? "warn" : "fail";
  let currentStatus: "pass" | "warn" | "fail";
  if (isMppt) {
    // The tracker limits its own output: above the rating it clips (fail), within 25 % of it it clips on
    // cold bright days when the array beats its STC power (warn; common practice, no source).
    currentStatus =
      controllerOutputCurrentA > controller.maxChargeCurrentA
        ? "fail"
        : PV_MAX_CURRENT_FACTOR * controllerOutputCurrentA > controller.maxChargeCurrentA
          ? "warn"
          : "pass";
  } else {
    currentStatus = controllerOutputCurrentA > controller.maxChargeCurrentA ? "fail" : "pass";
  }
  const powerOk = !isMppt || (ratedPowerW !== undefined && arrayStcPowerW <= ratedPowerW);
  const matchesPwm = isMppt || ns === pwmModulesInSeries(systemVoltageV, module.vmpV);

  const problems: string[] = [];
  if (!vocOk) problems.push(`cold-morning string voltage ${stringVocColdV.toFixed(1)} V is above the controller's ${controller.maxPvVocV} V`);
  if (vmpStatus === "fail")
    problems.push(`hot-afternoon string voltage ${stringVmpHotV.toFixed(1)} V is below the ${stringVmpNeededV.toFixed(1)} V needed to charge`);
  if (!matchesPwm) problems.push(`a PWM controller on ${systemVoltageV} V needs ${pwmModulesInSeries(systemVoltageV, module.vmpV)} of these modules in series`);
  if (currentStatus === "fail") problems.push(`${controllerOutputCurrentA.toFixed(1)} A is more than the controller's ${controller.maxChargeCurrentA} A`);
  if (!powerOk) {
    problems.push(
      ratedPowerW === undefined
        ? `the controller has no PV power rating for ${systemVoltageV} V batteries`
        : `${arrayStcPowerW.toFixed(0)} W of modules is more than the controller's rated ${ratedPowerW} W at ${systemVoltageV} V`,
    );
  }
  return {
    modulesInSeries: ns,
    stringsInParallel: np,
    moduleCount: ns * np,
    stringVocColdV,
    stringVocNecTableV: necFactor === null ? null : ns * module.vocV * necFactor,
    stringVmpHotV,
    stringVmpNeededV,
    arrayStcPowerW,
    arrayMaxCurrentA,
    controllerOutputCurrentA,
    vocOk,
    vmpOk,
    vmpStatus,
    currentStatus,
    powerOk,
    matchesPwm,
    valid: problems.length === 0,
    problems,
  };
}

/**
 * Every string length the controller allows voltage-wise (MPPT: 1…the longest under its Voc limit;
 * PWM: the one that matches the battery), each with enough strings for `modulesNeeded` — a number, or
 * per string length when a short string's low voltage cuts each module's energy (kit-plan.ts).
 */
export function listLayouts(modulesNeeded: number | ((modulesInSeries: number) => number), ctx: LayoutContext): LayoutEvaluation[] {
  const neededFor = (ns: number) => Math.max(1, Math.ceil((typeof modulesNeeded === "number" ? modulesNeeded : modulesNeeded(ns)) - 1e-9));
  if (ctx.controller.kind === "pwm") {
    const ns = pwmModulesInSeries(ctx.systemVoltageV, ctx.module.vmpV);
    return [evaluateLayout({ modulesInSeries: ns, stringsInParallel: Math.ceil(neededFor(ns) / ns) }, ctx)];
  }
  const vocColdModuleV = vocAtTemperatureV(ctx.module, ctx.coldestAirC);
  const longest = Math.min(MAX_MODULES_IN_SERIES, Math.max(1, Math.floor(ctx.controller.maxPvVocV / vocColdModuleV)));
  const layouts: LayoutEvaluation[] = [];
  for (let ns = 1; ns <= longest; ns++) layouts.push(evaluateLayout({ modulesInSeries: ns, stringsInParallel: Math.ceil(neededFor(ns) / ns) }, ctx));
  return layouts;
}

/**
 * The layout to use: the caller's forced one if given; else the valid layout with the fewest modules,
 * then the fewest strings (fewer string fuses and combiner parts). When none is valid the plan still
 * shows its failures, choosing in this order: safe on the cold-morning voltage and able to charge on a
 * hot afternoon (it only clips at the controller's current or power limit, which loses energy but can
 * charge); else safe on voltage (it charges poorly, see kit-plan.ts); else the shortest string.
 */
export function chooseLayout(layouts: readonly LayoutEvaluation[], ctx: LayoutContext, forced?: StringLayout): LayoutEvaluation {
  if (forced) return evaluateLayout(forced, ctx);
  const byModulesThenStrings = (a: LayoutEvaluation, b: LayoutEvaluation) => a.moduleCount - b.moduleCount || a.stringsInParallel - b.stringsInParallel;
  const tiers = [(l: LayoutEvaluation) => l.valid, (l: LayoutEvaluation) => l.vocOk && l.vmpStatus !== "fail", (l: LayoutEvaluation) => l.vocOk];
  for (const inTier of tiers) {
    const found = layouts.filter(inTier).sort(byModulesThenStrings);
    if (found.length > 0) return found[0];
  }
  return layouts[0] ?? evaluateLayout({ modulesInSeries: 1, stringsInParallel: 1 }, ctx);
}
