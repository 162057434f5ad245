// Benchmark of the solar yield engine (invented site and module data only).
// Run: npx tsx scripts/bench/engine.ts
import { performance } from "node:perf_hooks";
import { estimateMonthlyYield, prepareSiteProfile, rankModulesForSite } from "../../app/domain/solar/monthly-yield";
import type { ModuleSpec, SiteInput } from "../../app/domain/solar/yield-types";

const site: SiteInput = {
  latitudeDeg: 46.2,
  longitudeDeg: 7.4,
  tiltDeg: 45,
  azimuthDeg: 175,
  albedo: 0.2,
  months: [1.3, 2.1, 3.3, 4.4, 5.1, 5.7, 5.9, 5.0, 3.8, 2.5, 1.4, 1.1].map((ghi, i) => ({
    ...(i % 4 === 3 ? { clearnessIndex: 0.5 } : { ghiKWhM2Day: ghi }),
    tMaxC: [2, 4, 9, 13, 18, 22, 25, 24, 19, 13, 6, 2][i],
    tMinC: [-6, -5, -1, 3, 7, 11, 13, 12, 9, 4, -1, -4][i],
    albedo: i < 2 || i === 11 ? 0.6 : undefined,
  })),
};

const module: ModuleSpec = {
  pmaxW: 100,
  vmpV: 18.2,
  impA: 5.5,
  vocV: 22.1,
  iscA: 5.9,
  gammaPmaxPctPerC: -0.4,
  betaVocPctPerC: -0.3,
  alphaIscPctPerC: 0.05,
  noctC: 45,
};
const losses = { soiling: 2, mismatch: 2, wiring: 1 };

/** 1 000 invented modules, varied deterministically. */
function generateModules(count: number): ModuleSpec[] {
  let seed = 42;
  const random = () => {
    seed = (seed * 16807) % 2147483647;
    return seed / 2147483647;
  };
  return Array.from({ length: count }, () => {
    const cells = [32, 36, 60, 72][Math.floor(random() * 4)];
    const vmpV = cells * (0.5 + 0.04 * random());
    const impA = 4 + 6 * random();
    return {
      pmaxW: vmpV * impA,
      vmpV,
      impA,
      vocV: vmpV * (1.18 + 0.06 * random()),
      iscA: impA * (1.04 + 0.05 * random()),
      gammaPmaxPctPerC: -0.3 - 0.2 * random(),
      betaVocPctPerC: -0.25 - 0.1 * random(),
      alphaIscPctPerC: 0.03 + 0.04 * random(),
      noctC: 42 + 8 * random(),
    };
  });
}

function median(values: number[]): number {
  const sorted = [...values].sort((a, b) => a - b);
  return sorted[Math.floor(sorted.length / 2)];
}

function time(runs: number, work: () => void): number {
  for (let i = 0; i < Math.min(50, runs); i++) work(); // warm-up for the JIT
  const samples: number[] = [];
  for (let i = 0; i < runs; i++) {
    const start = performance.now();
    work();
    samples.push(performance.now() - start);
  }
  return median(samples);
}

let sink = 0;
for (const kind of ["mppt", "pwm"] as const) {
  const controller = { kind, batteryVoltageV: 12, efficiencyPct: 97 };
  const oneMs = time(2000, () => {
    sink += estimateMonthlyYield({ site, module, controller, lossesPct: losses }).annualKWh;
  });
  console.log(`one site × one module × 12 months (${kind}, incl. assumptions): ${oneMs.toFixed(3)} ms (median of 2000)`);
}

const modules = generateModules(1000);
for (const kind of ["mppt", "pwm"] as const) {
  const controller = { kind, batteryVoltageV: 12, efficiencyPct: 97 };
  const rankMs = time(50, () => {
    const profile = prepareSiteProfile(site);
    sink += rankModulesForSite(profile, modules, controller, losses)[0].annualKWh;
  });
  console.log(`rank 1 000 modules for one site (${kind}, incl. site profile): ${rankMs.toFixed(2)} ms (median of 50)`);
}
const profileMs = time(2000, () => {
  sink += prepareSiteProfile(site).months.length;
});
console.log(`prepare the site profile alone: ${profileMs.toFixed(3)} ms (median of 2000)`);
if (Number.isNaN(sink)) console.log("unexpected NaN");
