import { describe, expect, it } from "vitest";
import { PV_MAX_CURRENT_FACTOR, CONTINUOUS_DUTY_FACTOR, nextStandardRatingA, stringFusesNeeded } from "~/domain/sizing/fuses";
import { evaluateLayout, listLayouts, chooseLayout } from "~/domain/sizing/string-layout";
import type { LayoutContext } from "~/domain/sizing/string-layout";
import { hotCellTemperatureC, nec6907aFactor, vmpAtCellTemperatureV, vocAtTemperatureV } from "~/domain/sizing/string-voltage";
import { TEST_MODULE } from "../solar/yield-fixtures";

const module = { ...TEST_MODULE, cellsInSeries: 36 }; // Voc 22.1 V, βVoc −0.30 %/°C, Isc 5.9 A (invented)

function context(overrides: Partial<LayoutContext> = {}): LayoutContext {
  return {
    module,
    controller: { kind: "mppt", batteryVoltagesV: [12, 24], maxPvVocV: 100, maxChargeCurrentA: 30, maxPvPowerW: { "12": 400, "24": 800 }, efficiencyPct: 97 },
    systemVoltageV: 24,
    chargeVoltageV: 29.4,
    coldestAirC: -20,
    hotCellC: 65,
    mpptHeadroomV: 5,
    ratingPowerW: module.pmaxW,
    ...overrides,
  };
}

