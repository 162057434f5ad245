// The plans API computes and saves a plan from a valid body and reads back the same result; a bad body
// gets field messages and saves nothing (nor does the sites API). The /plans list says when a plan's
// sunshine rests on a sky preset.
import { callWithKey as callApi, pumpSiteBody, teamWithKey } from "./helpers/site-fixtures";
import { describe, expect, it } from "vitest";
import { choices, planningSetup } from "./helpers/planning-fixtures";
import * as plansApi from "~/routes/api.v1.plans";
import * as planApi from "~/routes/api.v1.plan";
import * as plansPage from "~/routes/plans";
import * as sitesApi from "~/routes/api.v1.sites";
import { db } from "~/server/db.server";

const count = async (table: "kit_plan" | "kit_plan_revision" | "site", teamId?: string) => {
  let q = db.selectFrom(table as "kit_plan").select((eb) => eb.fn.countAll<string>().as("n"));
  if (teamId) q = q.where("team_id", "=", teamId);
  return Number((await q.executeTakeFirstOrThrow()).n);
};

describe("POST /api/v1/plans", () => {
  it("computes and saves a plan (201); GET /api/v1/plans/:id returns the same result and choices", async () => {
    const a = await teamWithKey("plans-api-ok");
    const setup = await planningSetup(a.teamId);
    const body = choices(setup);
    const created = await callApi(plansApi, "action", "/api/v1/plans", a.key, body);
    expect(created.status, JSON.stringify(created.body)).toBe(201);
    expect(created.body.revision).toBe(1);
    const planId = created.body.id as string;
    expect(created.body.plan.array.layout.moduleCount).toBeGreaterThan(0);

    const read = await callApi(planApi, "loader", `/api/v1/plans/${planId}`, a.key, undefined, { planId });
    expect(read.status).toBe(200);
    expect(read.body).toMatchObject({ id: planId, name: "Hut kit", siteId: setup.siteId, loadSheetId: setup.loadSheetId, revision: 1, latestRevision: 1 });
    // The saved snapshot is the result the POST answered with, figure for figure.
    expect(read.body.result).toEqual(created.body.plan);
    expect(read.body.choices).toMatchObject({ siteId: setup.siteId, systemVoltageV: 24, design: { autonomyDays: 3 } });
    expect(read.body.inputs.site.coldestTempC).toBe(-20);

    const list = await callApi(plansApi, "loader", "/api/v1/plans", a.key);
    expect(list.body.items.map((p: { id: string }) => p.id)).toEqual([planId]);
  });

  it("answers a bad body with 400 and field messages, and saves nothing", async () => {
    const a = await teamWithKey("plans-api-bad");
    const setup = await planningSetup(a.teamId);
    const before = { plans: await count("kit_plan"), revisions: await count("kit_plan_revision") };

    const zeroDays = await callApi(plansApi, "action", "/api/v1/plans", a.key, choices(setup, {}, { autonomyDays: 0 }));
    expect(zeroDays.status).toBe(400);
    expect(zeroDays.body.error.fields["design.autonomyDays"]).toMatch(/at least 0.5/);

    const wrongVoltage = await callApi(plansApi, "action", "/api/v1/plans", a.key, choices(setup, { systemVoltageV: 36, moduleId: "not-a-uuid" }));
    expect(wrongVoltage.status).toBe(400);
    expect(Object.keys(wrongVoltage.body.error.fields)).toEqual(expect.arrayContaining(["systemVoltageV", "moduleId"]));

    const notJson = await callApi(plansApi, "action", "/api/v1/plans", a.key, null);
    expect(notJson.status).toBe(400);

    expect({ plans: await count("kit_plan"), revisions: await count("kit_plan_revision") }).toEqual(before);
    expect(await count("kit_plan", a.teamId)).toBe(0);
  });

  it("refuses another team's site as a field error, saving nothing", async () => {
    const a = await teamWithKey("plans-api-owner");
    const b = await teamWithKey("plans-api-other");
    const setup = await planningSetup(a.teamId);
    const foreign = await callApi(plansApi, "action", "/api/v1/plans", b.key, choices(setup));
    expect(foreign.status).toBe(400);
    expect(foreign.body.error.fields.siteId).toMatch(/No such site/);
    expect(await count("kit_plan", b.teamId)).toBe(0);
    expect(await count("kit_plan", a.teamId)).toBe(0);
  });
});

describe("POST /api/v1/sites with a bad body", () => {
  it("saves no site", async () => {
    const a = await teamWithKey("sites-api-bad");
    // A wrong tilt, and a sky preset source without its preset.
    const bad = await callApi(sitesApi, "action", "/api/v1/sites", a.key, pumpSiteBody({ tiltDeg: 120, clearnessPreset: undefined }));
    expect(bad.status).toBe(400);
    expect(bad.body.error.fields.clearnessPreset).toMatch(/Choose a sky preset/);
    expect(await count("site", a.teamId)).toBe(0);
  });
});

describe("the /plans list", () => {
  it("says when a plan's sunshine is assumed from a sky preset, and not for measured irradiation", async () => {
    const a = await teamWithKey("plans-list-sky");
    const measured = await planningSetup(a.teamId);
    const preset = await planningSetup(a.teamId);
    await db.updateTable("site").set({ irradiance_source: "clearness-preset", clearness_preset: "arid" }).where("id", "=", preset.siteId).execute();
    for (const [setup, name] of [
      [measured, "Measured kit"],
      [preset, "Preset kit"],
    ] as const) {
      const saved = await callApi(plansApi, "action", "/api/v1/plans", a.key, choices(setup, { name }));
      expect(saved.status, JSON.stringify(saved.body)).toBe(201);
    }
    const page = await a.client.loader(plansPage, "/plans");
    const byName = Object.fromEntries(page.data.plans.map((p: { name: string; sky: string | null }) => [p.name, p.sky]));
    expect(byName["Preset kit"]).toBe("Sunshine estimated for typical arid, mostly clear skies (clearness index 0.65), not measured at the site.");
    expect(byName["Measured kit"]).toBeNull();
  });
});
