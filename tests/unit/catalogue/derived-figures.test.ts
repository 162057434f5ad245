// Area, power density, efficiency, fill factor and verified figures, from their definitions.
import { describe, expect, it } from "vitest";
import {
  batteryEnergyKWh,
  fillFactor,
  moduleAreaM2,
  moduleEfficiencyPct,
  powerDensityWm2,
  powerOrigin,
  ratioStanding,
  STC_IRRADIANCE_WM2,
  usableEnergyKWh,
  verifiedFigures,
} from "~/domain/catalogue/derived-figures";

describe("module figures from the nameplate", () => {
  it("uses the STC irradiance of IEC 60904-3", () => {
    expect(STC_IRRADIANCE_WM2).toBe(1000);
  });

  it("area, density and efficiency, worked by hand", () => {
    // 1722 mm × 1134 mm = 1.952748 m²; 415 W / 1.952748 m² = 212.52 W/m²; η = 212.52 / 1000 = 21.25 %
    // (η = Pmax / (G_STC · A), Duffie & Beckman ch. 23; chapter from memory).
    expect(moduleAreaM2(1722, 1134)).toBeCloseTo(1.952748, 6);
    expect(powerDensityWm2(415, 1722, 1134)).toBeCloseTo(212.521, 3);
    expect(moduleEfficiencyPct(415, 1722, 1134)).toBeCloseTo(21.252, 3);
  });

  it("fill factor = Pmax / (Voc · Isc)", () => {
    // 100 W / (22.4 V × 5.75 A) = 100 / 128.8 = 0.7764 (definition, e.g. Green, Solar Cells, 1982).
    expect(fillFactor(100, 22.4, 5.75)).toBeCloseTo(0.7764, 4);
  });
});

describe("verified figures", () => {
  const nameplate = { pmaxW: 200, lengthMm: 1480, widthMm: 680 };

  it("are empty without approved readings", () => {
    expect(verifiedFigures(nameplate, { verifiedPmaxW: null, readingCount: 0, spreadPct: null })).toEqual({
      ratio: null,
      measuredDensityWm2: null,
      measuredEfficiencyPct: null,
    });
  });

  it("give the ratio and the measured density over the same area", () => {
    // 172 W / 200 W = 0.86; 172 W / (1.48 × 0.68 = 1.0064 m²) = 170.91 W/m².
    const f = verifiedFigures(nameplate, { verifiedPmaxW: 172, readingCount: 7, spreadPct: 2.1 });
    expect(f.ratio).toBeCloseTo(0.86, 10);
    expect(f.measuredDensityWm2).toBeCloseTo(170.906, 3);
    expect(f.measuredEfficiencyPct).toBeCloseTo(17.091, 3);
  });

  it("say where the number comes from", () => {
    expect(powerOrigin(0)).toBe("nameplate only — no readings yet");
    expect(powerOrigin(1)).toBe("verified from 1 reading");
    expect(powerOrigin(12)).toBe("verified from 12 readings");
  });

  it("put the ratio in words: within ±5 % is near (common practice, no source)", () => {
    expect(ratioStanding(0.86)).toBe("below");
    expect(ratioStanding(0.96)).toBe("near");
    expect(ratioStanding(1.05)).toBe("near");
    expect(ratioStanding(1.08)).toBe("above");
  });
});

describe("battery energy", () => {
  it("stored and usable energy, worked by hand", () => {
    // 12.8 V × 100 Ah = 1.28 kWh; at 90 % depth of discharge 1.152 kWh usable.
    expect(batteryEnergyKWh(12.8, 100)).toBeCloseTo(1.28, 10);
    expect(usableEnergyKWh(12.8, 100, 90)).toBeCloseTo(1.152, 10);
  });
});
