// POST /api/v1/yield with a team API key, and the bare node:http JSON endpoint it is measured against
// (the same body, answered without any framework, database or computation).
import { BARE_PORT, BENCH_PORTS } from "./http-stack";
import type { LoadTarget } from "./load";
import { VELL_HUT_SITE } from "../../data/demo/vell-valley-climate";

export function yieldBody(moduleId: string) {
  const { months, ...site } = VELL_HUT_SITE;
  return JSON.stringify({
    site: { ...site, months: months.map(({ ghiKWhM2Day, tMaxC, tMinC, albedo }) => ({ ghiKWhM2Day, tMaxC, tMinC, albedo })) },
    module: { moduleId },
    controller: { kind: "mppt", batteryVoltageV: 12, efficiencyPct: 97 },
    lossesPct: { soiling: 2, mismatch: 2, wiring: 1 },
  });
}

export function bareTarget(moduleId: string): LoadTarget {
  return {
    name: "bare node:http JSON (yardstick)",
    server: "bare",
    url: `http://127.0.0.1:${BARE_PORT}/`,
    method: "POST",
    headers: { "Content-Type": "application/json" },
    body: yieldBody(moduleId),
  };
}

/** The yield API, checked once before it is loaded. Origin is sent as a browser would on a POST. */
export async function yieldTarget(opts: { apiKey: string; moduleId: string; publicUrl: string }): Promise<LoadTarget> {
  const target: LoadTarget = {
    name: "POST /api/v1/yield (API key)",
    server: "app",
    url: `http://127.0.0.1:${BENCH_PORTS.app}/api/v1/yield`,
    method: "POST",
    headers: { "Content-Type": "application/json", Authorization: `Bearer ${opts.apiKey}`, Origin: new URL(opts.publicUrl).origin },
    body: yieldBody(opts.moduleId),
  };
  const check = await fetch(target.url, { method: "POST", headers: target.headers, body: target.body });
  if (check.status !== 200) throw new Error(`yield API answered ${check.status}: ${await check.text()}`);
  return target;
}
