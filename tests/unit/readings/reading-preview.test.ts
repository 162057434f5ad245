// The live preview's reading of half-filled forms (our own rules, common practice, no source):
// it names what is still missing, and passes the engine's refusal on with its field.
import { describe, expect, it } from "vitest";
import { previewReading, previewSweep } from "~/lib/reading-preview";

const MODULE = { pmaxW: 100, gammaPmaxPctPerC: -0.4, noctC: 45 };
const FILLED = {
  kind: "single",
  measuredPmaxW: "80",
  takenAtLocal: "2026-06-14T13:10",
  utcOffsetH: "2",
  latitudeDeg: "46.4",
  longitudeDeg: "9.8",
  tiltDeg: "35",
  azimuthDeg: "180",
  airTempC: "21",
  moduleTempC: "43",
  irradianceSource: "pyranometer",
  irradianceWm2: "940",
};
const NOW = new Date("2026-12-01T00:00:00Z");

describe("reading preview", () => {
  it("lists what is still missing", () => {
    expect(previewReading({ kind: "sweep" }, null, null, NOW)).toEqual({
      state: "incomplete",
      missing: ["module", "sweep CSV", "time of the reading", "UTC offset", "latitude", "longitude", "tilt", "azimuth", "air temperature", "irradiance source"],
    });
    expect(previewReading({ ...FILLED, measuredPmaxW: "", irradianceWm2: "" }, null, MODULE, NOW)).toEqual({
      state: "incomplete",
      missing: ["measured power (or voltage and current)", "measured irradiance"],
    });
    // Voltage and current stand in for the power; a clear-sky estimate needs no irradiance.
    const byVi = previewReading(
      { ...FILLED, measuredPmaxW: "", measuredVoltageV: "17", measuredCurrentA: "4.7", irradianceSource: "clear-sky-estimate", irradianceWm2: "" },
      null,
      MODULE,
      NOW,
    );
    expect(byVi.state).toBe("ok");
  });

  it("gives the same STC value as the engine, and the engine's refusal with its field", () => {
    const ok = previewReading(FILLED, null, MODULE, NOW);
    if (ok.state !== "ok") throw new Error(JSON.stringify(ok));
    // P·(1000/G)/(1 + γ(Tc − 25)) with Tc = 43 + 0.94·3 (King et al. 2004).
    expect(ok.evaluation.reading.stcPmaxW).toBeCloseTo((80 * (1000 / 940)) / (1 - 0.004 * (43 + 0.94 * 3 - 25)), 9);
    expect(previewReading({ ...FILLED, takenAtLocal: "2026-06-14T01:00" }, null, MODULE, NOW)).toMatchObject({ state: "error", field: "takenAtLocal" });
  });

  it("reads a sweep on its own, before the rest of the form is filled", () => {
    expect(previewSweep(null)).toEqual({ state: "none" });
    expect(previewSweep("voltage,current\n1,oops\n")).toEqual({ state: "error", message: 'Row 2: current "oops" is not a number.' });
  });
});
