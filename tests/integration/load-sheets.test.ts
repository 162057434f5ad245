// Load sheets: saved per site, refused line by line when wrong, invisible to other teams.
import { describe, expect, it } from "vitest";
import { installerWithTeam } from "./helpers/fixtures";
import * as loadSheetNew from "~/routes/load-sheet-new";
import * as loadSheet from "~/routes/load-sheet";
import { createSite } from "~/server/sites.server";
import { db } from "~/server/db.server";
import { VELL_HUT_SITE } from "../../data/demo/vell-valley-climate";

async function siteFor(teamId: string) {
  return createSite(teamId, null, {
    name: "Hut",
    customerName: "Warden",
    latitudeDeg: VELL_HUT_SITE.latitudeDeg,
    longitudeDeg: VELL_HUT_SITE.longitudeDeg,
    elevationM: 2000,
    timeZone: "Europe/Vienna",
    tiltDeg: 55,
    azimuthDeg: 180,
    albedo: 0.2,
    shadingDeratePct: 0,
    coldestTempC: -20,
    irradianceSource: "measured",
    months: VELL_HUT_SITE.months.map(({ ghiKWhM2Day, tMaxC, tMinC }) => ({ ghiKWhM2Day, tMaxC, tMinC })),
  });
}

const fridge = { name: "Fridge", powerW: 60, quantity: 1, hoursPerDay: 10, daysPerWeek: 7, circuit: "dc", surgeW: 180 };
const lights = { name: "LED lights", powerW: 8, quantity: 6, hoursPerDay: 5, daysPerWeek: 7, circuit: "dc", months: [1, 2, 3, 10, 11, 12] };

describe("load sheets", () => {
  it("saves appliances for a site and reads them back", async () => {
    const a = await installerWithTeam("loads-a");
    const siteId = await siteFor(a.teamId);
    const saved = await a.client.action(
      loadSheetNew,
      `/sites/${siteId}/loads/new`,
      { sheet: JSON.stringify({ name: "Winter use", appliances: [fridge, lights] }) },
      { siteId },
    );
    expect(saved.status, JSON.stringify(saved.data)).toBe(302);
    const row = await db.selectFrom("load_sheet").selectAll().where("team_id", "=", a.teamId).executeTakeFirstOrThrow();
    expect(row.appliances).toEqual([fridge, lights]);
    const page = await a.client.loader(loadSheet, `/sites/${siteId}/loads/${row.id}`, { siteId, loadSheetId: row.id });
    expect(page.data.sheet.name).toBe("Winter use");
  });

  it("names the line and field of every mistake, and saves nothing", async () => {
    const a = await installerWithTeam("loads-bad");
    const siteId = await siteFor(a.teamId);
    const bad = [fridge, { ...lights, hoursPerDay: 30 }, { ...fridge, name: "", surgeW: 10 }, { ...lights, circuit: "solar" }];
    const result = await a.client.action(loadSheetNew, `/sites/${siteId}/loads/new`, { sheet: JSON.stringify({ name: "X", appliances: bad }) }, { siteId });
    expect(result.status).toBe(400);
    expect(result.data.errors).toMatchObject({
      name: expect.stringMatching(/2 characters/),
      "appliances.1.hoursPerDay": expect.stringMatching(/between 0 and 24/),
      "appliances.2.name": expect.stringMatching(/name/),
      "appliances.2.surgeW": expect.stringMatching(/at least the running power/),
      "appliances.3.circuit": expect.stringMatching(/AC/),
    });
    const garbled = await a.client.action(loadSheetNew, `/sites/${siteId}/loads/new`, { sheet: "{not json" }, { siteId });
    expect(garbled.status).toBe(400);
    expect(await db.selectFrom("load_sheet").select("id").where("team_id", "=", a.teamId).execute()).toHaveLength(0);
  });

  it("keeps another team out of the site's load sheets", async () => {
    const a = await installerWithTeam("loads-own");
    const b = await installerWithTeam("loads-other");
    const siteId = await siteFor(a.teamId);
    await a.client.action(loadSheetNew, `/sites/${siteId}/loads/new`, { sheet: JSON.stringify({ name: "Summer", appliances: [fridge] }) }, { siteId });
    const sheet = await db.selectFrom("load_sheet").select("id").where("team_id", "=", a.teamId).executeTakeFirstOrThrow();
    const params = { siteId, loadSheetId: sheet.id };
    expect((await b.client.loader(loadSheet, `/sites/${siteId}/loads/${sheet.id}`, params)).status).toBe(404);
    expect((await b.client.action(loadSheet, `/sites/${siteId}/loads/${sheet.id}`, { intent: "delete" }, params)).status).toBe(404);
    expect(
      (await b.client.action(loadSheetNew, `/sites/${siteId}/loads/new`, { sheet: JSON.stringify({ name: "Sneaky", appliances: [fridge] }) }, { siteId }))
        .status,
    ).toBe(404);
    // A's own sheet id under another of A's sites is not found either (sheets belong to their site).
    const otherSite = await siteFor(a.teamId);
    expect((await a.client.loader(loadSheet, `/sites/${otherSite}/loads/${sheet.id}`, { siteId: otherSite, loadSheetId: sheet.id })).status).toBe(404);
    expect(await db.selectFrom("load_sheet").select("id").where("id", "=", sheet.id).executeTakeFirst()).toBeTruthy();
  });
});
