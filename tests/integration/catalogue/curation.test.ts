// Curators edit the catalogue; nobody else can. Bad figures are named at the field and nothing is saved.
import { describe, expect, it } from "vitest";
import { installerWithTeam, userWithRole } from "../helpers/fixtures";
import { RouteClient } from "../helpers/route-client";
import { insertModule, moduleFields, uniqueMaker } from "./catalogue-fixtures";
import * as catalogue from "~/routes/catalogue";
import * as importPage from "~/routes/catalogue.import";
import * as moduleMerge from "~/routes/catalogue.module-merge";
import * as modulePage from "~/routes/catalogue.module";
import * as partEdit from "~/routes/catalogue.part-edit";
import * as partNew from "~/routes/catalogue.part-new";
import { db } from "~/server/db.server";

async function modulesNamed(maker: string) {
  return db.selectFrom("pv_module").selectAll().where("maker", "=", maker).execute();
}

describe("who may edit the catalogue", () => {
  it("answers 403 to installers, admins and customers on every curator page and action, and writes nothing", async () => {
    const maker = uniqueMaker("guard");
    const id = await insertModule(maker, "G-1");
    const other = await insertModule(maker, "G-2");
    const people = [await installerWithTeam("cat-installer"), await userWithRole("admin", "cat-admin"), await userWithRole("customer", "cat-customer")];
    for (const { client } of people) {
      expect((await client.loader(partNew, "/catalogue/modules/new", { kind: "modules" })).status).toBe(403);
      expect((await client.action(partNew, "/catalogue/modules/new", moduleFields(maker, "G-3"), { kind: "modules" })).status).toBe(403);
      expect((await client.loader(partEdit, `/catalogue/modules/${id}/edit`, { kind: "modules", partId: id })).status).toBe(403);
      expect(
        (await client.action(partEdit, `/catalogue/modules/${id}/edit`, moduleFields(maker, "G-1", { pmaxW: "101" }), { kind: "modules", partId: id })).status,
      ).toBe(403);
      expect((await client.loader(importPage, "/catalogue/import")).status).toBe(403);
      expect((await client.action(importPage, "/catalogue/import", { kind: "modules", intent: "import", csvText: "maker,model\nA,B" })).status).toBe(403);
      expect((await client.loader(moduleMerge, `/catalogue/modules/${id}/merge`, { moduleId: id })).status).toBe(403);
      expect((await client.action(moduleMerge, `/catalogue/modules/${id}/merge`, { survivorId: other, confirm: "yes" }, { moduleId: id })).status).toBe(403);
    }
    const rows = await modulesNamed(maker);
    expect(rows.map((r) => [r.model, r.pmax_w, r.merged_into])).toEqual(
      expect.arrayContaining([
        ["G-1", 100, null],
        ["G-2", 100, null],
      ]),
    );
    expect(rows).toHaveLength(2);
  });

  it("sends anonymous visitors to sign in, and lets any signed-in user read", async () => {
    const anonymous = await new RouteClient().loader(catalogue, "/catalogue");
    expect(anonymous.status).toBe(302);
    expect(anonymous.location).toMatch(/^\/sign-in/);
    const maker = uniqueMaker("read");
    const id = await insertModule(maker, "R-1");
    const installer = await installerWithTeam("cat-reader");
    const list = await installer.client.loader(catalogue, `/catalogue?q=${encodeURIComponent(maker)}`);
    expect(list.status).toBe(200);
    expect(list.data.canEdit).toBe(false);
    expect(list.data.page.items.map((m: { id: string }) => m.id)).toEqual([id]);
    expect((await installer.client.loader(modulePage, `/catalogue/modules/${id}`, { moduleId: id })).status).toBe(200);
  });
});

