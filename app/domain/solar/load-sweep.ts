// Key figures of a measured I–V curve (a load sweep: pairs of voltage and current read while a
// variable load walks the module from short circuit to open circuit). Checks on the sweep are
// common practice, no source; thresholds are stated beside each one.
import { openCircuitVoltage, segmentPeakPower, shortCircuitCurrent } from "./sweep-ends";

/** Fewer points than this cannot locate the knee of the curve. */
export const MIN_SWEEP_POINTS = 10;
/** A current rise (or a negative reading) larger than this share of the peak is not noise. */
export const SWEEP_NOISE_FRACTION = 0.03;
export const FILL_FACTOR_MIN = 0.25;
export const FILL_FACTOR_MAX = 0.9;

export interface SweepPoint {
  voltageV: number;
  currentA: number;
}

export type SweepAnalysis =
  | {
      ok: true;
      pmaxW: number;
      vmpV: number;
      impA: number;
      vocV: number;
      iscA: number;
      fillFactor: number;
      iscExtrapolated: boolean;
      vocExtrapolated: boolean;
      pointCount: number;
      notes: string[];
    }
  | { ok: false; reason: string };

function fail(reason: string): SweepAnalysis {
  return { ok: false, reason };
}

function fmt(value: number, digits = 2): string {
  return value.toFixed(digits);
}

export function analyzeLoadSweep(input: readonly SweepPoint[]): SweepAnalysis {
  if (input.length < MIN_SWEEP_POINTS) {
    return fail(`The sweep has ${input.length} points; at least ${MIN_SWEEP_POINTS} are needed to find the maximum power point.`);
  }
  if (input.some((p) => !Number.isFinite(p.voltageV) || !Number.isFinite(p.currentA))) {
    return fail("The sweep contains a value that is not a number.");
  }
  const peakVoltageV = Math.max(...input.map((p) => p.voltageV));
  const negativeV = input.find((p) => p.voltageV < -SWEEP_NOISE_FRACTION * peakVoltageV);
  if (negativeV) return fail(`The sweep contains a negative voltage (${fmt(negativeV.voltageV)} V); check the probe polarity.`);
  const peakCurrentA = Math.max(...input.map((p) => p.currentA));
  if (!(peakCurrentA > 0)) return fail("No current was measured; the module was not connected or not in the sun.");
  const noiseA = SWEEP_NOISE_FRACTION * peakCurrentA;
  const negativeI = input.find((p) => p.currentA < -noiseA);
  if (negativeI) {
    return fail(`The sweep contains a negative current (${fmt(negativeI.currentA)} A); a module under load only delivers current.`);
  }

  // Sort by voltage; tiny negative readings at either end are meter offset, read as zero.
  const points = [...input].map((p) => ({ voltageV: Math.max(0, p.voltageV), currentA: Math.max(0, p.currentA) })).sort((a, b) => a.voltageV - b.voltageV);

  let runningMinA = points[0].currentA;
  for (let k = 1; k < points.length; k++) {
    const p = points[k];
    if (p.currentA > runningMinA + noiseA) {
      return fail(
        `Current rises from ${fmt(runningMinA)} A to ${fmt(p.currentA)} A as the voltage goes up to ${fmt(p.voltageV)} V; ` +
          "a module's current only falls as voltage rises. The sun or the load probably changed during the sweep.",
      );
    }
    runningMinA = Math.min(runningMinA, p.currentA);
  }

  const powers = points.map((p) => p.voltageV * p.currentA);
  let best = 0;
  for (let k = 1; k < powers.length; k++) if (powers[k] > powers[best]) best = k;
  if (best === 0 || best === points.length - 1) {
    return fail("The highest power is at the sweep's first or last point, so the sweep does not pass the maximum power point.");
  }
  // Between samples, read the curve as straight segments: on a segment P = V·I is a parabola
  // whose peak is found exactly. Unlike a parabola through three powers, this never invents
  // power beyond the measured currents at a sharp knee.
  let vmpV = points[best].voltageV;
  let pmaxW = powers[best];
  for (const [a, b] of [
    [points[best - 1], points[best]],
    [points[best], points[best + 1]],
  ]) {
    const peak = segmentPeakPower(a, b);
    if (peak.powerW > pmaxW) {
      pmaxW = peak.powerW;
      vmpV = peak.voltageV;
    }
  }
  const impA = pmaxW / vmpV;

  const notes: string[] = [];
  const isc = shortCircuitCurrent(points, vmpV, notes);
  if (typeof isc === "string") return fail(isc);
  const voc = openCircuitVoltage(points, peakCurrentA, notes);
  if (typeof voc === "string") return fail(voc);

  const fillFactor = pmaxW / (voc.vocV * isc.iscA);
  if (fillFactor > FILL_FACTOR_MAX || fillFactor < FILL_FACTOR_MIN) {
    return fail(
      `Fill factor ${fmt(fillFactor)} is outside ${FILL_FACTOR_MIN}–${FILL_FACTOR_MAX}; no working module gives such a curve. ` +
        "Check the columns (voltage, current) and their units.",
    );
  }
  return {
    ok: true,
    pmaxW,
    vmpV,
    impA,
    vocV: voc.vocV,
    iscA: isc.iscA,
    fillFactor,
    iscExtrapolated: isc.extrapolated,
    vocExtrapolated: voc.extrapolated,
    pointCount: points.length,
    notes,
  };
}
