// Sites: saved with their climate, invisible to other teams, refused with field messages when wrong.
import { describe, expect, it } from "vitest";
import { RouteClient } from "./helpers/route-client";
import { installerWithTeam, userWithRole } from "./helpers/fixtures";
import * as sitesNew from "~/routes/sites-new";
import * as site from "~/routes/site";
import * as sites from "~/routes/sites";
import * as sitesApi from "~/routes/api.v1.sites";
import * as siteApi from "~/routes/api.v1.site";
import * as teamApiKeys from "~/routes/team-api-keys";
import { db } from "~/server/db.server";
import { callJsonApi as callApi, hutSiteForm as siteForm, pumpSiteBody } from "./helpers/site-fixtures";

describe("sites", () => {
  it("saves a site with its twelve months and shows it to the team only", async () => {
    const a = await installerWithTeam("site-a");
    const b = await installerWithTeam("site-b");
    const saved = await a.client.action(sitesNew, "/sites/new", siteForm());
    expect(saved.status, JSON.stringify(saved.data)).toBe(302);
    const siteId = saved.location!.split("/").pop()!;
    const page = await a.client.loader(site, `/sites/${siteId}`, { siteId });
    expect(page.data.form.months).toHaveLength(12);
    expect(page.data.form.months[6].ghiKWhM2Day).toBe(6);
    expect(page.data.form.coldestTempC).toBe(-22);

    // Team B: not in its list, 404 on the page, on an edit and on a delete; the site is untouched.
    expect((await b.client.loader(sites, "/sites")).data.sites).toHaveLength(0);
    expect((await b.client.loader(site, `/sites/${siteId}`, { siteId })).status).toBe(404);
    expect((await b.client.action(site, `/sites/${siteId}`, siteForm({ name: "Hijacked" }), { siteId })).status).toBe(404);
    expect((await b.client.action(site, `/sites/${siteId}`, { intent: "delete" }, { siteId })).status).toBe(404);
    const row = await db.selectFrom("site").select("name").where("id", "=", siteId).executeTakeFirstOrThrow();
    expect(row.name).toBe("Ridge hut");
    expect((await b.client.loader(site, "/sites/not-a-uuid", { siteId: "not-a-uuid" })).status).toBe(404);
  });

  it("answers bad input with messages at the fields and saves nothing", async () => {
    const a = await installerWithTeam("site-bad");
    const result = await a.client.action(
      sitesNew,
      "/sites/new",
      siteForm({
        latitudeDeg: "95",
        timeZone: "Mars/Olympus",
        "months[3].ghiKWhM2Day": "",
        "months[0].tMinC": "5",
        "months[0].tMaxC": "-2",
        coldestTempC: "abc",
      }),
    );
    expect(result.status).toBe(400);
    const errors = result.data.result.error;
    expect(errors.latitudeDeg[0]).toMatch(/at most 90/);
    expect(errors.timeZone[0]).toMatch(/Unknown time zone/);
    expect(errors["months[3].ghiKWhM2Day"][0]).toMatch(/irradiation/);
    expect(errors.coldestTempC[0]).toMatch(/number/);
    expect(await db.selectFrom("site").select("id").where("team_id", "=", a.teamId).execute()).toHaveLength(0);
  });

  it("takes a sky preset instead of measured irradiation", async () => {
    const a = await installerWithTeam("site-preset");
    const form = siteForm({ irradianceSource: "clearness-preset", clearnessPreset: "temperate" });
    for (let i = 0; i < 12; i++) delete form[`months[${i}].ghiKWhM2Day`];
    const saved = await a.client.action(sitesNew, "/sites/new", form);
    expect(saved.status, JSON.stringify(saved.data)).toBe(302);
    const row = await db.selectFrom("site").select(["clearness_preset", "irradiance_source"]).where("team_id", "=", a.teamId).executeTakeFirstOrThrow();
    expect(row).toEqual({ clearness_preset: "temperate", irradiance_source: "clearness-preset" });
  });

  it("is refused to customers", async () => {
    const customer = await userWithRole("customer", "site-customer");
    expect((await customer.client.loader(sites, "/sites")).status).toBe(403);
    expect((await customer.client.action(sitesNew, "/sites/new", siteForm())).status).toBe(403);
  });
});

describe("sites API", () => {
  it("creates and reads sites with a team key; another team's key gets 404; bad bodies get field paths", async () => {
    const a = await installerWithTeam("site-api-a");
    const b = await installerWithTeam("site-api-b");
    const keyA = (await a.client.action(teamApiKeys, "/team/api-keys", { intent: "create", name: "Team A sync" })).data.created.key;
    const keyB = (await b.client.action(teamApiKeys, "/team/api-keys", { intent: "create", name: "Team B sync" })).data.created.key;
    const body = pumpSiteBody();
    const created = await callApi(sitesApi, "action", "/api/v1/sites", { headers: { Authorization: `Bearer ${keyA}` }, body });
    expect(created.status).toBe(201);
    const read = await callApi(siteApi, "loader", `/api/v1/sites/${created.body.id}`, {
      headers: { Authorization: `Bearer ${keyA}` },
      params: { siteId: created.body.id },
    });
    expect(read.body.name).toBe("Pump well");
    const foreign = await callApi(siteApi, "loader", `/api/v1/sites/${created.body.id}`, {
      headers: { Authorization: `Bearer ${keyB}` },
      params: { siteId: created.body.id },
    });
    expect(foreign.status).toBe(404);
    const listB = await callApi(sitesApi, "loader", "/api/v1/sites", { headers: { Authorization: `Bearer ${keyB}` } });
    expect(listB.body.total).toBe(0);
    const bad = await callApi(sitesApi, "action", "/api/v1/sites", {
      headers: { Authorization: `Bearer ${keyA}` },
      body: { ...body, tiltDeg: 120, months: body.months.slice(0, 11) },
    });
    expect(bad.status).toBe(400);
    expect(Object.keys(bad.body.error.fields)).toEqual(expect.arrayContaining(["months"]));
    expect((await callApi(sitesApi, "loader", "/api/v1/sites", {})).status).toBe(401);
  });
});
