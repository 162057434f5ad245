// The two ends and the peak of a measured I–V curve, between and beyond the sampled points.
import { fitLine } from "./line-fit";
import type { SweepPoint } from "./load-sweep";

/** The sweep must start below this share of Vmp to extrapolate Isc… */
export const MAX_START_FRACTION_OF_VMP = 0.5;
/** …and end below this share of the peak current to extrapolate Voc. */
export const MAX_END_FRACTION_OF_ISC = 0.25;
/** A point carrying less than this share of the peak current is taken as open circuit. */
export const OPEN_CIRCUIT_FRACTION_OF_ISC = 0.002;
/** Points used for the straight-line extrapolations at each end. */
const ISC_FIT_POINTS = 4;
const VOC_FIT_POINTS = 3;

function fmt(value: number): string {
  return value.toFixed(2);
}

export function shortCircuitCurrent(points: readonly SweepPoint[], vmpV: number, notes: string[]): { iscA: number; extrapolated: boolean } | string {
  const first = points[0];
  if (first.voltageV === 0) return { iscA: first.currentA, extrapolated: false };
  if (first.voltageV > MAX_START_FRACTION_OF_VMP * vmpV) {
    return `The sweep starts at ${fmt(first.voltageV)} V, too far from short circuit to estimate Isc; start it nearer 0 V.`;
  }
  // Fit only the flat part of the curve, well below the knee.
  const flat = points.filter((p) => p.voltageV <= 0.6 * vmpV).slice(0, ISC_FIT_POINTS);
  if (flat.length < 2) return "Too few points near short circuit to estimate Isc.";
  const line = fitLine(
    flat.map((p) => p.voltageV),
    flat.map((p) => p.currentA),
  );
  notes.push(`Isc extrapolated to 0 V by a straight line through the ${flat.length} lowest-voltage points (sweep starts at ${fmt(first.voltageV)} V).`);
  return { iscA: line.intercept, extrapolated: true };
}

export function openCircuitVoltage(points: readonly SweepPoint[], peakCurrentA: number, notes: string[]): { vocV: number; extrapolated: boolean } | string {
  const zeroIndex = points.findIndex((p) => p.currentA <= OPEN_CIRCUIT_FRACTION_OF_ISC * peakCurrentA);
  if (zeroIndex > 0) {
    const a = points[zeroIndex - 1];
    const b = points[zeroIndex];
    return { vocV: a.voltageV + (a.currentA * (b.voltageV - a.voltageV)) / (a.currentA - b.currentA), extrapolated: false };
  }
  const last = points[points.length - 1];
  if (last.currentA > MAX_END_FRACTION_OF_ISC * peakCurrentA) {
    return (
      `The sweep stops at ${fmt(last.voltageV)} V with ${fmt(last.currentA)} A still flowing, ` +
      "too far from open circuit to estimate Voc; continue it until the current falls near zero."
    );
  }
  const tail = points.slice(-VOC_FIT_POINTS);
  const line = fitLine(
    tail.map((p) => p.voltageV),
    tail.map((p) => p.currentA),
  );
  if (!(line.slope < 0)) return "The last points of the sweep do not fall towards open circuit; Voc cannot be estimated.";
  notes.push(
    `Voc extrapolated to 0 A by a straight line through the last ${tail.length} points (sweep stops at ${fmt(last.voltageV)} V, ${fmt(last.currentA)} A).`,
  );
  return { vocV: -line.intercept / line.slope, extrapolated: true };
}

/** Peak of V·I on the straight segment from a to b (I = Ia + s·(V − Va)). */
export function segmentPeakPower(a: SweepPoint, b: SweepPoint): { voltageV: number; powerW: number } {
  const spanV = b.voltageV - a.voltageV;
  if (spanV <= 0) return { voltageV: a.voltageV, powerW: a.voltageV * a.currentA };
  const slope = (b.currentA - a.currentA) / spanV;
  const stationaryV = slope < 0 ? (slope * a.voltageV - a.currentA) / (2 * slope) : b.voltageV;
  const voltageV = Math.min(b.voltageV, Math.max(a.voltageV, stationaryV));
  return { voltageV, powerW: voltageV * (a.currentA + slope * (voltageV - a.voltageV)) };
}
