// Uncertainty of a normalised reading and its weight. The instrument figures are common practice,
// no source (stated in reading-uncertainty.ts); the checks here are the arithmetic: terms in
// quadrature, the temperature term as |γ|·ΔT, and the weight rule (measured 1, estimated 0.5).
import { describe, expect, it } from "vitest";
import { combinedUncertaintyPct, readingWeight, uncertaintyTerms } from "~/domain/readings/reading-uncertainty";

describe("reading uncertainty", () => {
  it("combines a pyranometer, a back-sheet thermometer and a sweep in quadrature", () => {
    const terms = uncertaintyTerms({
      irradianceSource: "pyranometer",
      irradianceWm2: 950,
      cellTemperatureSource: "back-sheet",
      gammaPmaxPctPerC: -0.4,
      measurementKind: "sweep",
    });
    expect(terms.map((t) => [t.code, t.pct])).toEqual([
      ["irradiance", 3],
      ["cell-temperature", 0.8], // 0.4 %/°C × 2 °C
      ["power", 1],
    ]);
    expect(combinedUncertaintyPct(terms)).toBeCloseTo(Math.sqrt(9 + 0.64 + 1), 12);
  });

  it("grows with a clear-sky estimate, an air-temperature estimate, one point and low light", () => {
    const terms = uncertaintyTerms({
      irradianceSource: "clear-sky-estimate",
      irradianceWm2: 450,
      cellTemperatureSource: "air-noct",
      gammaPmaxPctPerC: -0.44,
      measurementKind: "single",
    });
    expect(terms.map((t) => t.code)).toEqual(["irradiance", "cell-temperature", "power", "low-irradiance"]);
    expect(terms[1].pct).toBeCloseTo(0.44 * 8, 12);
    // √(12² + 3.52² + 3² + 3²) = √174.39 = 13.206
    expect(combinedUncertaintyPct(terms)).toBeCloseTo(13.206, 3);
  });

  it("puts a reference cell between a pyranometer and an estimate", () => {
    const pct = (source: "pyranometer" | "reference-cell" | "clear-sky-estimate") =>
      combinedUncertaintyPct(
        uncertaintyTerms({
          irradianceSource: source,
          irradianceWm2: 900,
          cellTemperatureSource: "back-sheet",
          gammaPmaxPctPerC: -0.35,
          measurementKind: "sweep",
        }),
      );
    expect(pct("pyranometer")).toBeLessThan(pct("reference-cell"));
    expect(pct("reference-cell")).toBeLessThan(pct("clear-sky-estimate"));
  });

  it("weights measured irradiance 1 and an estimate 0.5", () => {
    expect(readingWeight("pyranometer")).toBe(1);
    expect(readingWeight("reference-cell")).toBe(1);
    expect(readingWeight("clear-sky-estimate")).toBe(0.5);
  });
});
