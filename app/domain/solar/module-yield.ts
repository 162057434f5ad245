// Energy per module per month from a prepared site profile: cell temperature at each step,
// power at the maximum power point, controller behaviour, then itemized losses.
import { FAIMAN_U0_W_M2K, FAIMAN_U1_WS_M3K, NOCT_AIR_TEMPERATURE_C, NOCT_IRRADIANCE_WM2 } from "./cell-temperature";
import { pwmModuleVoltageV, pwmModulesInSeries } from "./controller";
import { pwmFractionFromTable, tabulatePwmFraction } from "./pwm-fraction-table";
import type { ControllerSpec } from "./controller";
import { applyLosses } from "./losses";
import type { LossesPct } from "./losses";
import type { SiteProfile } from "./site-profile";
import { describeAssumptions } from "./yield-assumptions";
import type { ModuleSpec, MonthlyYield, YieldResult } from "./yield-types";

/** Days per month of a non-leap year, for the annual total. */
export const DAYS_IN_MONTH: readonly number[] = [31, 28, 31, 30, 31, 30, 31, 31, 30, 31, 30, 31];

/**
 * Both cell-temperature models are linear in G: Tc = Ta + k·G, with k = (NOCT − 20)/800 for the
 * NOCT model and k = 1/(U0 + U1·ws) for Faiman (2008).
 */
export function cellTemperatureRiseCPerWm2(profile: SiteProfile, module: ModuleSpec): number {
  if (profile.cellTempModel === "faiman") return 1 / (FAIMAN_U0_W_M2K + FAIMAN_U1_WS_M3K * profile.windSpeedMs);
  return (module.noctC - NOCT_AIR_TEMPERATURE_C) / NOCT_IRRADIANCE_WM2;
}

/** Monthly figures only (no assumption texts): the cheap path used to rank many modules. */
export function monthlyYieldFromProfile(profile: SiteProfile, module: ModuleSpec, controller: ControllerSpec, lossesPct: LossesPct): MonthlyYield[] {
  const riseCPerWm2 = cellTemperatureRiseCPerWm2(profile, module);
  const gammaPerC = module.gammaPmaxPctPerC / 100;
  const controllerFactor = controller.efficiencyPct / 100;
  const pwmTable =
    controller.kind === "pwm"
      ? tabulatePwmFraction(
          module,
          { alphaIscPerC: module.alphaIscPctPerC / 100, betaVocPerC: module.betaVocPctPerC / 100, gammaPmaxPerC: gammaPerC },
          pwmModuleVoltageV(controller.batteryVoltageV, pwmModulesInSeries(controller.batteryVoltageV, module.vmpV)),
          profile.daylightAirMinC,
          profile.daylightAirMaxC + riseCPerWm2 * profile.poaMaxWm2,
        )
      : undefined;
  const wattsPerWm2 = module.pmaxW / 1000;

  return profile.months.map((month): MonthlyYield => {
    const { poaWm2, airTemperatureC, stepHours } = month;
    let referenceSum = 0; // module held at 25 °C
    let dcSum = 0;
    let harvestSum = 0;
    let irradianceSum = 0;
    let weightedCellTempSum = 0;
    for (let i = 0; i < poaWm2.length; i++) {
      const irradianceWm2 = poaWm2[i];
      if (irradianceWm2 <= 0) continue;
      const cellTempC = airTemperatureC[i] + riseCPerWm2 * irradianceWm2;
      const referenceW = wattsPerWm2 * irradianceWm2;
      const dcW = Math.max(0, referenceW * (1 + gammaPerC * (cellTempC - 25)));
      referenceSum += referenceW;
      dcSum += dcW;
      harvestSum += pwmTable ? dcW * pwmFractionFromTable(pwmTable, cellTempC) : dcW;
      irradianceSum += irradianceWm2;
      weightedCellTempSum += irradianceWm2 * cellTempC;
    }
    const dcEnergyWhPerDay = dcSum * stepHours;
    const harvestWhPerDay = harvestSum * stepHours * controllerFactor;
    const { energyAfterWh, lostWh } = applyLosses(harvestWhPerDay, lossesPct);
    return {
      month: month.month,
      h0KWhM2Day: month.h0KWhM2Day,
      ghiKWhM2Day: month.ghiKWhM2Day,
      clearnessIndex: month.clearnessIndex,
      irradianceSource: month.irradianceSource,
      diffuseFraction: month.diffuseFraction,
      albedo: month.albedo,
      poaKWhM2Day: month.poaKWhM2Day,
      cellTempDaytimeC: irradianceSum > 0 ? weightedCellTempSum / irradianceSum : null,
      dcEnergyWhPerDay,
      temperatureLossPct: referenceSum > 0 ? 100 * (1 - dcSum / referenceSum) : 0,
      controllerLossPct: dcEnergyWhPerDay > 0 ? 100 * (1 - harvestWhPerDay / dcEnergyWhPerDay) : 0,
      lossesWhPerDay: lostWh,
      energyWhPerDay: energyAfterWh,
    };
  });
}

export function annualKWh(months: readonly MonthlyYield[]): number {
  return months.reduce((sum, m) => sum + (m.energyWhPerDay * DAYS_IN_MONTH[m.month - 1]) / 1000, 0);
}

/** Month (1..12) with the lowest daily energy; the earliest wins a tie. */
export function worstMonth(months: readonly MonthlyYield[]): number {
  let worst = months[0];
  for (const m of months) if (m.energyWhPerDay < worst.energyWhPerDay) worst = m;
  return worst.month;
}

export function moduleYieldFromProfile(profile: SiteProfile, module: ModuleSpec, controller: ControllerSpec, lossesPct: LossesPct): YieldResult {
  const months = monthlyYieldFromProfile(profile, module, controller, lossesPct);
  return {
    months,
    annualKWh: annualKWh(months),
    worstMonth: worstMonth(months),
    assumptions: describeAssumptions(profile, module, controller, lossesPct),
  };
}
