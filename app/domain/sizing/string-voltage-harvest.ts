// How much of the yield engine's energy a string can pass to the battery when its voltage falls short.
// The engine (moduleYieldFromProfile) credits an MPPT controller with each module's maximum power,
// whatever the string length, and a PWM controller with the string that matches the battery. A string
// whose hot-afternoon Vmp is below what the controller needs cannot charge at its maximum power point,
// so the plan scales each month's energy by a factor from the month's own hot afternoon: the month's
// mean daily maximum air temperature (capped at the site's hottest) plus the NOCT rise at full sun,
// the same cell model as the hot-afternoon check (string-voltage.ts).
import { pwmModulesInSeries } from "../solar/controller";
import type { LayoutContext } from "./string-layout";
import { neededStringVoltageV } from "./string-layout";
import { hotCellTemperatureC, vmpAtCellTemperatureV, vocAtTemperatureV } from "./string-voltage";

/**
 * Factors by string length: `factorsFor(ns)` gives the twelve monthly factors (0–1) for a string of ns
 * modules, or null when every month gets the engine's full figure.
 *
 * MPPT: a buck tracker cannot pull the string below the voltage it needs to charge, so a string whose
 * hot-afternoon Vmp is lower works above its maximum power point: see mpptShortStringFactor (hot
 * afternoons stand for the whole month: the safe side).
 *
 * PWM: the engine already holds the matching string at the battery's voltage hour by hour (factor 1).
 * A string of another length (a forced layout): no energy in a month whose hot-afternoon string Voc
 * cannot reach the voltage needed to charge; a longer string than the match adds only voltage the switch
 * throws away, so each module gives matching ÷ ns of the engine's figure. Kitwright's own simplification,
 * no source.
 */
export function voltageFactorsBySeries(ctx: LayoutContext, monthTMaxC: readonly number[], hottestAirC: number): (modulesInSeries: number) => number[] | null {
  const neededV = neededStringVoltageV(ctx);
  const hotCellC = monthTMaxC.map((t) => hotCellTemperatureC(Math.min(t, hottestAirC), ctx.module.noctC));
  if (ctx.controller.kind === "mppt") {
    const moduleVmpV = hotCellC.map((c) => vmpAtCellTemperatureV(ctx.module, c));
    const moduleVocV = hotCellC.map((c) => vocAtTemperatureV(ctx.module, c));
    return (ns) => {
      const factors = moduleVmpV.map((vmp, i) => mpptShortStringFactor(ns * vmp, ns * moduleVocV[i], neededV));
      return factors.every((f) => f >= 1) ? null : factors;
    };
  }
  const matching = pwmModulesInSeries(ctx.systemVoltageV, ctx.module.vmpV);
  const moduleVocV = hotCellC.map((c) => vocAtTemperatureV(ctx.module, c));
  return (ns) => {
    if (ns === matching) return null;
    const factors = moduleVocV.map((v) => (ns * v < neededV ? 0 : Math.min(1, matching / ns)));
    return factors.every((f) => f >= 1) ? null : factors;
  };
}

/**
 * The share of its maximum power a string gives when the tracker must hold it at `neededV` (volts of
 * the whole string, at the hot afternoon's cell temperature): 1 when its Vmp reaches neededV, 0 when
 * even its Voc does not, and between them the power on a straight line of current from Imp at Vmp to
 * zero at Voc: P/Pmp = (V/Vmp)·(Voc − V)/(Voc − Vmp) at V = neededV. Kitwright's own simplification, no
 * source: above the maximum power point the real I–V curve bows outward (it is concave), so the
 * straight line gives less current than the module would — the safe side.
 */
export function mpptShortStringFactor(stringVmpV: number, stringVocV: number, neededV: number): number {
  if (stringVmpV >= neededV) return 1;
  if (stringVocV <= neededV) return 0;
  return ((neededV / stringVmpV) * (stringVocV - neededV)) / (stringVocV - stringVmpV);
}
