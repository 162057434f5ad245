// GET /api/v1/modules and /api/v1/modules/:id — filters, sorts and paging return the right rows;
// bad parameters answer 400 naming them; anonymous callers get 401; readings stay anonymous.
import { describe, expect, it } from "vitest";
import { installerWithTeam } from "../helpers/fixtures";
import { RouteClient } from "../helpers/route-client";
import { addReadings, insertModule, uniqueMaker } from "./catalogue-fixtures";
import * as modulesApi from "~/routes/api.v1.modules";
import * as moduleApi from "~/routes/api.v1.modules.$moduleId";
import * as teamApiKeys from "~/routes/team-api-keys";

async function get(
  mod: { loader: (args: any) => unknown },
  client: RouteClient,
  path: string,
  params: Record<string, string> = {},
  headers: Record<string, string> = {},
) {
  const request = client.request(path, { headers });
  let response: Response;
  try {
    response = (await mod.loader({ request, params, context: {} })) as Response;
  } catch (thrown) {
    if (!(thrown instanceof Response)) throw thrown;
    response = thrown;
  }
  return { status: response.status, body: await response.json() };
}

/** Six invented modules under one maker: sizes, technologies and readings chosen so each filter picks a known set. */
async function catalogueOfSix() {
  const maker = uniqueMaker("api");
  const ids = {
    small: await insertModule(maker, "S-50", { pmax_w: 50, length_mm: 600, width_mm: 420 }),
    mid: await insertModule(maker, "M-150", { pmax_w: 150, length_mm: 1200, width_mm: 680 }),
    midPoly: await insertModule(maker, "P-150", { pmax_w: 150, cell_technology: "poly", length_mm: 1480, width_mm: 670 }),
    big: await insertModule(maker, "B-400", { pmax_w: 400, vmp_v: 31, length_mm: 1722, width_mm: 1134 }),
    bigDud: await insertModule(maker, "D-400", { pmax_w: 400, vmp_v: 31, length_mm: 1722, width_mm: 1134 }),
    none: await insertModule(maker, "N-200", { pmax_w: 200, length_mm: 1480, width_mm: 680 }),
  };
  await addReadings(ids.small, [49, 51, 50]); // ratio 1.00
  await addReadings(ids.mid, [129, 130, 131]); // ratio 0.867
  await addReadings(ids.midPoly, [141, 144]); // ratio 0.95
  await addReadings(ids.big, [380, 392, 388, 400]); // median 390 → ratio 0.975
  await addReadings(ids.bigDud, [300, 310, 320]); // ratio 0.775
  return { maker, ids };
}

