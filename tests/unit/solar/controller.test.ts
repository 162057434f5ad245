import { describe, expect, it } from "vitest";
import { createPwmFractionAtTemperature, pwmModuleVoltageV, pwmModulesInSeries, pwmPowerFraction } from "~/domain/solar/controller";
import { pwmFractionFromTable, tabulatePwmFraction } from "~/domain/solar/pwm-fraction-table";
import { currentAtVoltageA, explicitIvModel, modelMaximumPowerW } from "~/domain/solar/iv-model";
import { estimateMonthlyYield } from "~/domain/solar/monthly-yield";
import type { ModuleSpec, SiteInput } from "~/domain/solar/yield-types";

// Invented module figures (no real product).
const MODULE_36_CELL: ModuleSpec = {
  pmaxW: 100,
  vmpV: 18.2,
  impA: 5.5,
  vocV: 22.1,
  iscA: 5.9,
  gammaPmaxPctPerC: -0.4,
  betaVocPctPerC: -0.3,
  alphaIscPctPerC: 0.05,
  noctC: 45,
};
const MODULE_30_CELL: ModuleSpec = {
  pmaxW: 85,
  vmpV: 14.6,
  impA: 5.8,
  vocV: 18.0,
  iscA: 6.2,
  gammaPmaxPctPerC: -0.4,
  betaVocPctPerC: -0.3,
  alphaIscPctPerC: 0.05,
  noctC: 45,
};
const COEFFICIENTS = { alphaIscPerC: 0.0005, betaVocPerC: -0.003, gammaPmaxPerC: -0.004 };
const SITE: SiteInput = {
  latitudeDeg: 30,
  longitudeDeg: 20,
  tiltDeg: 30,
  azimuthDeg: 180,
  albedo: 0.2,
  months: Array.from({ length: 12 }, () => ({ clearnessIndex: 0.55, tMaxC: 28, tMinC: 14 })),
};
const LOSSES = { soiling: 2, mismatch: 2, wiring: 1 };

describe("explicit I–V approximation", () => {
  it("passes through the datasheet points and its own maximum is found exactly", () => {
    // Properties of the explicit model (from memory, see iv-model.ts): I(0) = Isc, I(Vmp) ≈ Imp,
    // I(Voc) ≈ 0. The analytic maximum is checked against a brute-force scan of V·I(V).
    const model = explicitIvModel(MODULE_36_CELL);
    expect(currentAtVoltageA(model, 0)).toBe(5.9);
    expect(currentAtVoltageA(model, 18.2)).toBeCloseTo(5.5, 4);
    expect(currentAtVoltageA(model, 22.1)).toBeLessThan(1e-4);
    let bestW = 0;
    for (let v = 0; v < 22.1; v += 0.0005) bestW = Math.max(bestW, v * currentAtVoltageA(model, v));
    expect(modelMaximumPowerW(model).pmaxW).toBeCloseTo(bestW, 5);
    expect(Math.abs(modelMaximumPowerW(model).pmaxW / (18.2 * 5.5) - 1)).toBeLessThan(0.01);
  });
});

describe("PWM versus MPPT", () => {
  it("the fast PWM path matches the plain one", () => {
    const fast = createPwmFractionAtTemperature(MODULE_30_CELL, COEFFICIENTS, 14.5);
    for (const cellC of [-20, 0, 25, 45, 65, 80]) {
      expect(fast(cellC)).toBeCloseTo(pwmPowerFraction(MODULE_30_CELL, COEFFICIENTS, cellC, 14.5), 12);
    }
  });

  it("the 1 °C table used in the yield loop stays within 2e-4 of the exact fraction", () => {
    // Interpolation error h²/8·|f″| (common practice, no source); the 30-cell module bends hardest.
    const table = tabulatePwmFraction(MODULE_30_CELL, COEFFICIENTS, 14.5, -20, 90);
    for (let cellC = -20; cellC <= 90; cellC += 0.37) {
      expect(Math.abs(pwmFractionFromTable(table, cellC) - pwmPowerFraction(MODULE_30_CELL, COEFFICIENTS, cellC, 14.5)), `${cellC} °C`).toBeLessThan(2e-4);
    }
  });

  it("states the PWM operating voltage: 14.0 V per 12 V nominal plus 0.5 V drop", () => {
    // Common practice, no source: charging voltage between bulk (~13.5 V) and absorption (~14.4 V).
    expect(pwmModulesInSeries(12, 18.2)).toBe(1);
    expect(pwmModulesInSeries(24, 18.2)).toBe(2);
    expect(pwmModulesInSeries(24, 30)).toBe(1);
    expect(pwmModuleVoltageV(12, 1)).toBeCloseTo(14.5, 9);
    expect(pwmModuleVoltageV(24, 2)).toBeCloseTo(14.25, 9);
  });

  it("a 36-cell module on a 12 V battery harvests noticeably less with PWM than with MPPT", () => {
    // REFERENCES.md, facts of the trade (common practice, no source): Vmp 17–19 V held near
    // 13–14.5 V by PWM "harvests noticeably less" — taken here as at least 8 % less over a year.
    const mppt = estimateMonthlyYield({
      site: SITE,
      module: MODULE_36_CELL,
      controller: { kind: "mppt", batteryVoltageV: 12, efficiencyPct: 97 },
      lossesPct: LOSSES,
    });
    const pwm = estimateMonthlyYield({
      site: SITE,
      module: MODULE_36_CELL,
      controller: { kind: "pwm", batteryVoltageV: 12, efficiencyPct: 97 },
      lossesPct: LOSSES,
    });
    expect(pwm.annualKWh).toBeLessThan(0.92 * mppt.annualKWh);
    for (let i = 0; i < 12; i++) {
      expect(pwm.months[i].energyWhPerDay).toBeLessThan(mppt.months[i].energyWhPerDay);
      expect(pwm.months[i].controllerLossPct).toBeGreaterThan(mppt.months[i].controllerLossPct);
    }
  });

  it("PWM wastes more on cold days for a 36-cell module (Vmp climbs away from battery voltage)", () => {
    // Common practice, no source + the I–V model: cold raises Vmp, PWM still holds 14.5 V.
    const fraction = (cellC: number) => pwmPowerFraction(MODULE_36_CELL, COEFFICIENTS, cellC, 14.5);
    expect(fraction(0)).toBeLessThan(fraction(25));
    expect(fraction(25)).toBeLessThan(fraction(60));
  });

  it("a module whose hot Vmp falls below the charging voltage loses steeply as it heats", () => {
    // Common practice, no source + the I–V model: a 30-cell module (Vmp 14.6 V at 25 °C) works
    // near its maximum on PWM when cool, but at 75 °C its Vmp is ~11.4 V and Voc ~15.3 V, so at
    // 14.5 V the current has fallen off the knee.
    const fraction = (cellC: number) => pwmPowerFraction(MODULE_30_CELL, COEFFICIENTS, cellC, 14.5);
    expect(fraction(25)).toBeGreaterThan(0.95);
    expect(fraction(75)).toBeLessThan(0.7);
    // Steep: each further 10 °C costs more than the one before.
    expect(fraction(65) - fraction(75)).toBeGreaterThan(fraction(55) - fraction(65));
    expect(fraction(55) - fraction(65)).toBeGreaterThan(fraction(45) - fraction(55));
    // Beyond Voc nothing flows at all.
    expect(fraction(120)).toBe(0);
  });
});
