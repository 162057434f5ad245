// GET /api/v1/modules with filters and sorts at catalogue scale: the bench database (already seeded
// with the demo) gets 10 000 generated modules and 100 000 approved readings, then each query runs
// under 32 connections with a team API key. Target: p95 < 50 ms.
import { spawnSync } from "node:child_process";
import { BENCH_PORTS } from "./http-stack";
import { load, type LoadFigures } from "./http-yield";
import { appEnv } from "../lib/services";
import { databaseUrl } from "../../tests/setup/test-env";

export const CATALOGUE_SCALE = 10_000;

/** What an installer's screen asks most: filters plus a sort on a derived column, one page deep. */
export const CATALOGUE_QUERIES: { name: string; query: string }[] = [
  {
    name: "technology + W range + has readings, by verified ratio",
    query: "technology=mono-PERC&minW=100&maxW=400&hasReadings=true&sort=verifiedRatio&dir=asc&limit=50",
  },
  { name: "ratio below 0.9, by measured W/m², page 11", query: "ratioBelow=0.9&sort=measuredDensityWm2&dir=desc&limit=50&offset=500" },
  { name: "search a model code + W range, by nameplate W", query: "q=GM-0042&minW=50&sort=pmaxW&dir=desc&limit=50" },
];

export interface CatalogueBenchRun {
  name: string;
  query: string;
  total: number;
  figures: LoadFigures;
}

/** The database bootBenchStack made (scripts/bench/http-stack.ts). */
export const BENCH_DATABASE_URL = databaseUrl("kitwright_bench");

export async function benchCatalogueApi(opts: { apiKey: string; seconds: number; databaseUrl?: string; log?: (line: string) => void }) {
  const log = opts.log ?? console.log;
  const seeded = spawnSync("node_modules/.bin/tsx", ["scripts/seed.ts", "--scale", String(CATALOGUE_SCALE)], {
    stdio: ["ignore", "pipe", "inherit"],
    encoding: "utf8",
    env: { ...process.env, ...appEnv(BENCH_PORTS, opts.databaseUrl ?? BENCH_DATABASE_URL) },
  });
  if (seeded.status !== 0) throw new Error("seeding the catalogue at scale failed");
  const scaleLine = seeded.stdout.split("\n").find((l) => l.startsWith("scale:"));
  if (scaleLine) log(`  ${scaleLine}`);

  const headers = { Authorization: `Bearer ${opts.apiKey}` };
  const runs: CatalogueBenchRun[] = [];
  for (const { name, query } of CATALOGUE_QUERIES) {
    const url = `http://127.0.0.1:${BENCH_PORTS.app}/api/v1/modules?${query}`;
    const check = await fetch(url, { headers });
    const body = (await check.json()) as { total?: number; items?: unknown[] };
    if (check.status !== 200 || !body.items?.length)
      throw new Error(`catalogue API answered ${check.status} with ${body.items?.length ?? 0} items for ${query}`);
    runs.push({ name, query, total: body.total ?? 0, figures: await load({ url, headers, seconds: opts.seconds }) });
  }
  return runs;
}

/** Runs the catalogue benchmark and prints one row per query, as `npm run bench` prints the others. */
export async function reportCatalogueBench(opts: { apiKey: string; seconds: number; databaseUrl?: string }) {
  console.log(
    `\n━━ Catalogue API at ${CATALOGUE_SCALE.toLocaleString("en-GB")} modules (autocannon, 32 connections, ${opts.seconds} s per query; target p95 < 50 ms)`,
  );
  for (const run of await benchCatalogueApi(opts)) {
    const f = run.figures;
    console.log(`  ${run.name} (${run.total} matching)`);
    console.log(
      `    ${f.requestsPerSecond.toFixed(0).padStart(7)} req/s   p50 ${f.p50Ms.toFixed(1).padStart(6)} ms   p95 ${f.p95Ms.toFixed(1).padStart(6)} ms   p99 ${f.p99Ms.toFixed(1).padStart(6)} ms   errors ${f.errors}   non-2xx ${f.non2xx}`,
    );
  }
}
