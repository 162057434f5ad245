// Normalising a field reading to STC, end to end through the engine.
import { describe, expect, it } from "vitest";
import { evaluateReading, type ReadingConditions } from "~/domain/readings/evaluate-reading";
import { kneeStepV, normaliseReading, type ReadingInput } from "~/domain/readings/normalise-reading";
import { clearSkyPlaneOfArrayAt } from "~/domain/solar/instant-irradiance";
import { currentAtVoltageA, explicitIvModel, modelMaximumPowerW } from "~/domain/solar/iv-model";

// NREL SPA report (Reda & Andreas, NREL/TP-560-34302, Table A5.1): 2003-10-17 12:30:30 local,
// UTC−7, 39.742476°N, 105.1786°W → topocentric zenith 50.11162°, incidence 25.18700° on a 30°
// slope rotated 10° east of south (compass azimuth 170°). suncalc's elevation includes ~0.02° of
// refraction at 40°, and ignores parallax, so ±0.1° is allowed.
const SPA = { takenAtUtc: new Date("2003-10-17T19:30:30Z"), latitudeDeg: 39.742476, longitudeDeg: -105.1786, tiltDeg: 30, azimuthDeg: 170 };
const SPA_ELEVATION_DEG = 90 - 50.11162;
const SPA_INCIDENCE_DEG = 25.187;

const MODULE = { pmaxW: 100, gammaPmaxPctPerC: -0.3, noctC: 50 };

function input(overrides: Partial<ReadingInput>): ReadingInput {
  return {
    module: MODULE,
    measured: { kind: "single", pmaxW: 88.65 },
    ...SPA,
    airTempC: 20,
    moduleTempC: 27.3,
    irradiance: { source: "pyranometer", irradianceWm2: 900 },
    now: new Date("2026-12-01T00:00:00Z"),
    ...overrides,
  };
}

function ok(outcome: ReturnType<typeof normaliseReading>) {
  if (!outcome.ok) throw new Error(outcome.message);
  return outcome.reading;
}

describe("normaliseReading", () => {
  it("undoes the linear power model: 88.65 W at 900 W/m² and 30 °C cell is 100 W at STC", () => {
    // REFERENCES.md: P = P0·(G/1000)·(1 + γ(Tc − 25)) with (900 W/m², 30 °C, 100 W, γ = −0.003/°C) → 88.65 W.
    // Back sheet 27.3 °C + (900/1000)·3 °C (King et al. 2004, open rack) = 30.0 °C cell.
    const reading = ok(normaliseReading(input({})));
    expect(reading.cellTempC).toBeCloseTo(30, 10);
    expect(reading.stcPmaxW).toBeCloseTo(100, 10);
    expect(reading.ratioToNameplate).toBeCloseTo(1, 10);
    expect(reading.weight).toBe(1);
    expect(reading.working.cellTempSource).toBe("back-sheet");
  });

  it("places the sun as the NREL SPA example does", () => {
    const reading = ok(normaliseReading(input({})));
    expect(Math.abs(reading.working.sunElevationDeg - SPA_ELEVATION_DEG)).toBeLessThan(0.1);
    expect(Math.abs(reading.working.incidenceDeg - SPA_INCIDENCE_DEG)).toBeLessThan(0.1);
    expect(reading.flags).toEqual([]);
  });

  it("estimates the cell temperature from air with the NOCT model when no back-sheet reading exists", () => {
    // REFERENCES.md: Tc = Ta + (NOCT − 20)/800·G; G = 1000, Ta = 30, NOCT = 50 → 67.5 °C.
    const reading = ok(
      normaliseReading(
        input({ moduleTempC: null, airTempC: 30, irradiance: { source: "pyranometer", irradianceWm2: 1000 }, measured: { kind: "single", pmaxW: 87 } }),
      ),
    );
    expect(reading.cellTempC).toBeCloseTo(67.5, 10);
    expect(reading.stcPmaxW).toBeCloseTo(87 / (1 - 0.003 * 42.5), 10);
    expect(reading.working.cellTempSource).toBe("air-noct");
    expect(reading.flags.map((f) => f.code)).toContain("module-temperature-missing");
  });

  it("uses the clear-sky estimate for that time, place and plane, flags it and weights it half", () => {
    const reading = ok(normaliseReading(input({ irradiance: { source: "clear-sky-estimate" } })));
    const clearSky = clearSkyPlaneOfArrayAt({
      instantUtc: SPA.takenAtUtc,
      latitudeDeg: SPA.latitudeDeg,
      longitudeDeg: SPA.longitudeDeg,
      tiltDeg: 30,
      azimuthDeg: 170,
      albedo: 0.2,
    });
    expect(reading.irradianceWm2).toBeCloseTo(clearSky.poaWm2, 10);
    expect(reading.irradianceSource).toBe("clear-sky-estimate");
    expect(reading.weight).toBe(0.5);
    expect(reading.flags.map((f) => f.code)).toEqual(["irradiance-estimated"]);
    expect(reading.uncertaintyPct).toBeGreaterThan(12);
  });

  it("refuses a time in the future, a sun below the horizon, and too little light to estimate", () => {
    const future = normaliseReading(input({ now: new Date("2003-10-17T19:00:00Z") }));
    expect(future).toMatchObject({ ok: false, field: "takenAtLocal" });
    const night = normaliseReading(input({ takenAtUtc: new Date("2003-10-18T07:30:00Z") }));
    expect(night).toMatchObject({ ok: false, field: "takenAtLocal" });
    if (!night.ok) expect(night.message).toMatch(/below the horizon/);
    // Just after sunrise a clear sky gives a few tens of W/m² on a south-facing plane.
    const dawn = normaliseReading(input({ takenAtUtc: new Date("2003-10-17T13:25:00Z"), irradiance: { source: "clear-sky-estimate" } }));
    expect(dawn).toMatchObject({ ok: false, field: "irradianceSource" });
  });
});

