// Browser: an installer records the demo mountain hut as a site with a load sheet, plans a kit, sees
// the charts, and turns a failing cold-morning voltage check green by changing the string layout.
import { expect, it } from "vitest";
import type { Page } from "playwright-core";
import { openBrowser, signInDemo, snap } from "./helpers/browser";
import { VELL_HUT_SITE } from "../../data/demo/vell-valley-climate";

const MONTHS = ["Jan", "Feb", "Mar", "Apr", "May", "Jun", "Jul", "Aug", "Sep", "Oct", "Nov", "Dec"];

async function choose(page: Page, selectId: string, optionText: string) {
  const value = await page.locator(`#${selectId} option`, { hasText: optionText }).first().getAttribute("value");
  await page.locator(`#${selectId}`).selectOption(value!);
}

async function replanned(page: Page) {
  // Several quick edits may start several re-plans: wait until none has been running for a moment.
  await page
    .getByText("Re-planning…")
    .waitFor({ state: "visible", timeout: 5000 })
    .catch(() => {});
  for (let quiet = 0; quiet < 3;) {
    await page.waitForTimeout(200);
    quiet = (await page.getByText("Re-planning…").count()) === 0 ? quiet + 1 : 0;
  }
}

/** The cold-morning string voltage check, once it shows `status` (said in words on the page). */
async function coldMorningCheckIs(page: Page, status: "fail" | "pass") {
  const check = page.locator(`article[data-check-id="array.voc-cold"][data-status="${status}"]`).first();
  await check.waitFor();
  expect(await check.textContent()).toContain(status === "fail" ? "Fail" : "Pass");
  expect(await check.textContent()).toContain("String voltage on the coldest morning");
}

it("plans a kit for the mountain hut and fixes a failing check by changing the string layout", async () => {
  const browser = await openBrowser();
  const { page } = browser;
  await signInDemo(page, "tobin@tallowmere.example");

  // The site, with its twelve months pasted and typed in.
  await page.goto("/sites/new");
  await page.getByLabel("Site name").fill("Mountain hut (browser test)");
  await page.getByLabel("Customer").fill("Hut warden");
  await page.getByLabel("Latitude (° N +, S −)").fill(String(VELL_HUT_SITE.latitudeDeg));
  await page.getByLabel("Longitude (° E +, W −)").fill(String(VELL_HUT_SITE.longitudeDeg));
  await page.getByLabel("Elevation (m)").fill("2140");
  await page.getByLabel("Time zone").fill("Europe/Vienna");
  await page.getByLabel("Array tilt (° from flat)").fill("55");
  await page.getByLabel("Array faces (° compass)").fill("180");
  await page.getByLabel("Ground albedo (0–1)").fill("0.2");
  await page.getByLabel("Shading derate (%)").fill("0");
  await page.getByLabel("Coldest expected air (°C)").fill("-24");
  await page.getByText("Paste or upload monthly data").click();
  await page.getByLabel(/Twelve horizontal irradiation values/).fill(VELL_HUT_SITE.months.map((m) => m.ghiKWhM2Day).join(" "));
  await page.getByRole("button", { name: "Fill irradiation" }).click();
  await page.getByText("Filled the irradiation column.").waitFor();
  for (const [i, m] of VELL_HUT_SITE.months.entries()) {
    await page.getByLabel(`${MONTHS[i]} mean daily maximum, °C`).fill(String(m.tMaxC));
    await page.getByLabel(`${MONTHS[i]} mean daily minimum, °C`).fill(String(m.tMinC));
  }
  expect(await page.getByLabel("Jul horizontal irradiation, kWh/m² per day").inputValue()).toBe("6");
  await page.getByRole("button", { name: "Save site" }).click();
  await page.getByText('Site "Mountain hut (browser test)" saved.').waitFor();

  // The load sheet: totals follow the typing.
  await page.getByRole("link", { name: "New load sheet" }).click();
  await page.getByLabel("Load sheet name").fill("Hut loads");
  await page.getByLabel("Appliance, line 1").fill("Fridge");
  await page.getByLabel("Power W, line 1").fill("55");
  await page.getByLabel("Hours per day, line 1").fill("9");
  await page.getByLabel("Circuit, line 1").selectOption("dc");
  expect(await page.getByTestId("heaviest-wh").textContent()).toBe("495 Wh/day"); // 55 W × 9 h
  await page.getByRole("button", { name: "+ Add an appliance" }).click();
  await page.getByLabel("Appliance, line 2").fill("Water pump");
  await page.getByLabel("Power W, line 2").fill("350");
  await page.getByLabel("Hours per day, line 2").fill("0.5");
  await page.getByLabel("Surge W, line 2").fill("1050");
  await page.getByRole("button", { name: "Save load sheet" }).click();
  await page.getByText('Load sheet "Hut loads" saved.').waitFor();
  const siteId = new URL(page.url()).pathname.split("/").pop();

  // The plan: 4 × 42.9 V modules in series reach about 192 V on a −24 °C morning, over the 150 V limit.
  await page.goto(`/plans/new?siteId=${siteId}`);
  await page.getByLabel("Plan name").fill("Hut kit (browser test)");
  await choose(page, "module", "FM-380H");
  await choose(page, "controller", "AE-MPPT60");
  await choose(page, "battery", "WP-LFP24-200");
  await choose(page, "inverter", "AE-SW2000-24");
  await page.getByLabel(/Modules in series/).fill("4");
  await page.getByLabel(/Strings in parallel/).fill("1");
  await replanned(page);
  await snap(page, "plan-failing-layout");
  await coldMorningCheckIs(page, "fail");

  await page.getByLabel(/Modules in series/).fill("2");
  await page.getByLabel(/Strings in parallel/).fill("2");
  await replanned(page);
  await coldMorningCheckIs(page, "pass");

  await page.getByRole("button", { name: "Save plan" }).click();
  await page.getByText(/saved as revision 1/).waitFor();
  await page.getByRole("heading", { name: "Energy and load, month by month" }).waitFor();
  // Both charts drew their data (recharts renders SVG after hydration): twelve monthly bars and a load
  // line through twelve points, and a state-of-charge area whose outline runs through the year.
  const energy = page.getByRole("img", { name: /array's energy a day against the load/ });
  await energy.locator(".recharts-bar-rectangle path").first().waitFor();
  expect(await energy.locator(".recharts-bar-rectangle path").count()).toBe(12);
  expect(await energy.locator(".recharts-line-dot").count()).toBeGreaterThanOrEqual(12);
  const soc = page.getByRole("img", { name: /state of charge through a simulated year/ });
  const outline = await soc.locator(".recharts-area-curve").first().getAttribute("d");
  // One path command per plotted day at least (the chart may thin the 365 days, never to a handful).
  expect((outline ?? "").match(/[LC]/g)?.length ?? 0).toBeGreaterThan(50);
  await coldMorningCheckIs(page, "pass");
  expect(await page.getByText("The design must follow the local electrical code").count()).toBeGreaterThan(0);
  await snap(page, "plan-saved");
  await browser.close();
});
