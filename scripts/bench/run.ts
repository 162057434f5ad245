// npm run bench — prints performance figures (no pass/fail): the engine's timings, then HTTP load on
// the production server: the bare node:http yardstick, the yield API, the catalogue API at 10 000
// modules and a signed-in page, each under 32 connections for BENCH_SECONDS (default 60) seconds.
import { spawnSync } from "node:child_process";
import { catalogueTargets, CATALOGUE_SCALE, seedCatalogueAtScale } from "./http-catalogue";
import { signedInPageTarget } from "./http-page";
import { printHttpTable, printHttpTargets, type RunResult } from "./http-report";
import { bootBenchStack } from "./http-stack";
import { bareTarget, yieldTarget } from "./http-yield";
import { load, type LoadTarget } from "./load";
import { printPlanBench } from "./plan";
import { readServerMemory } from "./server-memory";

const seconds = Number(process.env.BENCH_SECONDS ?? 60);
const CONNECTIONS = 32;

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

console.log(`\n━━ HTTP (autocannon, ${CONNECTIONS} connections, ${seconds} s per run; set BENCH_SECONDS to shorten)`);
const stack = await bootBenchStack();
try {
  console.log(`  catalogue at ${CATALOGUE_SCALE.toLocaleString("en-GB")} modules — ${seedCatalogueAtScale()}`);
  const catalogue = await catalogueTargets(stack.apiKey);
  const targets: (LoadTarget & { label: string })[] = [
    { ...bareTarget(stack.moduleId), label: "bare node:http" },
    { ...(await yieldTarget(stack)), label: "POST /api/v1/yield" },
    ...catalogue.map((target, i) => ({ ...target, label: `GET /api/v1/modules #${i + 1}` })),
    { ...(await signedInPageTarget(stack.publicUrl)), label: "GET /quotes (signed in)" },
  ];
  // A freshly started server still compiles and grows its heap: each app target is loaded briefly
  // first, so that the memory at the start of the measured runs is that of a warm server.
  const warmUpSeconds = Math.max(1, Math.round(seconds / 12));
  for (const target of targets.filter((t) => t.server === "app")) await load({ ...target, seconds: warmUpSeconds, connections: CONNECTIONS });
  console.log(
    `  (warmed up ${warmUpSeconds} s per target; between runs the app server writes a diagnostic report for its heap figure, and Node says so on stderr)`,
  );
  const results: RunResult[] = [];
  let memory = await readServerMemory(stack.serverPid);
  for (const target of targets) {
    const figures = await load({ ...target, seconds, connections: CONNECTIONS });
    if (target.server === "app") {
      const start = memory;
      memory = await readServerMemory(stack.serverPid);
      results.push({ target, figures, memory: { start, end: memory } });
    } else results.push({ target, figures });
    console.log(`  … ${target.label}: ${figures.requestsPerSecond.toFixed(0)} req/s`);
  }
  console.log("");
  printHttpTable(results);
  printHttpTargets(results);
} finally {
  stack.stop();
}
