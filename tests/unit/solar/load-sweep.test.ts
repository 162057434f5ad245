import { describe, expect, it } from "vitest";
import { currentAtVoltageA, explicitIvModel, modelMaximumPowerW } from "~/domain/solar/iv-model";
import { MIN_SWEEP_POINTS, analyzeLoadSweep, type SweepPoint } from "~/domain/solar/load-sweep";

// Synthetic sweeps drawn from the explicit I–V model of an invented 36-cell module: the known
// answers are the model's own Isc, Voc and (analytic, brute-force-checked) maximum power point.
const MODEL = explicitIvModel({ vocV: 22.1, iscA: 5.9, vmpV: 18.2, impA: 5.5 });
const TRUE_MPP = modelMaximumPowerW(MODEL);
const TRUE_FF = TRUE_MPP.pmaxW / (22.1 * 5.9);

function sweep(fromV: number, toV: number, count: number, noise = 0): SweepPoint[] {
  let seed = 12345;
  const jitter = () => {
    seed = (seed * 16807) % 2147483647;
    return (seed / 2147483647 - 0.5) * 2; // deterministic, −1…1
  };
  return Array.from({ length: count }, (_, i) => {
    const voltageV = fromV + ((toV - fromV) * i) / (count - 1);
    return { voltageV, currentA: currentAtVoltageA(MODEL, voltageV) + noise * jitter() };
  });
}

function voltageWhereCurrentFallsTo(currentA: number): number {
  let low = 0;
  let high = 22.1;
  for (let i = 0; i < 60; i++) {
    const mid = (low + high) / 2;
    if (currentAtVoltageA(MODEL, mid) > currentA) low = mid;
    else high = mid;
  }
  return low;
}

describe("load-sweep analysis", () => {
  it("reads Pmax, Vmp, Imp, Voc, Isc and FF from a complete sweep", () => {
    // Synthetic curve, known answers (common practice, no source for the tolerances: 0.1 % on
    // Pmax, 1 % on Vmp with 60 points 0.37 V apart).
    const result = analyzeLoadSweep(sweep(0, 22.1, 60));
    if (!result.ok) throw new Error(result.reason);
    expect(Math.abs(result.pmaxW / TRUE_MPP.pmaxW - 1)).toBeLessThan(0.001);
    expect(Math.abs(result.vmpV / TRUE_MPP.vmpV - 1)).toBeLessThan(0.01);
    expect(result.impA).toBeCloseTo(result.pmaxW / result.vmpV, 12);
    expect(result.iscA).toBe(5.9);
    expect(Math.abs(result.vocV - 22.1)).toBeLessThan(0.01);
    expect(Math.abs(result.fillFactor - TRUE_FF)).toBeLessThan(0.002);
    expect(result.iscExtrapolated).toBe(false);
    expect(result.vocExtrapolated).toBe(false);
    expect(result.notes).toEqual([]);
  });

  it("extrapolates Isc and Voc when the sweep stops short, and says so", () => {
    // Starts at 0.8 V, stops where 15 % of Isc still flows. The straight line through the last
    // points overshoots Voc on this concave curve: accepted within 2 % (common practice, no source).
    const endV = voltageWhereCurrentFallsTo(0.15 * 5.9);
    const result = analyzeLoadSweep(sweep(0.8, endV, 30));
    if (!result.ok) throw new Error(result.reason);
    expect(result.iscExtrapolated).toBe(true);
    expect(result.vocExtrapolated).toBe(true);
    expect(Math.abs(result.iscA / 5.9 - 1)).toBeLessThan(0.005);
    expect(result.vocV).toBeGreaterThan(22.1);
    expect(Math.abs(result.vocV / 22.1 - 1)).toBeLessThan(0.02);
    expect(result.notes.join(" ")).toMatch(/Isc extrapolated/);
    expect(result.notes.join(" ")).toMatch(/Voc extrapolated/);
    expect(Math.abs(result.pmaxW / TRUE_MPP.pmaxW - 1)).toBeLessThan(0.002);
  });

  it("tolerates meter noise of ±0.5 % of Isc", () => {
    const result = analyzeLoadSweep(sweep(0, 22.1, 80, 0.005 * 5.9));
    if (!result.ok) throw new Error(result.reason);
    expect(Math.abs(result.pmaxW / TRUE_MPP.pmaxW - 1)).toBeLessThan(0.01);
    expect(Math.abs(result.iscA / 5.9 - 1)).toBeLessThan(0.01);
  });

  it("accepts points in any order", () => {
    const ordered = analyzeLoadSweep(sweep(0, 22.1, 40));
    const shuffled = analyzeLoadSweep([...sweep(0, 22.1, 40)].reverse());
    expect(shuffled).toEqual(ordered);
  });

  const full = sweep(0, 22.1, 40);
  const rejections: Array<[string, SweepPoint[], RegExp]> = [
    ["too sparse", sweep(0, 22.1, MIN_SWEEP_POINTS - 1), /at least 10/],
    ["current rising with voltage", full.map((p, i) => (i === 25 ? { ...p, currentA: p.currentA + 1 } : p)), /Current rises/],
    ["negative current", full.map((p, i) => (i === 39 ? { ...p, currentA: -1 } : p)), /negative current/],
    ["negative voltage", full.map((p, i) => (i === 0 ? { ...p, voltageV: -3 } : p)), /negative voltage/],
    ["not a number", full.map((p, i) => (i === 5 ? { ...p, currentA: Number.NaN } : p)), /not a number/],
    ["stops before the maximum power point", sweep(0, 0.8 * 18.2, 30), /does not pass the maximum power point/],
    ["starts too far from short circuit", sweep(12, 22.1, 30), /too far from short circuit/],
    ["stops too far from open circuit", sweep(0, voltageWhereCurrentFallsTo(0.5 * 5.9), 30), /too far from open circuit/],
    [
      "fill factor too high (a rectangle)",
      Array.from({ length: 20 }, (_, i) => ({ voltageV: i, currentA: i < 19 ? 5 : 0 })),
      /Fill factor 0\.9[0-9] is outside/,
    ],
    [
      "fill factor too low (a sagging curve)",
      Array.from({ length: 30 }, (_, i) => ({ voltageV: (20 * i) / 29, currentA: 5 * (1 - i / 29) ** 2 })),
      /Fill factor 0\.1[0-9] is outside/,
    ],
    ["no current", full.map((p) => ({ ...p, currentA: 0 })), /No current/],
  ];
  it.each(rejections)("rejects a sweep that is %s, in plain words", (_label, points, reason) => {
    const result = analyzeLoadSweep(points);
    expect(result.ok).toBe(false);
    if (!result.ok) expect(result.reason).toMatch(reason);
  });
});
