// Kit-alternatives figures: candidate kits evaluated per second and the whole search on the demo
// catalogue (each demo site) and on a catalogue ten times as large. Pure TypeScript, one core,
// invented data. Run alone: npx tsx scripts/bench/alternatives.ts
import { performance } from "node:perf_hooks";
import { pathToFileURL } from "node:url";
import { preparePlanSite } from "../../app/domain/sizing/kit-plan";
import { searchAlternatives } from "../../app/domain/sourcing/alternatives/search";
import { DEMO_SITES } from "../../data/demo/sites";
import { demoAlternativesInput } from "./alternatives-demo";

function timeSearch(siteIndex: number, copies: number) {
  const input = demoAlternativesInput(siteIndex, copies);
  searchAlternatives(input); // warm-up (JIT)
  const started = performance.now();
  const result = searchAlternatives(input);
  const totalMs = performance.now() - started;
  // The enumeration alone: the same search with no full re-check at the end.
  const prepared = preparePlanSite(input.base.site);
  const t0 = performance.now();
  const bare = searchAlternatives({ ...input, topN: 0 }, prepared);
  const enumerateMs = performance.now() - t0;
  const parts = `${input.modules.length}/${input.controllers.length}/${input.batteries.length}/${input.inverters.length}`;
  return { result, totalMs, enumerateMs, considered: bare.considered, parts };
}

export function printAlternativesBench() {
  let best = 0;
  for (const [i, demo] of DEMO_SITES.entries()) {
    for (const copies of [1, 10]) {
      const t = timeSearch(i, copies);
      const rate = t.considered / (t.enumerateMs / 1000);
      best = Math.max(best, rate);
      console.log(
        `  ${(copies === 1 ? "demo" : "10× catalogue").padEnd(14)} ${demo.plan.name.padEnd(24)} parts m/c/b/i ${t.parts.padEnd(12)} ${String(t.considered).padStart(9)} candidates, ` +
          `${t.totalMs.toFixed(1).padStart(8)} ms whole search (${t.result.fullChecks} full re-plans), ${(rate / 1e6).toFixed(2)} M candidates/s enumerating`,
      );
    }
  }
  console.log(
    `  candidate kits evaluated per second (best run, enumeration incl. per-site precompute): ${(best / 1e6).toFixed(2)} M/s   (target ≥ 1 M/s; whole demo search target < 1000 ms)`,
  );
}

if (import.meta.url === pathToFileURL(process.argv[1]).href) printAlternativesBench();
