// Browser: an installer searches, filters and sorts the catalogue and opens a module's page with its
// chart of readings; a curator edits a module and is stopped at the field when Vmp ≥ Voc.
import { afterAll, beforeAll, expect, it } from "vitest";
import { Kysely, PostgresDialect } from "kysely";
import pg from "pg";
import type { Page } from "playwright-core";
import { openBrowser, signInDemo, snap } from "./helpers/browser";
import type { Database } from "~/server/db-schema";
import { recomputeVerifiedFigures } from "~/server/catalogue/verified-figures.server";

// Field readings are submitted and approved through another feature's pages; here a few approved
// readings of one demo module are written straight into the browser-test database.
let db: Kysely<Database>;
beforeAll(async () => {
  db = new Kysely<Database>({ dialect: new PostgresDialect({ pool: new pg.Pool({ connectionString: process.env.DATABASE_URL, max: 2 }) }) });
  const module = await db
    .selectFrom("pv_module")
    .select("id")
    .where("maker", "=", "Quillon Photonics")
    .where("model", "=", "QP-150P")
    .executeTakeFirstOrThrow();
  for (const [i, stc] of [131.5, 128.2, 133.9, 126.4].entries()) {
    await db
      .insertInto("field_reading")
      .values({
        module_id: module.id,
        status: "approved",
        kind: "single",
        measured_pmax_w: stc * 0.8,
        taken_at: new Date(Date.UTC(2026, 3, 4 + 9 * i, 11)),
        latitude_deg: 46.4,
        longitude_deg: 7.6,
        tilt_deg: 40,
        azimuth_deg: 180,
        air_temp_c: 14,
        irradiance_wm2: 880,
        irradiance_source: i === 3 ? "clear-sky-estimate" : "pyranometer",
        instrument: "electronic load",
        method: "sweep",
        cell_temp_c: 40,
        stc_pmax_w: stc,
        uncertainty_pct: 4,
      })
      .execute();
  }
  await recomputeVerifiedFigures(db, module.id);
});
afterAll(async () => {
  await db?.destroy();
});

async function modelNames(page: Page) {
  return page.locator("tbody tr td:first-child a").allTextContents();
}

async function nameplateWatts(page: Page) {
  const cells = await page.locator("tbody tr td:nth-child(2)").allTextContents();
  return cells.map((t) => Number(t.replace(/[^\d.]/g, "")));
}

async function settled(page: Page, countText: RegExp) {
  await page.getByTestId("result-count").filter({ hasText: countText }).waitFor();
  await page.getByText("Loading…").waitFor({ state: "hidden" });
}

it("an installer searches, filters and sorts the catalogue, then opens a module with its readings chart", async () => {
  const browser = await openBrowser();
  const { page } = browser;
  await signInDemo(page, "maren@tallowmere.example");
  await page.getByRole("link", { name: "Catalogue" }).first().click();
  await page.getByRole("heading", { name: "Catalogue" }).waitFor();
  expect(Number((await page.getByTestId("result-count").textContent())!.replace(/[^\d].*$/, ""))).toBeGreaterThanOrEqual(40);

  // Search by maker: typing filters after a pause, through the server.
  await page.getByLabel("Search maker or model").fill("Quillon");
  await settled(page, /^6 modules/);
  expect((await modelNames(page)).every((name) => name.startsWith("Quillon Photonics"))).toBe(true);
  expect(page.url()).toContain("q=Quillon");

  // A power range: 100 W and up leaves four Quillon models.
  await page.getByLabel("Nameplate from (W)").fill("100");
  await settled(page, /^4 modules/);
  expect((await nameplateWatts(page)).every((w) => w >= 100)).toBe(true);

  // Sort on nameplate watts, both ways.
  const header = page.getByRole("columnheader", { name: /Nameplate/ });
  await header.getByRole("button").click();
  await page.waitForURL(/sort=pmaxW/);
  await settled(page, /^4 modules/);
  const first = await header.getAttribute("aria-sort");
  const watts = await nameplateWatts(page);
  expect(watts).toEqual([...watts].sort((a, b) => (first === "ascending" ? a - b : b - a)));
  await header.getByRole("button").click();
  await page.waitForURL(first === "ascending" ? /dir=desc/ : /dir=asc/);
  await settled(page, /^4 modules/);
  expect(await nameplateWatts(page)).toEqual([...watts].reverse());

  // Only models with readings; the verified ratio says where it comes from.
  await page.getByLabel("Field readings").selectOption("true");
  await page.waitForURL(/hasReadings=true/);
  await page.getByRole("link", { name: "Quillon Photonics QP-150P" }).waitFor();
  await snap(page, "catalogue-filtered");
  await page.getByRole("link", { name: "Quillon Photonics QP-150P" }).click();

  await page.getByRole("heading", { name: "Quillon Photonics QP-150P" }).waitFor();
  const chart = page.getByTestId("readings-chart");
  await chart.locator(".recharts-scatter-symbol").first().waitFor();
  const drawn = await chart.locator(".recharts-scatter-symbol").count();
  expect(drawn).toBe(Number(await chart.getAttribute("data-points")));
  expect(drawn).toBeGreaterThanOrEqual(4);
  await page.getByText(/verified from \d+ readings/).waitFor();
  expect(await page.getByTestId("verified-ratio").textContent()).toMatch(/\d+ %.*(below|near|above) nameplate/);
  await page.getByText("nameplate · maker's datasheet at STC").waitFor();
  await snap(page, "catalogue-module");
  await browser.close();
});

it("a curator edits a module and is stopped at the Vmp field when Vmp is not below Voc", async () => {
  const browser = await openBrowser();
  const { page } = browser;
  await signInDemo(page, "curator@kitwright.example");
  await page.goto("/catalogue?q=HG-100M36");
  await page.getByRole("link", { name: "Harrowgate Cells HG-100M36" }).click();
  await page.getByRole("link", { name: "Edit nameplate" }).click();
  await page.getByRole("heading", { name: "Edit Harrowgate Cells HG-100M36" }).waitFor();

  await page.getByLabel("Vmp").fill("22.9");
  await page.getByRole("button", { name: "Save changes" }).click();
  const error = page.getByText("Vmp must be below Voc (22.4 V)");
  await error.waitFor();
  // The message belongs to the Vmp field: the input points at it and is marked invalid.
  const vmp = page.getByLabel("Vmp");
  expect(await vmp.getAttribute("aria-invalid")).toBe("true");
  expect(await vmp.getAttribute("aria-describedby")).toContain(await error.getAttribute("id"));
  await snap(page, "catalogue-edit-error");

  await vmp.fill("18.6");
  await page.getByLabel("Mass").fill("7.1");
  await page.getByRole("button", { name: "Save changes" }).click();
  await page.getByText("Saved the module Harrowgate Cells HG-100M36.").waitFor();
  await page.getByText("7.1 kg").waitFor();
  await browser.close();
});
