// /api/v1/yield under 32 connections, next to a bare node:http JSON endpoint measured in the same run.
import autocannon from "autocannon";
import { readFileSync } from "node:fs";
import { BARE_PORT, BENCH_PORTS } from "./http-stack";
import { VELL_HUT_SITE } from "../../data/demo/vell-valley-climate";

export interface LoadFigures {
  requestsPerSecond: number;
  p50Ms: number;
  p95Ms: number;
  p99Ms: number;
  errors: number;
  non2xx: number;
}

export function rssMb(pid: number) {
  const status = readFileSync(`/proc/${pid}/status`, "utf8");
  return Number(status.match(/VmRSS:\s+(\d+)/)![1]) / 1024;
}

export async function load(opts: {
  url: string;
  method?: "GET" | "POST";
  headers?: Record<string, string>;
  body?: string;
  seconds: number;
  connections?: number;
}): Promise<LoadFigures> {
  const result = await autocannon({
    url: opts.url,
    method: opts.method ?? "GET",
    headers: opts.headers,
    body: opts.body,
    connections: opts.connections ?? 32,
    duration: opts.seconds,
  });
  // autocannon's latency histogram reports p97.5 and p99; p95 is read from the same histogram's percentiles.
  const latency = result.latency as unknown as Record<string, number>;
  return {
    requestsPerSecond: result.requests.average,
    p50Ms: latency.p50,
    p95Ms: latency.p95 ?? latency.p97_5,
    p99Ms: latency.p99,
    errors: result.errors + result.timeouts,
    non2xx: result.non2xx,
  };
}

export function yieldBody(moduleId: string) {
  const { months, ...site } = VELL_HUT_SITE;
  return JSON.stringify({
    site: { ...site, months: months.map(({ ghiKWhM2Day, tMaxC, tMinC, albedo }) => ({ ghiKWhM2Day, tMaxC, tMinC, albedo })) },
    module: { moduleId },
    controller: { kind: "mppt", batteryVoltageV: 12, efficiencyPct: 97 },
    lossesPct: { soiling: 2, mismatch: 2, wiring: 1 },
  });
}

export async function benchYieldApi(apiKey: string, moduleId: string, seconds: number) {
  const body = yieldBody(moduleId);
  const headers = { "Content-Type": "application/json", Authorization: `Bearer ${apiKey}` };
  const check = await fetch(`http://127.0.0.1:${BENCH_PORTS.app}/api/v1/yield`, { method: "POST", headers, body });
  if (check.status !== 200) throw new Error(`yield API answered ${check.status}: ${await check.text()}`);
  const bare = await load({ url: `http://127.0.0.1:${BARE_PORT}/`, method: "POST", headers: { "Content-Type": "application/json" }, body, seconds });
  const api = await load({ url: `http://127.0.0.1:${BENCH_PORTS.app}/api/v1/yield`, method: "POST", headers, body, seconds });
  return { bare, api, ratio: api.requestsPerSecond / bare.requestsPerSecond };
}
