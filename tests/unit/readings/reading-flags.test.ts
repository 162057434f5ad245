// Flag rules for field readings. Thresholds are common practice, no source (reading-flags.ts):
// each test puts a reading just either side of one threshold and checks only that flag moves.
import { describe, expect, it } from "vitest";
import { readingFlags, type FlagInput } from "~/domain/readings/reading-flags";

const GOOD: FlagInput = {
  sunElevationDeg: 55,
  incidenceDeg: 12,
  irradianceWm2: 950,
  irradianceEstimated: false,
  clearSkyPoaWm2: 980,
  airTempC: 18,
  moduleTempC: 41,
  stcPmaxW: 95,
  nameplatePmaxW: 100,
  sweep: { pointCount: 60, kneeStepV: 0.37, vocV: 22.1, iscExtrapolated: false, vocExtrapolated: false, notes: [], durationS: 0.8 },
};

const codes = (input: Partial<FlagInput>) => readingFlags({ ...GOOD, ...input }).map((f) => f.code);
const withSweep = (sweep: Partial<NonNullable<FlagInput["sweep"]>>) => codes({ sweep: { ...GOOD.sweep!, ...sweep } });

describe("reading flags", () => {
  it("raises none for a good reading", () => {
    expect(readingFlags(GOOD)).toEqual([]);
  });

  it("flags a low sun below 30°", () => {
    expect(codes({ sunElevationDeg: 30.5 })).toEqual([]);
    expect(codes({ sunElevationDeg: 29.5 })).toEqual(["sun-low"]);
  });

  it("flags irradiance under 600 W/m² with the value in the message", () => {
    expect(codes({ irradianceWm2: 600, clearSkyPoaWm2: 620 })).toEqual([]);
    const flags = readingFlags({ ...GOOD, irradianceWm2: 540, clearSkyPoaWm2: 620 });
    expect(flags.map((f) => f.code)).toEqual(["low-irradiance"]);
    expect(flags[0].message).toContain("540 W/m²");
  });

  it("flags a large angle of incidence, and a sun behind the module", () => {
    expect(codes({ incidenceDeg: 44 })).toEqual([]);
    expect(codes({ incidenceDeg: 47 })).toEqual(["high-incidence"]);
    expect(codes({ incidenceDeg: 95 })).toEqual(["sun-behind-module"]);
  });

  it("flags estimated irradiance, and measured irradiance far above a clear sky", () => {
    expect(codes({ irradianceEstimated: true })).toEqual(["irradiance-estimated"]);
    expect(codes({ irradianceWm2: 1300, clearSkyPoaWm2: 980 })).toEqual([]);
    expect(codes({ irradianceWm2: 1000, clearSkyPoaWm2: 700 })).toEqual(["irradiance-above-clear-sky"]);
  });

  it("flags a missing back-sheet temperature, and a back sheet colder than the air in sun", () => {
    expect(codes({ moduleTempC: null })).toEqual(["module-temperature-missing"]);
    expect(codes({ moduleTempC: 12 })).toEqual(["module-colder-than-air"]);
  });

  it("flags values far from nameplate", () => {
    expect(codes({ stcPmaxW: 61 })).toEqual([]);
    expect(codes({ stcPmaxW: 59 })).toEqual(["far-from-nameplate"]);
    expect(codes({ stcPmaxW: 121 })).toEqual(["far-from-nameplate"]);
  });

  it("flags sparse or coarse sweeps, slow sweeps and extrapolated ends", () => {
    expect(withSweep({ pointCount: 19 })).toEqual(["sparse-sweep"]);
    expect(withSweep({ kneeStepV: 1.2 })).toEqual(["sparse-sweep"]);
    expect(withSweep({ durationS: 5.5 })).toEqual(["slow-sweep"]);
    expect(withSweep({ durationS: null })).toEqual([]);
    const flags = readingFlags({ ...GOOD, sweep: { ...GOOD.sweep!, vocExtrapolated: true, notes: ["Voc extrapolated to 0 A by a straight line."] } });
    expect(flags.map((f) => f.code)).toEqual(["sweep-extrapolated"]);
    expect(flags[0].message).toMatch(/^Voc extrapolated: .*straight line/);
  });
});