describe("GET /api/v1/modules", () => {
  it("answers 401 JSON to an anonymous caller and to an unknown key", async () => {
    const anonymous = await get(modulesApi, new RouteClient(), "/api/v1/modules");
    expect(anonymous.status).toBe(401);
    expect(anonymous.body.error.message).toMatch(/Sign in/);
    const badKey = await get(modulesApi, new RouteClient(), "/api/v1/modules", {}, { Authorization: "Bearer kw_nope" });
    expect(badKey.status).toBe(401);
  });

  it("filters, sorts and pages in SQL, for a session and for a team API key", async () => {
    const { maker, ids } = await catalogueOfSix();
    const owner = await installerWithTeam("api-owner");
    const q = `q=${encodeURIComponent(maker)}`;
    const list = async (query: string) => {
      const r = await get(modulesApi, owner.client, `/api/v1/modules?${q}&${query}`);
      expect(r.status, JSON.stringify(r.body)).toBe(200);
      return r.body as { items: { id: string; model: string; verifiedRatio: number | null; readingCount: number; pmaxW: number }[]; total: number };
    };

    const all = await list("");
    expect(all.total).toBe(6);
    expect(all.items.map((m) => m.model)).toEqual(["B-400", "D-400", "M-150", "N-200", "P-150", "S-50"]);

    const byRatio = await list("sort=verifiedRatio&dir=asc");
    expect(byRatio.items.map((m) => m.id)).toEqual([ids.bigDud, ids.mid, ids.midPoly, ids.big, ids.small, ids.none]); // no readings last
    const byRatioDesc = await list("sort=verifiedRatio&dir=desc");
    expect(byRatioDesc.items.map((m) => m.id)).toEqual([ids.small, ids.big, ids.midPoly, ids.mid, ids.bigDud, ids.none]); // still last

    expect((await list("ratioBelow=0.9&sort=pmaxW&dir=desc")).items.map((m) => m.id)).toEqual([ids.bigDud, ids.mid]);
    expect((await list("hasReadings=false")).items.map((m) => m.id)).toEqual([ids.none]);
    expect((await list("hasReadings=true")).total).toBe(5);
    expect((await list("minW=100&maxW=200&technology=mono-PERC")).items.map((m) => m.id)).toEqual([ids.mid, ids.none]);
    expect((await list("technology=poly")).items.map((m) => m.id)).toEqual([ids.midPoly]);

    const density = await list("sort=nameplateDensityWm2&dir=desc&limit=2");
    // 400 W / 1.9527 m² = 204.8 W/m² for both 400 W modules (ties broken by maker, model).
    expect(density.items.map((m) => m.id)).toEqual([ids.big, ids.bigDud]);
    expect(density.total).toBe(6);
    const page2 = await list("sort=pmaxW&dir=asc&limit=2&offset=2");
    expect(page2.items.map((m) => m.pmaxW)).toEqual([150, 200]);
    expect(page2.total).toBe(6);
    expect(await list("offset=10")).toEqual({ items: [], total: 6 });
    expect(await list("technology=thin-film%20CdTe")).toEqual({ items: [], total: 0 });

    const one = all.items.find((m) => m.id === ids.big)!;
    expect(one).toMatchObject({
      verifiedPmaxW: 390,
      readingCount: 4,
      nameplateDensityWm2: expect.closeTo(204.84, 2),
      nameplateEfficiencyPct: expect.closeTo(20.484, 3),
    });
    expect(one.verifiedRatio).toBeCloseTo(0.975, 10);

    const created = await owner.client.action(teamApiKeys, "/team/api-keys", { intent: "create", name: "Catalogue sync" });
    const viaKey = await get(
      modulesApi,
      new RouteClient(),
      `/api/v1/modules?${q}&sort=readingCount&dir=desc&limit=1`,
      {},
      { Authorization: `Bearer ${created.data.created.key}` },
    );
    expect(viaKey.status).toBe(200);
    expect(viaKey.body.items.map((m: { id: string }) => m.id)).toEqual([ids.big]);
  });

  it("answers bad parameters with 400 JSON naming each one, never 500", async () => {
    const owner = await installerWithTeam("api-bad");
    const cases: [string, string[]][] = [
      ["sort=price", ["sort"]],
      ["dir=up&limit=0", ["dir", "limit"]],
      ["limit=1000&offset=-1", ["limit", "offset"]],
      ["minW=abc&ratioBelow=x", ["minW", "ratioBelow"]],
      ["technology=perovskite&hasReadings=yes", ["hasReadings", "technology"]],
      ["minW=300&maxW=100", ["maxW"]],
      ["limit=2.5", ["limit"]],
    ];
    for (const [query, fields] of cases) {
      const r = await get(modulesApi, owner.client, `/api/v1/modules?${query}`);
      expect(r.status, query).toBe(400);
      expect(Object.keys(r.body.error.fields).sort(), query).toEqual(fields);
      expect(r.body.error.message).toMatch(/query parameters? needs? attention/);
    }
    const odd = await get(modulesApi, owner.client, `/api/v1/modules?q=${encodeURIComponent("%_\\'; drop table pv_module; --")}`);
    expect(odd.status).toBe(200);
    expect(odd.body).toEqual({ items: [], total: 0 });
  });
});

describe("GET /api/v1/modules/:moduleId", () => {
  it("gives nameplate, verified figures and the approved readings at STC — without who took them", async () => {
    const maker = uniqueMaker("detail");
    const owner = await installerWithTeam("api-detail");
    const id = await insertModule(maker, "X-100");
    await addReadings(id, [92, 95, 90], "approved", owner.userId);
    await addReadings(id, [40], "rejected", owner.userId);
    await addReadings(id, [80], "pending", owner.userId);
    const r = await get(moduleApi, new RouteClient(), `/api/v1/modules/${id}`, { moduleId: id });
    expect(r.status).toBe(401);
    const other = await installerWithTeam("api-detail-other");
    const detail = await get(moduleApi, other.client, `/api/v1/modules/${id}`, { moduleId: id });
    expect(detail.status).toBe(200);
    expect(detail.body).toMatchObject({ id, maker, model: "X-100", pmaxW: 100, verifiedPmaxW: 92, readingCount: 3, mergedInto: null });
    expect(detail.body.readings).toMatchObject({ approvedCount: 3, verifiedPmaxW: 92, minStcPmaxW: 90, maxStcPmaxW: 95 });
    expect(detail.body.readings.points.map((p: { stcPmaxW: number }) => p.stcPmaxW)).toEqual([92, 95, 90]);
    const text = JSON.stringify(detail.body);
    expect(text).not.toContain(owner.userId);
    expect(text).not.toMatch(/submitted|team|latitude|longitude/i);

    const missing = await get(moduleApi, other.client, "/api/v1/modules/00000000-0000-4000-8000-000000000000", {
      moduleId: "00000000-0000-4000-8000-000000000000",
    });
    expect(missing.status).toBe(404);
    expect(missing.body.error.message).toMatch(/No module/);
    expect((await get(moduleApi, other.client, "/api/v1/modules/not-a-uuid", { moduleId: "not-a-uuid" })).status).toBe(404);
  });
});
