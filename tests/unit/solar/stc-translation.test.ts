import { describe, expect, it } from "vitest";
import { currentAtVoltageA, explicitIvModel } from "~/domain/solar/iv-model";
import type { SweepPoint } from "~/domain/solar/load-sweep";
import { STC_CONDITIONS, absoluteCoefficient, pmaxToStcW, readingCellTemperatureC, translateCurveIec60891Procedure1 } from "~/domain/solar/stc-translation";

// Invented module; a curve "measured" at 800 W/m² and 45 °C, drawn from the explicit I–V model.
const MODEL = explicitIvModel({ vocV: 20.9, iscA: 4.75, vmpV: 16.8, impA: 4.4 });
const MEASURED: SweepPoint[] = Array.from({ length: 25 }, (_, i) => {
  const voltageV = (20.9 * i) / 24;
  return { voltageV, currentA: currentAtVoltageA(MODEL, voltageV) };
});
const FIELD = { irradianceWm2: 800, cellTemperatureC: 45 };
const COEFFICIENTS = {
  alphaAPerK: absoluteCoefficient(0.05, 5.9), // 0.05 %/°C of a 5.9 A Isc
  betaVPerK: absoluteCoefficient(-0.3, 22.1), // −0.3 %/°C of a 22.1 V Voc
  rsOhm: 0.35,
  kappaOhmPerK: 0.0015,
};

describe("IEC 60891 procedure 1", () => {
  it("returns the input unchanged when the conditions do not change", () => {
    // IEC 60891 procedure 1 with G2 = G1 and T2 = T1 (REFERENCES.md: test identities).
    const same = translateCurveIec60891Procedure1(MEASURED, 4.75, FIELD, FIELD, COEFFICIENTS);
    same.forEach((p, i) => {
      expect(p.voltageV).toBeCloseTo(MEASURED[i].voltageV, 12);
      expect(p.currentA).toBeCloseTo(MEASURED[i].currentA, 12);
    });
  });

  it("applies the procedure-1 formulas to a point (hand calculation)", () => {
    // I2 = I1 + Isc1·(G2/G1 − 1) + α(T2 − T1); V2 = V1 − Rs(I2 − I1) − κ·I2·(T2 − T1) + β(T2 − T1)
    // (IEC 60891 procedure 1 as given in the brief). By hand with α = 0.00295 A/K, β = −0.0663 V/K:
    // I2 = 4 + 4.75·0.25 − 0.00295·20 = 5.1285 A;
    // V2 = 15 − 0.35·1.1285 + 0.0015·5.1285·20 + 0.0663·20 = 16.08488 V.
    const [p] = translateCurveIec60891Procedure1([{ voltageV: 15, currentA: 4 }], 4.75, FIELD, STC_CONDITIONS, COEFFICIENTS);
    expect(p.currentA).toBeCloseTo(5.1285, 10);
    expect(p.voltageV).toBeCloseTo(16.08488, 5);
  });

  it("round trips to STC and back", () => {
    // Translating to STC and back again. Procedure 1 is exactly reversible when only G changes;
    // when T changes as well, its formulas leave a residual the algebra predicts:
    // I3 − I1 = α·ΔT·(G1/G2 − 1), V3 − V1 = −Rs·(I3 − I1) − κ·ΔT·(I2 − I3), ΔT = T2 − T1.
    const irradianceOnly = { irradianceWm2: 800, cellTemperatureC: 25 };
    const toStc = translateCurveIec60891Procedure1(MEASURED, 4.75, irradianceOnly, STC_CONDITIONS, COEFFICIENTS);
    const back = translateCurveIec60891Procedure1(toStc, 4.75 * (1000 / 800), STC_CONDITIONS, irradianceOnly, COEFFICIENTS);
    back.forEach((p, i) => {
      expect(p.voltageV).toBeCloseTo(MEASURED[i].voltageV, 10);
      expect(p.currentA).toBeCloseTo(MEASURED[i].currentA, 10);
    });

    const stc = translateCurveIec60891Procedure1(MEASURED, 4.75, FIELD, STC_CONDITIONS, COEFFICIENTS);
    const iscStcA = 4.75 * (1000 / 800) + COEFFICIENTS.alphaAPerK * (25 - 45);
    const returned = translateCurveIec60891Procedure1(stc, iscStcA, STC_CONDITIONS, FIELD, COEFFICIENTS);
    const deltaTK = 25 - 45;
    returned.forEach((p, i) => {
      const currentResidualA = COEFFICIENTS.alphaAPerK * deltaTK * (800 / 1000 - 1);
      expect(p.currentA - MEASURED[i].currentA).toBeCloseTo(currentResidualA, 10);
      const voltageResidualV = -COEFFICIENTS.rsOhm * currentResidualA - COEFFICIENTS.kappaOhmPerK * deltaTK * (stc[i].currentA - p.currentA);
      expect(p.voltageV - MEASURED[i].voltageV).toBeCloseTo(voltageResidualV, 10);
      // …and the residual is small in practice: under 0.02 A and 0.05 V here.
      expect(Math.abs(p.currentA - MEASURED[i].currentA)).toBeLessThan(0.02);
      expect(Math.abs(p.voltageV - MEASURED[i].voltageV)).toBeLessThan(0.05);
    });
  });

  it("moves a warm, dim curve up in current and voltage towards STC", () => {
    const stc = translateCurveIec60891Procedure1(MEASURED, 4.75, FIELD, STC_CONDITIONS, COEFFICIENTS);
    expect(stc[0].currentA).toBeGreaterThan(MEASURED[0].currentA * 1.2);
    expect(stc[24].voltageV).toBeGreaterThan(MEASURED[24].voltageV);
  });
});

describe("Pmax-only fallback and reading temperature", () => {
  it("inverts the power–temperature check value", () => {
    // REFERENCES.md: P = P0·(G/1000)·(1 + γ(Tc − 25)), (900 W/m², 30 °C, 100 W, γ = −0.003/°C) → 88.65 W,
    // so the fallback P_STC = P·(1000/G)/(1 + γ(Tc − 25)) must bring 88.65 W back to 100 W.
    expect(pmaxToStcW(88.65, { irradianceWm2: 900, cellTemperatureC: 30 }, -0.003)).toBeCloseTo(100, 9);
    // A warm, dim reading of 80 W at 800 W/m², 45 °C, γ = −0.4 %/°C → 80·1.25/0.92 = 108.70 W.
    expect(pmaxToStcW(80, { irradianceWm2: 800, cellTemperatureC: 45 }, -0.004)).toBeCloseTo(108.6957, 3);
  });

  it("takes cell temperature from the back sheet (Sandia) or from air via NOCT", () => {
    // King et al. (2004) ΔT = 3 °C open rack: 41 °C back sheet at 700 W/m² → 43.1 °C.
    expect(readingCellTemperatureC({ kind: "back-sheet", backSheetC: 41 }, 700)).toBeCloseTo(43.1, 9);
    expect(readingCellTemperatureC({ kind: "back-sheet", backSheetC: 41, deltaTC: 0 }, 700)).toBe(41);
    // NOCT model (REFERENCES.md): 30 °C air, 1000 W/m², NOCT 50 → 67.5 °C.
    expect(readingCellTemperatureC({ kind: "air", airC: 30, noctC: 50 }, 1000)).toBeCloseTo(67.5, 9);
  });
});
