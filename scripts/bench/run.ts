// npm run bench — prints performance figures (no pass/fail): the engine's timings, then HTTP load
// on the production server. BENCH_SECONDS sets each HTTP run's length (default 10).
import { spawnSync } from "node:child_process";
import { bootBenchStack } from "./http-stack";
import { benchYieldApi, rssMb, type LoadFigures } from "./http-yield";
import { printPlanBench } from "./plan";

const seconds = Number(process.env.BENCH_SECONDS ?? 10);

function row(name: string, f: LoadFigures) {
  return `  ${name.padEnd(26)} ${f.requestsPerSecond.toFixed(0).padStart(7)} req/s   p50 ${f.p50Ms.toFixed(1).padStart(6)} ms   p95 ${f.p95Ms.toFixed(1).padStart(6)} ms   p99 ${f.p99Ms.toFixed(1).padStart(6)} ms   errors ${f.errors}   non-2xx ${f.non2xx}`;
}

console.log("━━ Engine (pure TypeScript, one core)");
spawnSync("node_modules/.bin/tsx", ["scripts/bench/engine.ts"], { stdio: "inherit" });

console.log("\n━━ Kit plan (pure TypeScript, one core)");
printPlanBench();

console.log("\n━━ Field readings (pure TypeScript, one core)");
(await import("./readings")).printReadingsBench();

console.log("\n━━ Sourcing (pure TypeScript, one core)");
(await import("./sourcing")).printSourcingBench();

console.log("\n━━ Kit alternatives (pure TypeScript, one core)");
(await import("./alternatives")).printAlternativesBench();

console.log(`\n━━ HTTP (autocannon, 32 connections, ${seconds} s per run)`);
const stack = await bootBenchStack();
try {
  const memoryStartMb = rssMb(stack.serverPid);
  const yieldRun = await benchYieldApi(stack.apiKey, stack.moduleId, seconds);
  console.log(row("bare node:http JSON", yieldRun.bare));
  console.log(row("POST /api/v1/yield", yieldRun.api));
  console.log(`  ratio (yield API / bare)   ${yieldRun.ratio.toFixed(3)}   (target ≥ 0.10 with p99 < 50 ms)`);
  console.log(`  app server memory (RSS)    ${memoryStartMb.toFixed(0)} MB at start → ${rssMb(stack.serverPid).toFixed(0)} MB at end`);
  await (await import("./http-catalogue")).reportCatalogueBench({ apiKey: stack.apiKey, seconds });
} finally {
  stack.stop();
}
