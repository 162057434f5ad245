// A site's hottest expected air temperature (optional design high): saved and reloaded from the site form
// and the sites API, refused at the field when out of range or not above the coldest, carried into a
// kit plan's hot-afternoon check, and named on a saved plan's page once the site gains one.
import { describe, expect, it } from "vitest";
import { installerWithTeam } from "./helpers/fixtures";
import { choices, planningSetup } from "./helpers/planning-fixtures";
import * as sitesNew from "~/routes/sites-new";
import * as site from "~/routes/site";
import * as sitesApi from "~/routes/api.v1.sites";
import * as siteApi from "~/routes/api.v1.site";
import * as plansApi from "~/routes/api.v1.plans";
import * as planPage from "~/routes/plan";
import { db } from "~/server/db.server";
import { callWithKey as callApi, hutSiteForm as siteForm, pumpSiteBody, teamWithKey } from "./helpers/site-fixtures";

const storedHottest = async (teamId: string) =>
  (await db.selectFrom("site").select("hottest_temp_c").where("team_id", "=", teamId).execute()).map((r) => r.hottest_temp_c);

describe("the site form's hottest expected temperature", () => {
  it("saves, reloads, and clears when left blank", async () => {
    const a = await installerWithTeam("site-hot-form");
    const saved = await a.client.action(sitesNew, "/sites/new", siteForm({ hottestTempC: "36.5" }));
    expect(saved.status, JSON.stringify(saved.data)).toBe(302);
    const siteId = saved.location!.split("/").pop()!;
    expect((await a.client.loader(site, `/sites/${siteId}`, { siteId })).data.form.hottestTempC).toBe(36.5);

    const cleared = await a.client.action(site, `/sites/${siteId}`, siteForm({ hottestTempC: "" }), { siteId });
    expect(cleared.status, JSON.stringify(cleared.data)).toBe(302);
    expect((await a.client.loader(site, `/sites/${siteId}`, { siteId })).data.form.hottestTempC).toBeUndefined();
    expect(await storedHottest(a.teamId)).toEqual([null]);
  });

  it("answers a bad value with a message at the field and saves nothing", async () => {
    const a = await installerWithTeam("site-hot-bad");
    const cases: [string, RegExp][] = [
      ["61", /at most 60 °C/],
      ["-41", /at least −40 °C/],
      ["warm", /must be a number/],
      ["-22", /above the coldest/], // equal to the coldest (−22 °C)
      ["-30", /above the coldest/],
      ["12", /below a month's mean maximum/], // July's mean maximum is 18 °C
    ];
    for (const [value, message] of cases) {
      const result = await a.client.action(sitesNew, "/sites/new", siteForm({ hottestTempC: value }));
      expect(result.status, value).toBe(400);
      expect(result.data.result.error.hottestTempC[0], value).toMatch(message);
    }
    expect(await storedHottest(a.teamId)).toEqual([]);

    // An edit with a bad value leaves the stored one as it was.
    const saved = await a.client.action(sitesNew, "/sites/new", siteForm({ hottestTempC: "35" }));
    const siteId = saved.location!.split("/").pop()!;
    expect((await a.client.action(site, `/sites/${siteId}`, siteForm({ hottestTempC: "99", name: "Renamed" }), { siteId })).status).toBe(400);
    const row = await db.selectFrom("site").select(["name", "hottest_temp_c"]).where("id", "=", siteId).executeTakeFirstOrThrow();
    expect(row).toEqual({ name: "Ridge hut", hottest_temp_c: 35 });
    // The column's own CHECK keeps the form's range for any other writer.
    await expect(db.updateTable("site").set({ hottest_temp_c: 61 }).where("id", "=", siteId).execute()).rejects.toThrow(/check constraint/);
  });
});

describe("the sites API's hottest expected temperature", () => {
  const body = pumpSiteBody();

  it("round-trips it, leaves it out when not given, and refuses a bad one with its field path", async () => {
    const a = await teamWithKey("site-hot-api");
    const created = await callApi(sitesApi, "action", "/api/v1/sites", a.key, { ...body, hottestTempC: 41 });
    expect(created.status, JSON.stringify(created.body)).toBe(201);
    expect(created.body.hottestTempC).toBe(41);
    const read = await callApi(siteApi, "loader", `/api/v1/sites/${created.body.id}`, a.key, undefined, { siteId: created.body.id });
    expect(read.body.hottestTempC).toBe(41);

    const plain = await callApi(sitesApi, "action", "/api/v1/sites", a.key, body);
    expect(plain.status).toBe(201);
    expect(plain.body).not.toHaveProperty("hottestTempC");

    for (const hottestTempC of [70, "41", -5]) {
      const bad = await callApi(sitesApi, "action", "/api/v1/sites", a.key, { ...body, hottestTempC });
      expect(bad.status, String(hottestTempC)).toBe(400);
      expect(Object.keys(bad.body.error.fields), String(hottestTempC)).toEqual(["hottestTempC"]);
    }
    expect((await storedHottest(a.teamId)).sort()).toEqual([41, null]);
  });
});

describe("a kit plan from a site with a design high", () => {
  it("checks the hot afternoon at the design high, and a saved plan's page names it once the site gains one", async () => {
    const a = await teamWithKey("site-hot-plan");
    const setup = await planningSetup(a.teamId);
    const created = await callApi(plansApi, "action", "/api/v1/plans", a.key, choices(setup));
    expect(created.status, JSON.stringify(created.body)).toBe(201);
    expect(created.body.plan.assumptions.join(" ")).toMatch(/\(the hottest month's mean daily maximum\)/);
    const planId = created.body.id as string;

    await db.updateTable("site").set({ hottest_temp_c: 38 }).where("id", "=", setup.siteId).execute();
    const page = await a.client.loader(planPage, `/plans/${planId}`, { planId });
    expect(page.data.changes).toContain("Hottest expected temperature: none → 38 °C.");
    expect(page.data.changedBy).toBe("data");

    // The fixture module's NOCT is 45 °C: cells at 38 + (45 − 20)/800 × 1000 = 69.25 °C on the hot afternoon.
    const replanned = await callApi(plansApi, "action", "/api/v1/plans", a.key, choices(setup, { name: "Hot kit" }));
    expect(replanned.status, JSON.stringify(replanned.body)).toBe(201);
    expect(replanned.body.plan.array.hotCellC).toBeCloseTo(69.25, 9);
    const check = replanned.body.plan.checks.find((c: { id: string }) => c.id === "array.vmp-hot");
    expect(check.sentence).toMatch(/cells at 69 °C/);
    expect(replanned.body.plan.assumptions.join(" ")).toMatch(/cells at 38 °C air \(the site's hottest expected temperature\)/);
  });
});
