// GET /api/v1/modules with filters and sorts at catalogue scale: the bench database (already seeded
// with the demo) gets 10 000 generated modules and 100 000 approved readings, then each query is
// loaded with a team API key. Target: p95 < 50 ms.
import { spawnSync } from "node:child_process";
import { BENCH_PORTS } from "./http-stack";
import type { LoadTarget } from "./load";
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

/** The database bootBenchStack made (scripts/bench/http-stack.ts). */
export const BENCH_DATABASE_URL = databaseUrl("kitwright_bench");

/** Adds the generated modules and readings; returns the seed script's summary line. */
export function seedCatalogueAtScale(databaseUrl = BENCH_DATABASE_URL) {
  const seeded = spawnSync("node_modules/.bin/tsx", ["scripts/seed.ts", "--scale", String(CATALOGUE_SCALE)], {
    stdio: ["ignore", "pipe", "inherit"],
    encoding: "utf8",
    env: { ...process.env, ...appEnv(BENCH_PORTS, databaseUrl) },
  });
  if (seeded.status !== 0) throw new Error("seeding the catalogue at scale failed");
  return seeded.stdout.split("\n").find((l) => l.startsWith("scale:")) ?? "";
}

/** One target per query, each checked once (200 with items) before it is loaded. */
export async function catalogueTargets(apiKey: string): Promise<LoadTarget[]> {
  const headers = { Authorization: `Bearer ${apiKey}` };
  const targets: LoadTarget[] = [];
  for (const { name, query } of CATALOGUE_QUERIES) {
    const url = `http://127.0.0.1:${BENCH_PORTS.app}/api/v1/modules?${query}`;
    const check = await fetch(url, { headers });
    const body = (await check.json()) as { total?: number; items?: unknown[] };
    if (check.status !== 200 || !body.items?.length)
      throw new Error(`catalogue API answered ${check.status} with ${body.items?.length ?? 0} items for ${query}`);
    targets.push({ name: `GET /api/v1/modules: ${name} (${body.total} match)`, server: "app", url, headers });
  }
  return targets;
}
