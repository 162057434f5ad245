// Checks on the array: cold-morning string voltage, hot-afternoon string voltage, the PWM match and
// whether the chosen array covers the load every month.
import { pwmModulesInSeries, PWM_MODULE_VMP_PER_12V_NOMINAL } from "../solar/controller";
import type { PlanCheck } from "./checks";
import { figure } from "./checks";
import { fmt, MONTH_NAMES } from "./format";
import type { ArrayPlan } from "./plan-types";
import type { ControllerPart, ModulePart, SystemVoltage } from "./parts";
import { nec6907aFactor, vmpAtCellTemperatureV, vocAtTemperatureV } from "./string-voltage";

export function vocColdCheck(array: ArrayPlan, module: ModulePart, controller: ControllerPart): PlanCheck {
  const { layout, coldestAirC } = array;
  const moduleVocColdV = vocAtTemperatureV(module, coldestAirC);
  const necFactor = nec6907aFactor(coldestAirC);
  const longestSafe = Math.floor(controller.maxPvVocV / moduleVocColdV);
  const tableText =
    layout.stringVocNecTableV === null
      ? "NEC Table 690.7(A) does not reach this cold; the coefficient alone was used"
      : `NEC Table 690.7(A) gives ${fmt(layout.stringVocNecTableV)} V`;
  let status: PlanCheck["status"] = "pass";
  let sentence = `On the coldest morning (${fmt(coldestAirC, 0)} °C) a string of ${layout.modulesInSeries} module(s) can reach ${fmt(layout.stringVocColdV)} V open-circuit, below the controller's ${controller.maxPvVocV} V limit (${tableText}).`;
  if (!layout.vocOk) {
    status = "fail";
    sentence =
      `On the coldest morning (${fmt(coldestAirC, 0)} °C) a string of ${layout.modulesInSeries} module(s) can reach ${fmt(layout.stringVocColdV)} V open-circuit, ` +
      `above the controller's ${controller.maxPvVocV} V limit: this can destroy the controller. ` +
      (longestSafe >= 1 ? `Put at most ${longestSafe} in series.` : "Even one module is too much for this controller: choose another.");
  } else if (layout.stringVocNecTableV !== null && layout.stringVocNecTableV > controller.maxPvVocV) {
    status = "warn";
    sentence =
      `With the datasheet coefficient the string reaches ${fmt(layout.stringVocColdV)} V on the coldest morning, within the ${controller.maxPvVocV} V limit, ` +
      `but NEC Table 690.7(A) gives ${fmt(layout.stringVocNecTableV)} V, above it. Where the local code uses the table, shorten the string.`;
  }
  return {
    id: "array.voc-cold",
    kind: "safety",
    status,
    title: "String voltage on the coldest morning",
    sentence,
    figures: [
      figure("Module Voc at STC", module.vocV, "V"),
      figure("Voc temperature coefficient", module.betaVocPctPerC, "%/°C"),
      figure("Coldest expected temperature", coldestAirC, "°C"),
      figure("Module Voc at that temperature", moduleVocColdV, "V"),
      figure("Modules in series", layout.modulesInSeries, ""),
      figure("String Voc, coefficient", layout.stringVocColdV, "V"),
      ...(necFactor === null ? [] : [figure("NEC 690.7(A) factor", necFactor, ""), figure("String Voc, NEC table", layout.stringVocNecTableV ?? 0, "V")]),
      figure("Controller maximum PV voltage", controller.maxPvVocV, "V"),
    ],
    basis: "Voc × (1 + βVoc × (Tmin − 25 °C)) with the datasheet coefficient; NEC Table 690.7(A) as a cross-check (from memory).",
  };
}

