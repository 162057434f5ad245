// Module and string voltages at the temperature extremes.
// Cold: on a clear cold morning the cells sit near the air temperature while irradiance is already
// enough to reach full open-circuit voltage (common practice), so Voc is taken at the coldest
// expected air temperature with the datasheet coefficient: Voc(T) = Voc,STC·(1 + βVoc·(T − 25)).
// Hot: Vmp at the hottest cell temperature, shifted as the yield engine does (Vmp·(1 + γΔT)/(1 + αΔT),
// see translateKeyPoints), so the string voltage and the energy figures rest on the same model.
import { NOCT_AIR_TEMPERATURE_C, NOCT_IRRADIANCE_WM2 } from "../solar/cell-temperature";
import { translateKeyPoints } from "../solar/iv-model";
import type { ModuleSpec } from "../solar/yield-types";

/** Irradiance for the hot-cell estimate: full sun, W/m² (common practice). */
export const HOT_CELL_IRRADIANCE_WM2 = 1000;

export function vocAtTemperatureV(module: Pick<ModuleSpec, "vocV" | "betaVocPctPerC">, temperatureC: number): number {
  return module.vocV * (1 + (module.betaVocPctPerC / 100) * (temperatureC - 25));
}

export function vmpAtCellTemperatureV(module: ModuleSpec, cellTemperatureC: number): number {
  const coefficients = {
    alphaIscPerC: module.alphaIscPctPerC / 100,
    betaVocPerC: module.betaVocPctPerC / 100,
    gammaPmaxPerC: module.gammaPmaxPctPerC / 100,
  };
  return translateKeyPoints(module, coefficients, 1000, cellTemperatureC).vmpV;
}

/** Hottest cell temperature: the hottest air plus the NOCT-model rise at full sun, °C. */
/** The air temperature of the hot-afternoon check: the site's hottest expected, else the hottest month's mean daily maximum. */
export function designHotAirC(site: { hottestTempC?: number; months: readonly { tMaxC: number }[] }): number {
  return site.hottestTempC ?? Math.max(...site.months.map((m) => m.tMaxC));
}

export function hotCellTemperatureC(hottestAirC: number, noctC: number): number {
  return hottestAirC + ((noctC - NOCT_AIR_TEMPERATURE_C) / NOCT_IRRADIANCE_WM2) * HOT_CELL_IRRADIANCE_WM2;
}

/**
 * NEC Table 690.7(A), voltage correction factors for crystalline and multicrystalline silicon modules
 * by the lowest expected ambient temperature — FROM MEMORY (the project's REFERENCES recall 1.02 at
 * 24…20 °C rising to 1.25 at −36…−40 °C). Rows: [lowest °C of the band, highest °C, factor].
 */
export const NEC_690_7_A_FACTORS: readonly (readonly [number, number, number])[] = [
  [20, 24, 1.02],
  [15, 19, 1.04],
  [10, 14, 1.06],
  [5, 9, 1.08],
  [0, 4, 1.1],
  [-5, -1, 1.12],
  [-10, -6, 1.14],
  [-15, -11, 1.16],
  [-20, -16, 1.18],
  [-25, -21, 1.2],
  [-30, -26, 1.21],
  [-35, -31, 1.23],
  [-40, -36, 1.25],
];

/**
 * Factor from NEC Table 690.7(A) for an ambient temperature; 1 above 24 °C (outside the table's
 * rows), null below −40 °C (outside the table: the coefficient method alone applies). Temperatures
 * between whole-degree bands (e.g. −5.5 °C) take the colder band.
 */
export function nec6907aFactor(lowestAmbientC: number): number | null {
  if (lowestAmbientC > 24) return 1;
  const t = Math.floor(lowestAmbientC);
  for (const [low, high, factor] of NEC_690_7_A_FACTORS) if (t >= low && t <= high) return factor;
  return null;
}