describe("evaluateReading with a load sweep", () => {
  // Synthetic curve from the explicit I–V model of an invented module at the measurement
  // conditions: its own maximum power point is the known answer.
  const curve = explicitIvModel({ vocV: 21.0, iscA: 5.3, vmpV: 17.0, impA: 4.9 });
  const truth = modelMaximumPowerW(curve);
  const csv = (count: number, seconds: number) =>
    [
      "voltage (V),current (A),time (s)",
      ...Array.from({ length: count }, (_, i) => {
        const v = (21.0 * i) / (count - 1);
        return `${v.toFixed(4)},${currentAtVoltageA(curve, v).toFixed(5)},${((seconds * i) / (count - 1)).toFixed(3)}`;
      }),
    ].join("\n");
  const conditions: ReadingConditions = {
    kind: "sweep",
    takenAtLocal: "2003-10-17T12:30:30",
    utcOffsetH: -7,
    latitudeDeg: SPA.latitudeDeg,
    longitudeDeg: SPA.longitudeDeg,
    tiltDeg: 30,
    azimuthDeg: 170,
    airTempC: 20,
    moduleTempC: 27.3,
    irradianceSource: "reference-cell",
    irradianceWm2: 900,
  };

  it("takes Pmax from the analysed sweep and the duration from its time column", () => {
    const result = evaluateReading(conditions, MODULE, { csv: csv(80, 1.5) }, new Date("2026-01-01T00:00:00Z"));
    if (!result.ok) throw new Error(result.message);
    expect(Math.abs(result.sweep!.analysis.pmaxW / truth.pmaxW - 1)).toBeLessThan(0.002);
    expect(result.sweep!.durationS).toBeCloseTo(1.5, 9);
    expect(result.reading.measuredPmaxW).toBe(result.sweep!.analysis.pmaxW);
    expect(result.reading.stcPmaxW).toBeCloseTo(result.sweep!.analysis.pmaxW / 0.9 / (1 - 0.003 * 5), 9);
    expect(result.takenAtUtc.toISOString()).toBe("2003-10-17T19:30:30.000Z");
    expect(result.reading.flags).toEqual([]);
  });

  it("flags a sparse, slow sweep but still accepts it", () => {
    const result = evaluateReading(conditions, MODULE, { csv: csv(14, 12) }, new Date("2026-01-01T00:00:00Z"));
    if (!result.ok) throw new Error(result.message);
    expect(result.reading.flags.map((f) => f.code)).toEqual(["sparse-sweep", "slow-sweep"]);
  });

  it("sends the engine's reason for an unusable sweep to the file field", () => {
    expect(evaluateReading(conditions, MODULE, { csv: "voltage,current\n12,3\n" })).toMatchObject({
      ok: false,
      field: "sweepFile",
      message: expect.stringMatching(/1 points; at least 10/),
    });
    expect(evaluateReading(conditions, MODULE, { csv: "voltage,current\n12,three\n" })).toMatchObject({
      ok: false,
      field: "sweepFile",
      message: expect.stringMatching(/Row 2/),
    });
    expect(evaluateReading(conditions, MODULE, null)).toMatchObject({ ok: false, field: "sweepFile" });
  });

  it("finds the voltage step beside the maximum power point", () => {
    const points = [0, 5, 10, 15, 16, 17, 19, 21].map((v) => ({ voltageV: v, currentA: 1 }));
    expect(kneeStepV(points, 17.2)).toBe(2);
    expect(kneeStepV(points, 15.4)).toBe(5);
  });
});
