import { describe, expect, it } from "vitest";
import { haurwitzClearSkyGhiWm2 } from "~/domain/solar/clear-sky";
import { erbsHourlyDiffuseFraction } from "~/domain/solar/diffuse-fraction";
import { clearSkyPlaneOfArrayAt, dayOfYearUtc, planeOfArrayIrradianceAt } from "~/domain/solar/instant-irradiance";

describe("clear-sky irradiance", () => {
  it("Haurwitz (1945) at five apparent elevations", () => {
    // Haurwitz (1945) GHI = 1098·cos z·exp(−0.059/cos z); values as in pvlib's test suite
    // (REFERENCES.md): elevation 5/10/30/50/90° → 48.6299, 135.7417, 487.8941, 778.7667, 1035.0920 W/m².
    const cases: Array<[number, number]> = [
      [5, 48.6299],
      [10, 135.7417],
      [30, 487.8941],
      [50, 778.7667],
      [90, 1035.092],
    ];
    for (const [elevationDeg, ghiWm2] of cases) {
      expect(Math.abs(haurwitzClearSkyGhiWm2(90 - elevationDeg) - ghiWm2), `${elevationDeg}°`).toBeLessThanOrEqual(1e-3);
    }
    expect(haurwitzClearSkyGhiWm2(90)).toBe(0);
    expect(haurwitzClearSkyGhiWm2(100)).toBe(0);
  });
});

describe("plane-of-array irradiance at an instant", () => {
  it("Erbs et al. (1982) hourly diffuse fraction is continuous at its break points", () => {
    // The three pieces of the Erbs hourly correlation (D&B §2.10) meet to within 0.01 (from memory:
    // the published fit is continuous to about that precision).
    expect(Math.abs(erbsHourlyDiffuseFraction(0.22) - erbsHourlyDiffuseFraction(0.2200001))).toBeLessThan(0.01);
    expect(Math.abs(erbsHourlyDiffuseFraction(0.8) - erbsHourlyDiffuseFraction(0.8000001))).toBeLessThan(0.01);
    expect(erbsHourlyDiffuseFraction(0.1)).toBeCloseTo(0.991, 9);
    expect(erbsHourlyDiffuseFraction(0.9)).toBe(0.165);
  });

  it("conserves GHI in the split and returns GHI on a horizontal plane", () => {
    // Closure of the decomposition (common practice, no source): DNI·cos z + DHI = GHI.
    for (const [ghiWm2, zenithDeg] of [
      [850, 30],
      [400, 60],
      [120, 80],
      [30, 88.5],
    ]) {
      const poa = planeOfArrayIrradianceAt({ ghiWm2, sunZenithDeg: zenithDeg, sunAzimuthDeg: 150, dayOfYear: 172, tiltDeg: 0, azimuthDeg: 180, albedo: 0.2 });
      expect(poa.dniWm2 * Math.cos((zenithDeg * Math.PI) / 180) + poa.dhiWm2).toBeCloseTo(ghiWm2, 9);
      expect(poa.poaWm2).toBeCloseTo(ghiWm2, 9);
      expect(poa.dniWm2).toBeLessThanOrEqual(1367 * 1.033);
    }
  });

  it("transposes a clear-sky reading onto the NREL SPA slope", () => {
    // NREL SPA Table A5.1 place and instant; the 30° slope facing 10° east of south sees the sun
    // at 25.187° incidence, so it receives more than the horizontal (common practice, no source).
    const result = clearSkyPlaneOfArrayAt({
      instantUtc: new Date(Date.UTC(2003, 9, 17, 19, 30, 30)),
      latitudeDeg: 39.742476,
      longitudeDeg: -105.1786,
      tiltDeg: 30,
      azimuthDeg: 170,
      albedo: 0.2,
    });
    expect(Math.abs(result.incidenceDeg - 25.187)).toBeLessThan(0.1);
    expect(result.ghiWm2).toBeCloseTo(haurwitzClearSkyGhiWm2(result.sunZenithDeg), 9);
    expect(result.poaWm2).toBeGreaterThan(result.ghiWm2);
    expect(result.beamWm2).toBeCloseTo(result.dniWm2 * Math.cos((result.incidenceDeg * Math.PI) / 180), 9);
    expect(dayOfYearUtc(new Date(Date.UTC(2003, 9, 17, 19)))).toBe(290);
  });

  it("gives no beam to a plane facing away from the sun", () => {
    const poa = planeOfArrayIrradianceAt({ ghiWm2: 800, sunZenithDeg: 40, sunAzimuthDeg: 180, dayOfYear: 172, tiltDeg: 90, azimuthDeg: 0, albedo: 0.2 });
    expect(poa.beamWm2).toBe(0);
    expect(poa.poaWm2).toBeCloseTo(poa.dhiWm2 / 2 + 800 * 0.2 * 0.5, 9);
  });
});
