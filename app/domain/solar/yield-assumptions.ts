// Plain-words list of what the yield estimate assumed, shown beside the numbers.
import { AIR_TEMPERATURE_PEAK_SOLAR_HOUR } from "./air-temperature";
import { FAIMAN_U0_W_M2K, FAIMAN_U1_WS_M3K } from "./cell-temperature";
import { PWM_CHARGING_VOLTS_PER_12V_NOMINAL, PWM_SWITCH_AND_CABLE_DROP_V, pwmModuleVoltageV, pwmModulesInSeries } from "./controller";
import type { ControllerSpec } from "./controller";
import { combinedLossFactor } from "./losses";
import type { LossesPct } from "./losses";
import type { SiteProfile } from "./site-profile";
import type { ModuleSpec } from "./yield-types";

const MONTH_NAMES = ["Jan", "Feb", "Mar", "Apr", "May", "Jun", "Jul", "Aug", "Sep", "Oct", "Nov", "Dec"];

function monthList(months: number[]): string {
  return months.map((m) => MONTH_NAMES[m - 1]).join(", ");
}

function fixed(value: number, digits: number): string {
  return value.toFixed(digits);
}

export function describeAssumptions(profile: SiteProfile, module: ModuleSpec, controller: ControllerSpec, lossesPct: LossesPct): string[] {
  const notes: string[] = [];
  const assumedMonths = profile.months.filter((m) => m.irradianceSource === "clearness-index");
  if (assumedMonths.length > 0) {
    const values = assumedMonths.map((m) => `${MONTH_NAMES[m.month - 1]} ${fixed(m.clearnessIndex, 2)}`).join(", ");
    notes.push(
      `No measured irradiation for ${monthList(assumedMonths.map((m) => m.month))}: an assumed clearness index ` +
        `was used (horizontal irradiation = clearness index × extraterrestrial irradiation; ${values}).`,
    );
  }
  notes.push(
    `Sun on the array: average day of each month (Klein 1977), diffuse share after Erbs et al. (1982), ` +
      `hours split after Collares-Pereira & Rabl (1979) and Liu & Jordan (1960), isotropic sky, ` +
      `${profile.stepMinutes}-minute steps. No shading, no horizon, no reflection losses at steep sun angles.`,
  );
  const outside = profile.months.filter((m) => m.clearnessOutsideErbsRange).map((m) => m.month);
  if (outside.length > 0) {
    notes.push(`Clearness index outside 0.3–0.8 in ${monthList(outside)}: the diffuse-share fit was used at its nearest limit.`);
  }
  const dark = profile.months.filter((m) => m.polarNight).map((m) => m.month);
  if (dark.length > 0) notes.push(`Polar night in ${monthList(dark)}: no sun, no energy.`);
  notes.push(
    `Air temperature through the day: a cosine from the monthly mean minimum at sunrise to the mean maximum ` +
      `at ${AIR_TEMPERATURE_PEAK_SOLAR_HOUR}:00 solar time (common practice).`,
  );
  notes.push(
    profile.cellTempModel === "faiman"
      ? `Cell temperature: Faiman (2008) model, U0 = ${FAIMAN_U0_W_M2K}, U1 = ${FAIMAN_U1_WS_M3K}, ` + `wind ${fixed(profile.windSpeedMs, 1)} m/s.`
      : `Cell temperature: NOCT model with NOCT ${fixed(module.noctC, 1)} °C (cell rise above air = (NOCT − 20)/800 × irradiance).`,
  );
  notes.push(
    `Module power scales with irradiance and with ${fixed(module.gammaPmaxPctPerC, 2)} %/°C of cell temperature ` +
      `from ${fixed(module.pmaxW, 1)} W at 25 °C; no low-light losses.`,
  );
  if (controller.kind === "pwm") {
    const inSeries = pwmModulesInSeries(controller.batteryVoltageV, module.vmpV);
    const moduleV = pwmModuleVoltageV(controller.batteryVoltageV, inSeries);
    notes.push(
      `PWM controller on a ${controller.batteryVoltageV} V battery: modules held at the charging voltage ` +
        `(${fixed(PWM_CHARGING_VOLTS_PER_12V_NOMINAL, 1)} V per 12 V nominal plus ${fixed(PWM_SWITCH_AND_CABLE_DROP_V, 1)} V ` +
        `for the switch and cable), ${inSeries} module(s) in series, so ${fixed(moduleV, 2)} V per module; current read ` +
        `from a four-point I–V approximation corrected for cell temperature. Controller efficiency ${fixed(controller.efficiencyPct, 1)} %.`,
    );
  } else {
    notes.push(
      `MPPT controller: harvests the maximum power at ${fixed(controller.efficiencyPct, 1)} % efficiency; ` +
        `assumes the string voltage suits the controller and battery (checked by the kit plan).`,
    );
  }
  const combinedPct = 100 * (1 - combinedLossFactor(lossesPct));
  notes.push(
    `Losses, applied one after another: soiling ${fixed(lossesPct.soiling, 1)} %, mismatch ${fixed(lossesPct.mismatch, 1)} %, ` +
      `wiring ${fixed(lossesPct.wiring, 1)} % (together ${fixed(combinedPct, 1)} %).`,
  );
  notes.push("Energy is per module per day, delivered to the battery; the annual total counts a 365-day year.");
  return notes;
}
