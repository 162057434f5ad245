// How many modules (and how much roof) an array energy target needs, by the peak-sun-hours method:
// a module of P watts at STC delivers about P × H × (1 − losses) Wh a day, where H is the design
// month's daily irradiation in kWh/m² (numerically hours of 1 kW/m² sun). Common practice, no source;
// a kit plan replaces this estimate with the yield engine's month-by-month figures.

/** STC array power that meets `energyWhPerDay`: E ÷ (H × (1 − L/100)), W. */
export function requiredArrayPowerW(energyWhPerDay: number, sunHoursPerDay: number, systemLossesPct: number): number {
  if (!(energyWhPerDay > 0) || !(sunHoursPerDay > 0) || !(systemLossesPct >= 0 && systemLossesPct < 100)) {
    throw new RangeError("Energy and sun hours must be above 0, and losses from 0 to under 100 %.");
  }
  return energyWhPerDay / (sunHoursPerDay * (1 - systemLossesPct / 100));
}

/** Whole modules of `modulePowerW` for `requiredPowerW`; at least one. */
export function modulesNeeded(requiredPowerW: number, modulePowerW: number): number {
  if (!(modulePowerW > 0)) throw new RangeError("Module power must be above 0 W.");
  // 1e-9 keeps an exact fit (1000 W of 125 W modules = 8) from rounding up to 9 through float error.
  return Math.max(1, Math.ceil(requiredPowerW / modulePowerW - 1e-9));
}

/** Outline area of `count` modules, m² (frames included, as datasheets give the outline). */
export function arrayAreaM2(count: number, moduleAreaM2: number): number {
  return count * moduleAreaM2;
}