describe("string Voc on the coldest morning", () => {
  it("follows Voc·(1 + βVoc·(Tmin − 25)) — hand calculation", () => {
    // REFERENCES (Sizing): Ns·Voc,STC·(1 + βVoc·(Tmin − 25)).
    // 22.1 V × (1 + (−0.0030)·(−20 − 25)) = 22.1 × 1.135 = 25.0835 V per module; × 4 = 100.334 V.
    expect(vocAtTemperatureV(module, -20)).toBeCloseTo(25.0835, 4);
    const four = evaluateLayout({ modulesInSeries: 4, stringsInParallel: 1 }, context());
    expect(four.stringVocColdV).toBeCloseTo(100.334, 3);
    expect(four.vocOk).toBe(false); // above the 100 V controller
    const three = evaluateLayout({ modulesInSeries: 3, stringsInParallel: 1 }, context());
    expect(three.stringVocColdV).toBeCloseTo(75.2505, 3);
    expect(three.vocOk).toBe(true);
  });

  it("cross-checks with NEC Table 690.7(A) (from memory: 1.02 at 24…20 °C up to 1.25 at −36…−40 °C)", () => {
    // Table bands as recalled in REFERENCES; −20 °C falls in the −16…−20 band, factor 1.18:
    // 3 × 22.1 V × 1.18 = 78.234 V.
    expect(nec6907aFactor(24)).toBe(1.02);
    expect(nec6907aFactor(20)).toBe(1.02);
    expect(nec6907aFactor(19)).toBe(1.04);
    expect(nec6907aFactor(0)).toBe(1.1);
    expect(nec6907aFactor(-1)).toBe(1.12);
    expect(nec6907aFactor(-20)).toBe(1.18);
    expect(nec6907aFactor(-40)).toBe(1.25);
    expect(nec6907aFactor(-41)).toBeNull();
    expect(nec6907aFactor(30)).toBe(1);
    expect(evaluateLayout({ modulesInSeries: 3, stringsInParallel: 1 }, context()).stringVocNecTableV).toBeCloseTo(78.234, 3);
  });

  it("lists only string lengths whose cold Voc fits, and picks the fewest modules, then the fewest strings", () => {
    // 100 V ÷ 25.0835 V = 3.99 → at most 3 in series. Hot Vmp (below) ≈ 14.99 V per module needs ≥ 3 in series for 34.4 V.
    const layouts = listLayouts(5.2, context());
    expect(layouts.map((l) => l.modulesInSeries)).toEqual([1, 2, 3]);
    expect(layouts.map((l) => l.stringsInParallel)).toEqual([6, 3, 2]);
    const chosen = chooseLayout(layouts, context());
    expect([chosen.modulesInSeries, chosen.stringsInParallel]).toEqual([3, 2]);
    expect(chosen.valid).toBe(true);
    // A forced layout is evaluated as asked, even when it fails.
    const forced = chooseLayout(layouts, context(), { modulesInSeries: 4, stringsInParallel: 2 });
    expect(forced.valid).toBe(false);
    expect(forced.problems[0]).toMatch(/above the controller's 100 V/);
  });
});

describe("string Vmp on a hot afternoon", () => {
  it("uses the NOCT model at full sun for the hottest cell (REFERENCES: G = 1000, Ta = 30, NOCT = 50 → 67.5 °C)", () => {
    expect(hotCellTemperatureC(30, 50)).toBeCloseTo(67.5, 9);
  });

  it("shifts Vmp as the yield engine does — hand calculation", () => {
    // Vmp·(1 + γΔT)/(1 + αΔT) with ΔT = 40 K: 18.2 × (1 − 0.16)/(1 + 0.02) = 14.988 V.
    expect(vmpAtCellTemperatureV(module, 65)).toBeCloseTo((18.2 * 0.84) / 1.02, 9);
    const two = evaluateLayout({ modulesInSeries: 2, stringsInParallel: 1 }, context());
    expect(two.stringVmpNeededV).toBeCloseTo(34.4, 9); // 29.4 V charging + 5 V headroom
    expect(two.vmpOk).toBe(false); // 29.98 V
    expect(evaluateLayout({ modulesInSeries: 3, stringsInParallel: 1 }, context()).vmpOk).toBe(true);
  });
});

describe("the 1.25 factors", () => {
  it("PV circuit current 1.25 × Isc and conductor/fuse 1.25 × that = 1.5625 × Isc (NEC 690.8(A)(1), 690.8(B); REFERENCES)", () => {
    expect(PV_MAX_CURRENT_FACTOR * CONTINUOUS_DUTY_FACTOR).toBeCloseTo(1.5625, 12);
    // 3 strings of Isc 5.9 A: circuit current 1.25 × 3 × 5.9 = 22.125 A.
    const layout = evaluateLayout({ modulesInSeries: 3, stringsInParallel: 3 }, context());
    expect(layout.arrayMaxCurrentA).toBeCloseTo(22.125, 9);
    // String fuse: 1.5625 × 5.9 = 9.22 A → next standard rating 10 A; needed with 3 strings, not with 2.
    expect(nextStandardRatingA(1.5625 * 5.9)).toBe(10);
    expect(stringFusesNeeded(3)).toBe(true);
    expect(stringFusesNeeded(2)).toBe(false);
  });

  it("picks the next standard rating at or above a current", () => {
    expect(nextStandardRatingA(15)).toBe(15);
    expect(nextStandardRatingA(15.01)).toBe(20);
    expect(nextStandardRatingA(101)).toBe(110);
    expect(nextStandardRatingA(700)).toBeNull();
  });

  it("PWM: a hot Vmp below the charging voltage only trims the harvest while the hot Voc still reaches it", () => {
    const pwm = context({
      controller: { kind: "pwm", batteryVoltagesV: [12], maxPvVocV: 50, maxChargeCurrentA: 20, maxPvPowerW: {}, efficiencyPct: 98 },
      systemVoltageV: 12,
      chargeVoltageV: 14.7,
    });
    // Needed: 14.7 + 0.5 V switch and cable drop = 15.2 V. At 65 °C: Vmp 14.988 V (warn), Voc 22.1 × (1 − 0.003 × 40) = 19.448 V.
    const one = evaluateLayout({ modulesInSeries: 1, stringsInParallel: 1 }, pwm);
    expect(one.stringVmpNeededV).toBeCloseTo(15.2, 9);
    expect(one.vmpStatus).toBe("warn");
    expect(one.valid).toBe(true);
    // At 95 °C: Voc 22.1 × (1 − 0.003 × 70) = 17.459 V still reaches; at 130 °C Voc 15.14 V does not → fail.
    expect(evaluateLayout({ modulesInSeries: 1, stringsInParallel: 1 }, { ...pwm, hotCellC: 130 }).vmpStatus).toBe("fail");
  });

  it("PWM: the controller carries 1.25 × Isc × strings; MPPT: output current at STC power with 25 % in hand", () => {
    const pwm = context({
      controller: { kind: "pwm", batteryVoltagesV: [12], maxPvVocV: 50, maxChargeCurrentA: 20, maxPvPowerW: {}, efficiencyPct: 98 },
      systemVoltageV: 12,
      chargeVoltageV: 14.7,
    });
    // 2 strings: 1.25 × 2 × 5.9 = 14.75 A ≤ 20 A; 3 strings: 22.125 A > 20 A.
    expect(evaluateLayout({ modulesInSeries: 1, stringsInParallel: 2 }, pwm).currentStatus).toBe("pass");
    expect(evaluateLayout({ modulesInSeries: 1, stringsInParallel: 3 }, pwm).currentStatus).toBe("fail");
    // MPPT 24 V, 30 A: 6 × 100 W × 0.97 ÷ 24 V = 24.25 A; × 1.25 = 30.3 A > 30 A → warn (clips on cold bright days).
    const six = evaluateLayout({ modulesInSeries: 3, stringsInParallel: 2 }, context());
    expect(six.controllerOutputCurrentA).toBeCloseTo(24.25, 9);
    expect(six.currentStatus).toBe("warn");
    // 9 modules: 36.4 A > 30 A → fail; 900 W > 800 W rated PV power.
    const nine = evaluateLayout({ modulesInSeries: 3, stringsInParallel: 3 }, context());
    expect(nine.currentStatus).toBe("fail");
    expect(nine.powerOk).toBe(false);
    // 3 modules: 12.1 A × 1.25 = 15.2 A → pass.
    expect(evaluateLayout({ modulesInSeries: 3, stringsInParallel: 1 }, context()).currentStatus).toBe("pass");
  });
});
