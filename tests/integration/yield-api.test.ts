// POST /api/v1/yield: who may call it, what bad bodies get, and the Duffie & Beckman case end to end.
import { describe, expect, it } from "vitest";
import { RouteClient } from "./helpers/route-client";
import { createTestModule, installerWithTeam } from "./helpers/fixtures";
import * as yieldApi from "~/routes/api.v1.yield";
import * as teamApiKeys from "~/routes/team-api-keys";
import { db } from "~/server/db.server";

// Duffie & Beckman, Solar Engineering of Thermal Processes, Example 2.19.1: Madison, 43°N, a surface
// tilted 60° facing south; monthly H̄ (MJ/m²) and ground reflectance ρ; H̄T is the book's answer.
const MJ_TO_KWH = 1 / 3.6;
const DB_H = [6.44, 9.89, 12.86, 16.05, 21.36, 23.04, 22.58, 20.33, 14.59, 10.48, 6.37, 5.74];
const DB_RHO = [0.7, 0.7, 0.4, 0.2, 0.2, 0.2, 0.2, 0.2, 0.2, 0.2, 0.2, 0.4];
const DB_HT = [13.7, 17.2, 15.8, 14.7, 16.6, 16.5, 16.8, 17.5, 15.6, 15.2, 11.4, 12.7];

function madisonBody() {
  return {
    site: {
      latitudeDeg: 43.0,
      longitudeDeg: -89.4,
      tiltDeg: 60,
      azimuthDeg: 180,
      albedo: 0.2,
      months: DB_H.map((h, i) => ({ ghiKWhM2Day: h * MJ_TO_KWH, tMaxC: -4 + 2 * i, tMinC: -13 + 2 * i, albedo: DB_RHO[i] })),
    },
    module: { pmaxW: 100, vmpV: 18.2, impA: 5.5, vocV: 22.1, iscA: 5.9, gammaPmaxPctPerC: -0.4, betaVocPctPerC: -0.3, alphaIscPctPerC: 0.05, noctC: 45 },
    controller: { kind: "mppt", batteryVoltageV: 12, efficiencyPct: 97 },
    lossesPct: { soiling: 2, mismatch: 2, wiring: 1 },
  };
}

async function post(client: RouteClient, body: unknown, headers: Record<string, string> = {}) {
  const request = client.request("/api/v1/yield", {
    method: "POST",
    headers: { "Content-Type": "application/json", ...headers },
  });
  const withBody = new Request(request, { body: typeof body === "string" ? body : JSON.stringify(body) });
  let response: Response;
  try {
    response = (await yieldApi.action({ request: withBody, params: {}, context: {} } as never)) as Response;
  } catch (thrown) {
    if (!(thrown instanceof Response)) throw thrown;
    response = thrown;
  }
  return { status: response.status, body: await response.json() };
}