export function vmpHotCheck(array: ArrayPlan, module: ModulePart, controller: ControllerPart, systemVoltageV: SystemVoltage): PlanCheck {
  const { layout, hotCellC, chargeVoltageV } = array;
  const moduleVmpHotV = vmpAtCellTemperatureV(module, hotCellC);
  const shortest = Math.ceil(layout.stringVmpNeededV / moduleVmpHotV);
  const isMppt = controller.kind === "mppt";
  const need = isMppt
    ? `the battery's ${fmt(chargeVoltageV)} V charging voltage plus the tracker's headroom`
    : `the battery's ${fmt(chargeVoltageV)} V charging voltage plus the PWM switch and cable drop`;
  const hot = `On a hot afternoon (cells at ${fmt(hotCellC, 0)} °C) the string`;
  let sentence = `${hot} still gives ${fmt(layout.stringVmpHotV)} V at maximum power, above the ${fmt(layout.stringVmpNeededV)} V needed (${need}).`;
  if (layout.vmpStatus === "warn") {
    sentence =
      `${hot} gives ${fmt(layout.stringVmpHotV)} V at maximum power, below the ${fmt(layout.stringVmpNeededV)} V needed (${need}): ` +
      "the PWM controller holds it at the battery's voltage, above its maximum power point, so it still charges but with less current on hot days (counted in the energy figures).";
  } else if (layout.vmpStatus === "fail") {
    sentence =
      `${hot} drops to ${fmt(layout.stringVmpHotV)} V at maximum power, below the ${fmt(layout.stringVmpNeededV)} V needed (${need}): ` +
      (isMppt
        ? `the ${systemVoltageV} V battery will not charge fully. Put at least ${shortest} in series.`
        : "the battery will not charge on hot days. Choose modules of a higher voltage.") +
      (array.months.some((m) => (m.voltageFactor ?? 1) < 1) ? " The energy figures and the simulated year count the lost energy (see the assumptions)." : "");
  }
  return {
    id: "array.vmp-hot",
    kind: "performance",
    status: layout.vmpStatus,
    title: "String voltage on a hot afternoon",
    sentence,
    figures: [
      figure("Module Vmp at STC", module.vmpV, "V"),
      figure("Hottest cell temperature", hotCellC, "°C"),
      figure("Module Vmp at that temperature", moduleVmpHotV, "V"),
      figure("Modules in series", layout.modulesInSeries, ""),
      figure("String Vmp, hot", layout.stringVmpHotV, "V"),
      figure("Battery charging voltage", chargeVoltageV, "V"),
      figure("Voltage needed", layout.stringVmpNeededV, "V"),
    ],
    basis: isMppt
      ? "Vmp shifted with the datasheet coefficients (as the yield engine does); charging voltage per chemistry and a 5 V tracker headroom by default (common practice, no source)."
      : "PWM holds the modules at the battery's voltage (common practice, no source).",
  };
}

/** PWM only: the string matches the battery, and the modules are of a voltage class a PWM controller can use. */
export function pwmMatchCheck(array: ArrayPlan, module: ModulePart, systemVoltageV: SystemVoltage): PlanCheck {
  const matching = pwmModulesInSeries(systemVoltageV, module.vmpV);
  const moduleNominalV = (12 * module.vmpV) / PWM_MODULE_VMP_PER_12V_NOMINAL;
  const mismatch = Math.abs(systemVoltageV / moduleNominalV - matching);
  let status: PlanCheck["status"] = "pass";
  let sentence = `${matching} module(s) in series suit a ${systemVoltageV} V battery on a PWM controller.`;
  if (array.layout.modulesInSeries !== matching) {
    status = "fail";
    sentence =
      `A PWM controller ties the modules to the battery: a ${systemVoltageV} V battery needs ${matching} of these in series, not ${array.layout.modulesInSeries}. ` +
      (array.months.some((m) => (m.voltageFactor ?? 1) < 1)
        ? "The energy figures count only what this string can deliver (see the assumptions)."
        : `The energy figures assume ${matching}.`);
  } else if (mismatch > 0.25) {
    status = "warn";
    sentence = `These modules (Vmp ${fmt(module.vmpV)} V) do not suit a ${systemVoltageV} V battery on a PWM controller: it holds them near the battery's voltage and much of their power is lost (see the energy figures). An MPPT controller would harvest it.`;
  }
  return {
    id: "array.pwm-match",
    kind: "performance",
    status,
    title: "Modules matched to the battery (PWM)",
    sentence,
    figures: [
      figure("Module Vmp at STC", module.vmpV, "V"),
      figure("Modules in series needed", matching, ""),
      figure("Modules in series chosen", array.layout.modulesInSeries, ""),
    ],
    basis: 'A "12 V class" module has Vmp near 18 V, one per 12 V of battery (common practice, no source).',
  };
}

