// The HTTP part of `npm run bench` as one table: throughput, latency, failures and the app server's
// memory before and after each run, then each target said in words.
import type { LoadFigures, LoadTarget } from "./load";
import type { ServerMemory } from "./server-memory";

export interface RunResult {
  target: LoadTarget & { label: string };
  figures: LoadFigures;
  /** The app server's memory before and after the run; none for the bare yardstick. The V8 heap
   * figure counts garbage not yet collected, so it swings with the collector; RSS shows growth. */
  memory?: { start: ServerMemory; end: ServerMemory };
}

const num = (value: number, digits = 1, width = 8) => (Number.isFinite(value) ? value.toFixed(digits) : "–").padStart(width);
const span = (from: number | null, to: number | null) => (from === null || to === null ? "n/a" : `${from.toFixed(0)} → ${to.toFixed(0)}`).padStart(12);

export function printHttpTable(results: RunResult[]) {
  console.log(
    `  ${"run".padEnd(28)}${"req/s".padStart(8)}${"p50 ms".padStart(8)}${"p95 ms".padStart(8)}${"p99 ms".padStart(8)}${"errors".padStart(8)}${"non-2xx".padStart(9)}${"RSS MB".padStart(14)}${"heap MB".padStart(14)}`,
  );
  for (const { target, figures: f, memory: m } of results) {
    console.log(
      `  ${target.label.padEnd(28)}${num(f.requestsPerSecond, 0)}${num(f.p50Ms)}${num(f.p95Ms)}${num(f.p99Ms)}${num(f.errors, 0)}${num(f.non2xx, 0, 9)}` +
        (m ? `  ${span(m.start.rssMb, m.end.rssMb)}  ${span(m.start.heapUsedMb, m.end.heapUsedMb)}` : `${"—".padStart(14)}${"—".padStart(14)}`),
    );
  }
  console.log("");
  for (const { target } of results) console.log(`  ${target.label.padEnd(28)}${target.name}`);
}

const verdict = (met: boolean) => (met ? "met" : "NOT met");

export function printHttpTargets(results: RunResult[]) {
  const byServer = (server: "app" | "bare") => results.filter((r) => r.target.server === server);
  const bare = byServer("bare")[0]?.figures;
  const yieldRun = results.find((r) => r.target.url.endsWith("/api/v1/yield"))?.figures;
  const catalogue = results.filter((r) => r.target.url.includes("/api/v1/modules"));
  console.log("");
  if (bare && yieldRun) {
    const ratio = yieldRun.requestsPerSecond / bare.requestsPerSecond;
    const met = ratio >= 0.1 && yieldRun.p99Ms < 50;
    console.log(`  yield API / bare req/s ratio ${ratio.toFixed(3)}, p99 ${yieldRun.p99Ms.toFixed(1)} ms   (target ≥ 0.10 with p99 < 50 ms: ${verdict(met)})`);
  }
  if (catalogue.length) {
    const worst = Math.max(...catalogue.map((r) => r.figures.p95Ms));
    console.log(`  catalogue API worst p95 ${worst.toFixed(1)} ms   (target < 50 ms: ${verdict(worst < 50)})`);
  }
  const failures = results.reduce((n, r) => n + r.figures.errors + r.figures.non2xx, 0);
  console.log(`  errors + non-2xx over all runs: ${failures}   (target 0: ${verdict(failures === 0)})`);
  const app = byServer("app").filter((r) => r.memory);
  if (app.length) {
    const first = app[0].memory!.start;
    const last = app[app.length - 1].memory!.end;
    const heap = first.heapUsedMb !== null && last.heapUsedMb !== null ? `, V8 heap used ${span(first.heapUsedMb, last.heapUsedMb).trim()} MB` : "";
    console.log(
      `  app server memory, warm, from the first run to the last: RSS ${span(first.rssMb, last.rssMb).trim()} MB, anonymous ${span(first.anonMb, last.anonMb).trim()} MB${heap}   (target: flat)`,
    );
  }
}
