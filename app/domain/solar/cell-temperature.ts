// Cell (module) temperature models.

/** Conditions behind a datasheet NOCT: 800 W/m², 20 °C air, 1 m/s wind, open back. */
export const NOCT_IRRADIANCE_WM2 = 800;
export const NOCT_AIR_TEMPERATURE_C = 20;

/** Faiman (2008) default heat-loss coefficients. */
export const FAIMAN_U0_W_M2K = 25.0;
export const FAIMAN_U1_WS_M3K = 6.84;

/** Sandia (King et al. 2004) cell-to-back-sheet difference at 1000 W/m², open rack, °C. */
export const SANDIA_OPEN_RACK_DELTA_T_C = 3;

/**
 * NOCT model: Tc = Ta + (NOCT − 20)/800·G — the cell's rise above air scaled linearly in G from
 * the NOCT test point (wind and mounting as in that test).
 */
export function noctCellTemperatureC(airTemperatureC: number, irradianceWm2: number, noctC: number): number {
  return airTemperatureC + ((noctC - NOCT_AIR_TEMPERATURE_C) / NOCT_IRRADIANCE_WM2) * irradianceWm2;
}

/** Faiman (2008): Tm = Ta + G/(U0 + U1·ws). */
export function faimanModuleTemperatureC(
  airTemperatureC: number,
  irradianceWm2: number,
  windSpeedMs: number,
  u0 = FAIMAN_U0_W_M2K,
  u1 = FAIMAN_U1_WS_M3K,
): number {
  return airTemperatureC + irradianceWm2 / (u0 + u1 * windSpeedMs);
}

/**
 * Cell temperature from a measured back-of-module temperature, Tc = Tm + (G/1000)·ΔT
 * (King, Boyson & Kratochvil 2004, Sandia Photovoltaic Array Performance Model; ΔT = 3 °C for
 * an open-rack glass/cell/polymer-sheet module).
 */
export function cellTemperatureFromBackSheetC(backSheetTemperatureC: number, irradianceWm2: number, deltaTC = SANDIA_OPEN_RACK_DELTA_T_C): number {
  return backSheetTemperatureC + (irradianceWm2 / 1000) * deltaTC;
}
