// A site form for the demo mountain hut, and a JSON API call through a route module, shared by the
// site and plan tests.
import { VELL_HUT_SITE } from "../../../data/demo/vell-valley-climate";
import * as teamApiKeys from "~/routes/team-api-keys";
import { installerWithTeam } from "./fixtures";
import { BASE } from "./route-client";

/** The hut's site form, field by field as the browser posts it; `overrides` replace fields. */
export function hutSiteForm(overrides: Record<string, string> = {}) {
  const form: Record<string, string> = {
    name: "Ridge hut",
    customerName: "Hut warden",
    latitudeDeg: "46.4",
    longitudeDeg: "9.8",
    elevationM: "2100",
    timeZone: "Europe/Vienna",
    tiltDeg: "55",
    azimuthDeg: "180",
    albedo: "0.2",
    shadingDeratePct: "3",
    coldestTempC: "-22",
    irradianceSource: "measured",
  };
  VELL_HUT_SITE.months.forEach((m, i) => {
    form[`months[${i}].ghiKWhM2Day`] = String(m.ghiKWhM2Day);
    form[`months[${i}].tMaxC`] = String(m.tMaxC);
    form[`months[${i}].tMinC`] = String(m.tMinC);
  });
  return { ...form, ...overrides };
}

export type RouteModule = { loader?: Function; action?: Function };

/** Calls a JSON API route's loader or action; a thrown Response is answered like a returned one. */
export async function callJsonApi(
  mod: RouteModule,
  kind: "loader" | "action",
  path: string,
  init: { key?: string; headers?: Record<string, string>; body?: unknown; params?: Record<string, string> } = {},
) {
  const request = new Request(new URL(path, BASE), {
    method: kind === "action" ? "POST" : "GET",
    headers: { "Content-Type": "application/json", ...(init.key ? { Authorization: `Bearer ${init.key}` } : {}), ...init.headers },
    body: kind === "action" ? JSON.stringify(init.body) : undefined,
  });
  try {
    const res = (await mod[kind]!({ request, params: init.params ?? {}, context: {} })) as Response;
    return { status: res.status, body: await res.json() };
  } catch (thrown) {
    if (!(thrown instanceof Response)) throw thrown;
    return { status: thrown.status, body: await thrown.json() };
  }
}

/** callJsonApi with a team API key, the way an integration calls the API. */
export function callWithKey(mod: RouteModule, kind: "loader" | "action", path: string, key: string, body?: unknown, params: Record<string, string> = {}) {
  return callJsonApi(mod, kind, path, { key, body, params });
}

/** An installer with a team and one API key of that team. */
export async function teamWithKey(label: string) {
  const team = await installerWithTeam(label);
  const key = (await team.client.action(teamApiKeys, "/team/api-keys", { intent: "create", name: `${label} sync` })).data.created.key as string;
  return { ...team, key };
}

/** A sites API body for a southern-hemisphere orchard pump on the arid sky preset; `overrides` replace fields. */
export function pumpSiteBody(overrides: Record<string, unknown> = {}) {
  return {
    name: "Pump well",
    customerName: "Orchard co-op",
    latitudeDeg: -33.9,
    longitudeDeg: 18.6,
    elevationM: 40,
    timeZone: "Africa/Johannesburg",
    tiltDeg: 30,
    azimuthDeg: 0,
    albedo: 0.2,
    shadingDeratePct: 0,
    coldestTempC: 0,
    irradianceSource: "clearness-preset",
    clearnessPreset: "arid",
    months: Array.from({ length: 12 }, () => ({ tMaxC: 25, tMinC: 12 })),
    ...overrides,
  };
}
