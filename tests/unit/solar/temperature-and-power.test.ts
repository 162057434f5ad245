import { describe, expect, it } from "vitest";
import { airTemperatureAtSolarHourC, sunriseSolarHour } from "~/domain/solar/air-temperature";
import { cellTemperatureFromBackSheetC, faimanModuleTemperatureC, noctCellTemperatureC } from "~/domain/solar/cell-temperature";
import { modulePowerW } from "~/domain/solar/module-power";

describe("cell temperature and module power", () => {
  it("NOCT model", () => {
    // REFERENCES.md, NOCT model: Tc = Ta + (NOCT − 20)/800·G; G = 1000, Ta = 30, NOCT = 50 → 67.5 °C.
    expect(noctCellTemperatureC(30, 1000, 50)).toBeCloseTo(67.5, 9);
  });

  it("Faiman (2008) model", () => {
    // Faiman (2008), U0 = 25.0, U1 = 6.84: (900 W/m², 20 °C, 5 m/s) → 35.203 °C (REFERENCES.md).
    expect(Math.abs(faimanModuleTemperatureC(20, 900, 5) - 35.203)).toBeLessThan(0.0005);
  });

  it("back-sheet temperature plus the Sandia cell-to-back difference", () => {
    // King, Boyson & Kratochvil (2004), Sandia PV Array Performance Model: Tc = Tm + G/1000·ΔT,
    // ΔT = 3 °C open rack → 50 °C back sheet at 800 W/m² gives 52.4 °C.
    expect(cellTemperatureFromBackSheetC(50, 800)).toBeCloseTo(52.4, 9);
  });

  it("power with temperature", () => {
    // REFERENCES.md: P = P0·(G/1000)·(1 + γ(Tc − 25)): (900 W/m², 30 °C, 100 W, γ = −0.003/°C) → 88.65 W.
    expect(modulePowerW(100, 900, 30, -0.003)).toBeCloseTo(88.65, 9);
  });

  it("a cold, clear day lifts output above nameplate", () => {
    // Common practice, no source: cell temperature drives output. −10 °C air, 1000 W/m², NOCT
    // 45 °C → cell at 21.25 °C, below STC's 25 °C, so a 100 W module gives more than 100 W.
    const cellC = noctCellTemperatureC(-10, 1000, 45);
    expect(cellC).toBeLessThan(25);
    expect(modulePowerW(100, 1000, cellC, -0.004)).toBeGreaterThan(100);
    // …while a hot day at the same irradiance loses well over 10 %.
    expect(modulePowerW(100, 1000, noctCellTemperatureC(35, 1000, 45), -0.004)).toBeLessThan(90);
  });

  it("air temperature follows the stated diurnal profile", () => {
    // Common practice, no source: minimum at sunrise, maximum at 15:00 solar time, cosine between.
    const sunrise = sunriseSolarHour(90); // 06:00
    expect(airTemperatureAtSolarHourC(6, sunrise, 2, 14)).toBeCloseTo(2, 9);
    expect(airTemperatureAtSolarHourC(15, sunrise, 2, 14)).toBeCloseTo(14, 9);
    expect(airTemperatureAtSolarHourC(10.5, sunrise, 2, 14)).toBeCloseTo(8, 9); // halfway in time → halfway
    const evening = airTemperatureAtSolarHourC(18, sunrise, 2, 14);
    expect(evening).toBeLessThan(14);
    expect(evening).toBeGreaterThan(2);
    // Polar day: sunrise at solar midnight, still bounded by the minimum and maximum.
    for (let hour = 0; hour < 24; hour += 0.5) {
      const t = airTemperatureAtSolarHourC(hour, sunriseSolarHour(180), -5, 3);
      expect(t).toBeGreaterThanOrEqual(-5 - 1e-9);
      expect(t).toBeLessThanOrEqual(3 + 1e-9);
    }
  });
});
