// What a charge controller harvests from one module.
// MPPT: the module's maximum power times the controller's efficiency.
// PWM: the switch ties the module to the battery, so the module runs at the battery's charging
// voltage (plus the switch and cable drop) and delivers the current of its I–V curve there
// (common practice, no source; current from the explicit I–V approximation in iv-model.ts).
import { currentAtVoltageA, explicitIvModel, maximumPowerExponent, modelMaximumPowerW, translateKeyPoints } from "./iv-model";
import type { IvKeyPoints, TemperatureCoefficients } from "./iv-model";

/** Mean battery voltage while charging, per 12 V nominal, between bulk (~13.5 V) and absorption (~14.4 V). */
export const PWM_CHARGING_VOLTS_PER_12V_NOMINAL = 14.0;
/** Drop across the PWM switch and the array cable at charging current, whole string. */
export const PWM_SWITCH_AND_CABLE_DROP_V = 0.5;
/** A "12 V class" module has Vmp near 18 V (36 cells) — used to pick the PWM string length. */
export const PWM_MODULE_VMP_PER_12V_NOMINAL = 18;

export type ControllerKind = "mppt" | "pwm";

export interface ControllerSpec {
  kind: ControllerKind;
  /** Nominal battery voltage: 12, 24, 48… */
  batteryVoltageV: number;
  efficiencyPct: number;
}

/** Modules in series on a PWM controller: the nearest whole number of "12 V class" modules, at least 1. */
export function pwmModulesInSeries(batteryVoltageV: number, moduleVmpV: number): number {
  const moduleNominalV = (12 * moduleVmpV) / PWM_MODULE_VMP_PER_12V_NOMINAL;
  return Math.max(1, Math.round(batteryVoltageV / moduleNominalV));
}

/** Terminal voltage of each module of a PWM string while charging. */
export function pwmModuleVoltageV(batteryVoltageV: number, modulesInSeries: number): number {
  const stringV = (batteryVoltageV / 12) * PWM_CHARGING_VOLTS_PER_12V_NOMINAL + PWM_SWITCH_AND_CABLE_DROP_V;
  return stringV / modulesInSeries;
}

/**
 * PWM power as a fraction of the maximum power of the same (temperature-corrected) curve, when
 * the module is held at operatingVoltageV. Currents scale with G on both sides, so G cancels.
 */
export function pwmPowerFraction(stc: IvKeyPoints, coefficients: TemperatureCoefficients, cellTemperatureC: number, operatingVoltageV: number): number {
  const points = translateKeyPoints(stc, coefficients, 1000, cellTemperatureC);
  if (operatingVoltageV >= points.vocV) return 0;
  const model = explicitIvModel(points);
  return Math.min(1, (operatingVoltageV * currentAtVoltageA(model, operatingVoltageV)) / modelMaximumPowerW(model).pmaxW);
}

/**
 * Allocation-free form of pwmPowerFraction for the yield loop (same algebra as
 * translateKeyPoints + explicitIvModel + modelMaximumPowerW, inlined; a unit test holds them together).
 */
export function createPwmFractionAtTemperature(
  stc: IvKeyPoints,
  coefficients: TemperatureCoefficients,
  operatingVoltageV: number,
): (cellTemperatureC: number) => number {
  const currentRatio = stc.impA / stc.iscA;
  const oneMinusRatio = 1 - currentRatio;
  const logOneMinusRatio = Math.log(oneMinusRatio);
  const { alphaIscPerC, betaVocPerC, gammaPmaxPerC } = coefficients;
  return function fractionAt(cellTemperatureC: number): number {
    const deltaTC = cellTemperatureC - 25;
    const vocV = stc.vocV * (1 + betaVocPerC * deltaTC);
    if (operatingVoltageV >= vocV) return 0;
    const vmpV = Math.min((stc.vmpV * (1 + gammaPmaxPerC * deltaTC)) / (1 + alphaIscPerC * deltaTC), 0.98 * vocV);
    const voltageScaleV = ((vmpV / vocV - 1) / logOneMinusRatio) * vocV; // C2·Voc
    const c1 = oneMinusRatio * Math.exp(-vmpV / voltageScaleV);
    const relativeCurrent = Math.max(0, 1 - c1 * (Math.exp(operatingVoltageV / voltageScaleV) - 1));
    const x = maximumPowerExponent(c1);
    const relativePmax = (x * voltageScaleV * (1 + c1) * x) / (1 + x);
    return Math.min(1, (operatingVoltageV * relativeCurrent) / relativePmax);
  };
}