describe("editing parts", () => {
  it("adds a module, then rejects Vmp ≥ Voc at the Vmp field and leaves the stored figures alone", async () => {
    const curator = await userWithRole("curator", "cat-curator");
    const maker = uniqueMaker("edit");
    const created = await curator.client.action(partNew, "/catalogue/modules/new", moduleFields(maker), { kind: "modules" });
    expect(created.status, JSON.stringify(created.data)).toBe(302);
    const [row] = await modulesNamed(maker);
    expect(created.location).toBe(`/catalogue/modules/${row.id}`);
    expect(row).toMatchObject({ pmax_w: 100, vmp_v: 18.6, nominal_temp_kind: "noct" });
    expect(row.nameplate_density_wm2).toBeCloseTo(100 / (1.01 * 0.665), 6);

    const bad = await curator.client.action(partEdit, `/catalogue/modules/${row.id}/edit`, moduleFields(maker, "TM-100", { vmpV: "23.1", massKg: "7.5" }), {
      kind: "modules",
      partId: row.id,
    });
    expect(bad.status).toBe(400);
    expect(bad.data.result.error.vmpV).toEqual([expect.stringMatching(/Vmp must be below Voc \(22\.4 V\)/)]);
    const after = await db.selectFrom("pv_module").select(["vmp_v", "mass_kg"]).where("id", "=", row.id).executeTakeFirstOrThrow();
    expect(after).toEqual({ vmp_v: 18.6, mass_kg: 6.9 });

    const good = await curator.client.action(
      partEdit,
      `/catalogue/modules/${row.id}/edit`,
      moduleFields(maker, "TM-100", { massKg: "7.5", nominalTempKind: "nmot", noctC: "42" }),
      { kind: "modules", partId: row.id },
    );
    expect(good.status).toBe(302);
    const saved = await db.selectFrom("pv_module").select(["mass_kg", "nominal_temp_kind", "noct_c"]).where("id", "=", row.id).executeTakeFirstOrThrow();
    expect(saved).toEqual({ mass_kg: 7.5, nominal_temp_kind: "nmot", noct_c: 42 });
  });

  it("names several bad fields at once, each at its field, and saves nothing", async () => {
    const curator = await userWithRole("curator", "cat-curator2");
    const maker = uniqueMaker("bad");
    const result = await curator.client.action(
      partNew,
      "/catalogue/modules/new",
      moduleFields(maker, "B-1", { pmaxW: "130", lengthMm: "abc", cellTechnology: "graphene" }),
      { kind: "modules" },
    );
    expect(result.status).toBe(400);
    const error = result.data.result.error;
    expect(error.lengthMm).toEqual(["Length must be a number in mm."]);
    expect(error.cellTechnology[0]).toMatch(/Cell technology must be one of/);
    expect(await modulesNamed(maker)).toEqual([]);
  });

  it("answers a second model of the same name at the model field", async () => {
    const curator = await userWithRole("curator", "cat-curator3");
    const maker = uniqueMaker("dup");
    await insertModule(maker, "D-1");
    const result = await curator.client.action(partNew, "/catalogue/modules/new", moduleFields(maker, "D-1"), { kind: "modules" });
    expect(result.status).toBe(400);
    expect(result.data.result.error.model).toEqual(["This maker already has a model of that name in the catalogue."]);
  });

  it("adds and edits the other part kinds with their own checks", async () => {
    const curator = await userWithRole("curator", "cat-curator4");
    const maker = uniqueMaker("parts");
    const battery = {
      maker,
      model: "B-100",
      chemistry: "lead-acid-agm",
      nominalVoltageV: "12",
      capacityAh: "100",
      capacityHourRateH: "20",
      usableDodPct: "50",
      cycleLife: "600",
      roundTripEfficiencyPct: "82",
      massKg: "",
    };
    expect((await curator.client.action(partNew, "/catalogue/batteries/new", battery, { kind: "batteries" })).status).toBe(302);
    const stored = await db.selectFrom("battery").selectAll().where("maker", "=", maker).executeTakeFirstOrThrow();
    expect(stored).toMatchObject({ chemistry: "lead-acid-agm", capacity_ah: 100, mass_kg: null });
    const deep = await curator.client.action(
      partEdit,
      `/catalogue/batteries/${stored.id}/edit`,
      { ...battery, usableDodPct: "95" },
      { kind: "batteries", partId: stored.id },
    );
    expect(deep.status).toBe(400);
    expect(deep.data.result.error.usableDodPct[0]).toMatch(/Lead-acid cycled deeper than 80 %/);

    const controller = {
      maker,
      model: "C-40",
      kind: "mppt",
      maxPvPower12W: "520",
      maxPvPower24W: "1040",
      maxPvPower36W: "",
      maxPvPower48W: "",
      maxPvVocV: "150",
      maxChargeCurrentA: "40",
      efficiencyPct: "97",
    };
    expect((await curator.client.action(partNew, "/catalogue/controllers/new", controller, { kind: "controllers" })).status).toBe(302);
    const c = await db.selectFrom("charge_controller").selectAll().where("maker", "=", maker).executeTakeFirstOrThrow();
    expect(c.battery_voltages_v).toEqual([12, 24]);
    expect(c.max_pv_power_w).toEqual({ "12": 520, "24": 1040 });
    const edit = await curator.client.loader(partEdit, `/catalogue/controllers/${c.id}/edit`, { kind: "controllers", partId: c.id });
    expect(edit.data.defaults).toMatchObject({ maxPvPower12W: "520", maxPvPower24W: "1040", maxPvPower48W: "" });

    const inverter = { maker, model: "I-1000", continuousW: "1000", surgeW: "800", dcInputVoltageV: "12", efficiencyPct: "91", idleDrawW: "8" };
    const refused = await curator.client.action(partNew, "/catalogue/inverters/new", inverter, { kind: "inverters" });
    expect(refused.status).toBe(400);
    expect(refused.data.result.error.surgeW[0]).toMatch(/at least the continuous power/);
    expect(await db.selectFrom("inverter").select("id").where("maker", "=", maker).execute()).toEqual([]);
  });

  it("answers 404 for an unknown kind or part", async () => {
    const curator = await userWithRole("curator", "cat-curator5");
    expect((await curator.client.loader(partNew, "/catalogue/cables/new", { kind: "cables" })).status).toBe(404);
    const missing = "00000000-0000-4000-8000-000000000000";
    expect((await curator.client.loader(partEdit, `/catalogue/modules/${missing}/edit`, { kind: "modules", partId: missing })).status).toBe(404);
    expect((await curator.client.loader(modulePage, "/catalogue/modules/nope", { moduleId: "nope" })).status).toBe(404);
  });
});
