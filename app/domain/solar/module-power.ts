// Module maximum power at an irradiance and cell temperature, linear in G and in Tc:
// P = P0·(G/1000)·(1 + γ(Tc − 25)), with the datasheet's Pmax temperature coefficient γ (the
// usual linear power–temperature model). No low-light or angle-of-incidence losses.

export const STC_IRRADIANCE_WM2 = 1000;
export const STC_CELL_TEMPERATURE_C = 25;

/** γ given in %/°C (datasheet convention) → 1/°C. */
export function pctPerCToPerC(coefficientPctPerC: number): number {
  return coefficientPctPerC / 100;
}

export function modulePowerW(pmaxStcW: number, irradianceWm2: number, cellTemperatureC: number, gammaPerC: number): number {
  const power = pmaxStcW * (irradianceWm2 / STC_IRRADIANCE_WM2) * (1 + gammaPerC * (cellTemperatureC - STC_CELL_TEMPERATURE_C));
  return Math.max(0, power);
}
