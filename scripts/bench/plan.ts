// Benchmark of one full kit plan (12 months of yield + layouts + battery + cables + a 365-day simulated
// year), invented site and parts only. Run: npx tsx scripts/bench/plan.ts — target < 20 ms per plan.
// benchPlan() is exported so npm run bench can print the same figures.
import { performance } from "node:perf_hooks";
import { pathToFileURL } from "node:url";
import { planKit, planKitForSite, preparePlanSite } from "../../app/domain/sizing/kit-plan";
import type { KitPlanInput } from "../../app/domain/sizing/plan-types";

const T_MAX_C = [-1, 1, 5, 9, 14, 18, 21, 20, 16, 11, 4, 0];
const T_MIN_C = [-9, -8, -4, 0, 4, 8, 10, 10, 6, 2, -3, -7];
const GHI = [1.4, 2.3, 3.5, 4.5, 5.2, 5.8, 5.9, 5.0, 3.8, 2.5, 1.5, 1.1];

/** An invented mountain-hut kit: 24 V, MPPT, LiFePO4, an inverter for a fridge and tools. */
export function benchPlanInput(): KitPlanInput {
  return {
    site: {
      latitudeDeg: 46.4,
      longitudeDeg: 9.8,
      tiltDeg: 55,
      azimuthDeg: 180,
      albedo: 0.2,
      months: GHI.map((ghi, i) => ({ ghiKWhM2Day: ghi, tMaxC: T_MAX_C[i], tMinC: T_MIN_C[i], albedo: i < 2 || i === 11 ? 0.7 : undefined })),
      coldestTempC: -22,
      shadingDeratePct: 3,
    },
    appliances: [
      { name: "Fridge", powerW: 60, quantity: 1, hoursPerDay: 10, daysPerWeek: 7, circuit: "ac", surgeW: 400 },
      { name: "Lights", powerW: 8, quantity: 10, hoursPerDay: 5, daysPerWeek: 7, circuit: "dc" },
      { name: "Water pump", powerW: 500, quantity: 1, hoursPerDay: 0.5, daysPerWeek: 7, circuit: "ac", surgeW: 1500 },
      { name: "Radio", powerW: 15, quantity: 1, hoursPerDay: 12, daysPerWeek: 7, circuit: "dc" },
      { name: "Power tools", powerW: 900, quantity: 1, hoursPerDay: 1, daysPerWeek: 2, circuit: "ac", surgeW: 2000, months: [5, 6, 7, 8, 9] },
    ],
    systemVoltageV: 24,
    parts: {
      module: {
        pmaxW: 200,
        vmpV: 19.2,
        impA: 10.42,
        vocV: 23.1,
        iscA: 11.05,
        gammaPmaxPctPerC: -0.38,
        betaVocPctPerC: -0.29,
        alphaIscPctPerC: 0.05,
        noctC: 45,
        cellsInSeries: 36,
        verifiedPmaxW: 186,
        verifiedReadingCount: 5,
      },
      controller: {
        kind: "mppt",
        batteryVoltagesV: [12, 24, 48],
        maxPvVocV: 150,
        maxChargeCurrentA: 60,
        maxPvPowerW: { "12": 800, "24": 1600, "48": 3200 },
        efficiencyPct: 97,
      },
      battery: {
        chemistry: "lifepo4",
        nominalVoltageV: 12,
        capacityAh: 200,
        capacityHourRateH: 5,
        usableDodPct: 85,
        cycleLife: 4000,
        roundTripEfficiencyPct: 95,
      },
      inverter: { continuousW: 2000, surgeW: 4000, dcInputVoltageV: 24, efficiencyPct: 92, idleDrawW: 12 },
    },
    design: {
      autonomyDays: 3,
      designMarginPct: 20,
      powerBasis: "verified",
      voltageDropTargetPct: 3,
      conductorSystem: "mm2",
      cableRuns: {
        arrayToController: { oneWayLengthM: 15 },
        controllerToBattery: { oneWayLengthM: 2 },
        batteryToInverter: { oneWayLengthM: 1.5, voltageDropTargetPct: 2 },
      },
      lossesPct: { soiling: 2, mismatch: 2, wiring: 1 },
    },
  };
}

function median(values: number[]): number {
  const sorted = [...values].sort((a, b) => a - b);
  return sorted[Math.floor(sorted.length / 2)];
}

function time(runs: number, work: () => void): number {
  for (let i = 0; i < Math.min(30, runs); i++) work(); // warm-up for the JIT
  const samples: number[] = [];
  for (let i = 0; i < runs; i++) {
    const start = performance.now();
    work();
    samples.push(performance.now() - start);
  }
  return median(samples);
}

export interface PlanBenchFigures {
  fullPlanMs: number;
  planOnPreparedSiteMs: number;
  firstCallMs: number;
}

export function benchPlan(runs = 300): PlanBenchFigures {
  const input = benchPlanInput();
  let sink = 0;
  const firstStart = performance.now();
  sink += planKit(input).simulation.unmetDays;
  const firstCallMs = performance.now() - firstStart;
  const fullPlanMs = time(runs, () => {
    sink += planKit(input).simulation.unmetDays;
  });
  const prepared = preparePlanSite(input.site);
  const planOnPreparedSiteMs = time(runs, () => {
    sink += planKitForSite(prepared, input).simulation.unmetDays;
  });
  if (Number.isNaN(sink)) console.log("unexpected NaN");
  return { fullPlanMs, planOnPreparedSiteMs, firstCallMs };
}

export function printPlanBench(runs = 300): void {
  const f = benchPlan(runs);
  console.log(`one full kit plan (12 months + 365-day simulation): ${f.fullPlanMs.toFixed(2)} ms (median of ${runs}; target < 20 ms)`);
  console.log(`  the same on a prepared site (comparing kits): ${f.planOnPreparedSiteMs.toFixed(2)} ms (median of ${runs})`);
  console.log(`  first call, cold JIT: ${f.firstCallMs.toFixed(1)} ms`);
}

if (import.meta.url === pathToFileURL(process.argv[1] ?? "").href) printPlanBench();