export function arrayEnergyCheck(array: ArrayPlan, designMarginPct: number): PlanCheck {
  const lit = array.months.filter((m) => m.loadWhPerDay > 0 && m.coverage !== null);
  const worst = lit.reduce<(typeof lit)[number] | null>((w, m) => (w === null || (m.coverage ?? 0) < (w.coverage ?? 0) ? m : w), null);
  const moduleCount = array.layout.moduleCount;
  if (!worst) {
    return {
      id: "array.energy",
      kind: "performance",
      status: "pass",
      title: "Energy every month",
      sentence: "There is no load in any month with sun to size against.",
      figures: [figure("Modules", moduleCount, "")],
      basis: "Worst-month sizing.",
    };
  }
  const coverage = worst.coverage ?? 0;
  const loadOnly = coverage * (1 + designMarginPct / 100);
  const month = MONTH_NAMES[worst.month - 1];
  let status: PlanCheck["status"] = "pass";
  let sentence = `${moduleCount} modules cover the load with the ${fmt(designMarginPct, 0)} % margin in every month; ${month} is the tightest.`;
  if (coverage < 1 - 1e-9) {
    const short = `${Math.ceil(array.modulesRequired)} are needed`;
    if (loadOnly >= 1) {
      status = "warn";
      sentence = `${moduleCount} modules cover the load in ${month} but not the ${fmt(designMarginPct, 0)} % margin (${short}).`;
    } else {
      status = "fail";
      sentence = `${moduleCount} modules deliver only ${fmt(100 * loadOnly, 0)} % of what the load takes from the battery in ${month} (${short}).`;
    }
  }
  return {
    id: "array.energy",
    kind: "performance",
    status,
    title: "Energy every month",
    sentence,
    figures: [
      figure("Modules", moduleCount, ""),
      figure("Modules required", array.modulesRequired, ""),
      figure(`Array energy in ${month}`, worst.arrayWhPerDay, "Wh/day"),
      figure(`Needed in ${month} (with margin)`, worst.requiredArrayWhPerDay, "Wh/day"),
    ],
    basis: "Worst-month sizing: load ÷ battery round-trip efficiency × (1 + design margin) ÷ energy per module (yield engine).",
  };
}

/** Months with load but no sun on the array (polar night or a fully dark month). */
export function darkMonthsCheck(array: ArrayPlan): PlanCheck | null {
  // A month with no energy only because the string's voltage cannot reach the battery is left to the
  // string checks (hot-afternoon voltage, PWM match), which say why and what to change.
  const dark = array.months.filter((m) => m.loadWhPerDay > 0 && m.modulesNeeded === null && m.voltageFactor !== 0).map((m) => MONTH_NAMES[m.month - 1]);
  if (dark.length === 0) return null;
  return {
    id: "array.dark-months",
    kind: "performance",
    status: "fail",
    title: "Months without sun",
    sentence: `No usable sun reaches the array in ${dark.join(", ")}, yet there is load: no number of modules covers it. Another source (a generator, wind) is needed, or no load in those months.`,
    figures: [figure("Dark months with load", dark.length, "")],
    basis: "Yield engine: no energy on the average day of those months.",
  };
}