describe("POST /api/v1/yield", () => {
  it("answers 401 JSON to an anonymous caller", async () => {
    const result = await post(new RouteClient(), madisonBody());
    expect(result.status).toBe(401);
    expect(result.body.error.message).toMatch(/Sign in/);
  });

  it("computes the Duffie & Beckman Example 2.19.1 case for a signed-in installer (in-plane within 5 %)", async () => {
    const { client } = await installerWithTeam("yield");
    const result = await post(client, madisonBody());
    expect(result.status).toBe(200);
    expect(result.body.months).toHaveLength(12);
    result.body.months.forEach((m: { month: number; poaKWhM2Day: number; energyWhPerDay: number }, i: number) => {
      expect(m.month).toBe(i + 1);
      const bookKWh = DB_HT[i] * MJ_TO_KWH;
      expect(Math.abs(m.poaKWhM2Day - bookKWh) / bookKWh).toBeLessThan(0.05);
      expect(m.energyWhPerDay).toBeGreaterThan(0);
    });
    expect(result.body.worstMonth).toBeGreaterThanOrEqual(1);
    expect(result.body.annualKWh).toBeCloseTo(
      result.body.months.reduce(
        (s: number, m: { energyWhPerDay: number }, i: number) => s + (m.energyWhPerDay * [31, 28, 31, 30, 31, 30, 31, 31, 30, 31, 30, 31][i]) / 1000,
        0,
      ),
      1,
    );
  });

  it("accepts a team API key, and resolves a catalogue module by id", async () => {
    const owner = await installerWithTeam("yield-key");
    const created = await owner.client.action(teamApiKeys, "/team/api-keys", { intent: "create", name: "Yield bench" });
    const module = await createTestModule("yield");
    const byFigures = await post(new RouteClient(), madisonBody(), { Authorization: `Bearer ${created.data.created.key}` });
    const byId = await post(new RouteClient(), { ...madisonBody(), module: { moduleId: module.id } }, { Authorization: `Bearer ${created.data.created.key}` });
    expect(byFigures.status).toBe(200);
    expect(byId.status).toBe(200);
    expect(byId.body.annualKWh).toBeCloseTo(byFigures.body.annualKWh, 6);
    expect(byId.body.assumptions.join(" ")).toContain(module.model);
    // Verified power (85 % of nameplate from 4 readings) lowers the energy in proportion, and says so.
    await db.updateTable("pv_module").set({ verified_pmax_w: 85, verified_reading_count: 4 }).where("id", "=", module.id).execute();
    const verified = await post(
      new RouteClient(),
      { ...madisonBody(), module: { moduleId: module.id }, powerBasis: "verified" },
      { Authorization: `Bearer ${created.data.created.key}` },
    );
    expect(verified.body.annualKWh / byId.body.annualKWh).toBeCloseTo(0.85, 2);
    expect(verified.body.assumptions.join(" ")).toMatch(/verified 85\.0 W at STC from 4 approved field reading/);
    const unknown = await post(
      new RouteClient(),
      { ...madisonBody(), module: { moduleId: "00000000-0000-0000-0000-000000000000" } },
      { Authorization: `Bearer ${created.data.created.key}` },
    );
    expect(unknown.status).toBe(400);
    expect(unknown.body.error.fields["module.moduleId"]).toMatch(/No module/);
  });

  const base = madisonBody();
  const months = base.site.months;
  const badBodies: [string, unknown, string][] = [
    ["latitude beyond 90", { ...base, site: { ...base.site, latitudeDeg: 91 } }, "site.latitudeDeg"],
    ["latitude as text", { ...base, site: { ...base.site, latitudeDeg: "north" } }, "site.latitudeDeg"],
    ["tilt over 90", { ...base, site: { ...base.site, tiltDeg: 95 } }, "site.tiltDeg"],
    ["tilt missing", { ...base, site: { ...base.site, tiltDeg: undefined } }, "site.tiltDeg"],
    ["11 months", { ...base, site: { ...base.site, months: months.slice(0, 11) } }, "site.months"],
    [
      "negative irradiation",
      { ...base, site: { ...base.site, months: months.map((m, i) => (i === 3 ? { ...m, ghiKWhM2Day: -1 } : m)) } },
      "site.months.3.ghiKWhM2Day",
    ],
    [
      "clearness index of 1.2",
      { ...base, site: { ...base.site, months: months.map(({ ghiKWhM2Day, ...m }, i) => (i === 5 ? { ...m, clearnessIndex: 1.2 } : { ...m, ghiKWhM2Day })) } },
      "site.months.5.clearnessIndex",
    ],
    ["tMin above tMax", { ...base, site: { ...base.site, months: months.map((m, i) => (i === 0 ? { ...m, tMinC: 5, tMaxC: 0 } : m)) } }, "site.months.0.tMinC"],
    [
      "irradiation in MJ instead of kWh",
      { ...base, site: { ...base.site, months: months.map((m, i) => (i === 6 ? { ...m, ghiKWhM2Day: 22.58 } : m)) } },
      "site.months.6.ghiKWhM2Day",
    ],
    ["Vmp above Voc", { ...base, module: { ...base.module, vmpV: 25 } }, "module.vmpV"],
    ["no module at all", { ...base, module: {} }, "module.moduleId"],
    ["unknown controller kind", { ...base, controller: { ...base.controller, kind: "magic" } }, "controller.kind"],
    ["battery of 36 V", { ...base, controller: { ...base.controller, batteryVoltageV: 36 } }, "controller.batteryVoltageV"],
    ["soiling of 80 %", { ...base, lossesPct: { ...base.lossesPct, soiling: 80 } }, "lossesPct.soiling"],
    ["body is a list", [1, 2, 3], "body"],
  ];

  it.each(badBodies)("answers 400 with the field path for %s", async (_label, body, field) => {
    const { client } = await installerWithTeam("yield-bad");
    const result = await post(client, body);
    expect(result.status).toBe(400);
    expect(Object.keys(result.body.error.fields)).toContain(field);
    expect(result.body.error.fields[field]).toMatch(/\w/);
  });

  it("answers 400 to malformed JSON and 415 to a form body, never a 5xx", async () => {
    const { client } = await installerWithTeam("yield-json");
    expect((await post(client, "{ not json")).status).toBe(400);
    const form = client.request("/api/v1/yield", { form: { a: "1" } });
    const response = (await yieldApi.action({ request: form, params: {}, context: {} } as never).catch((r: Response) => r)) as Response;
    expect(response.status).toBe(415);
  });
});
