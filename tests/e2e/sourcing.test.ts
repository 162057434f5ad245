// Browser: an installer opens the demo team's sourcing overview (the expired offer kept and flagged),
// then the module comparison: ranked per nameplate watt a seeded supplier's QP-150P leads its FM-120M;
// ranked per verified watt the order reverses. (Importing the demo price list and using the cheapest
// kit is the journey in sourcing-to-kit.test.ts.)
import type { Page } from "playwright-core";
import { expect, it } from "vitest";
import { openBrowser, signInDemo, snap } from "./helpers/browser";

// A seeded supplier (data/demo/sourcing.ts) that offers both modules.
const SUPPLIER = "Oberhollow Solar Trading";

/** The models of one supplier's rows, in the order the table shows them. */
async function modelsOf(page: Page, supplier: string) {
  return page
    .locator(`[data-testid="compare-table"] tbody tr[data-supplier="${supplier}"]`)
    .evaluateAll((rows) => rows.map((r) => r.getAttribute("data-model")));
}

function pairOrder(models: (string | null)[]) {
  return models.filter((m) => m?.endsWith("QP-150P") || m?.endsWith("FM-120M")).map((m) => m!.split(" ").pop());
}

it("flags the expired offer, then ranks modules per verified watt", async () => {
  const browser = await openBrowser({ width: 1440, height: 900 });
  const { page } = browser;
  await signInDemo(page, "maren@tallowmere.example");
  await page.getByRole("link", { name: "Sourcing" }).first().click();
  await page.getByRole("heading", { name: "Sourcing", exact: true }).waitFor();
  // The seeded expired offer is kept and flagged.
  await page.getByTestId("expired-flag").first().waitFor();
  expect(await page.getByRole("note").first().textContent()).toContain("left out of the comparisons");
  await snap(page, "sourcing-overview");

  await page.getByRole("link", { name: "Compare", exact: true }).click();
  await page.getByRole("heading", { name: "Compare modules" }).waitFor();
  expect(await page.getByTestId("need-summary").textContent()).toContain("1,000 W");

  await page.getByRole("button", { name: /Price per nameplate W/ }).click();
  await page.waitForURL((url) => url.searchParams.get("sort") === "perNameplateW");
  await page.locator('th[aria-sort="ascending"]', { hasText: "Price per nameplate W" }).waitFor();
  expect(pairOrder(await modelsOf(page, SUPPLIER))).toEqual(["QP-150P", "FM-120M"]);

  await page.getByRole("button", { name: /Price per verified W/ }).click();
  await page.waitForURL((url) => url.searchParams.get("sort") === "perVerifiedW" && url.searchParams.get("dir") === "asc");
  await page.locator('th[aria-sort="ascending"]', { hasText: "Price per verified W" }).waitFor();
  expect(pairOrder(await modelsOf(page, SUPPLIER))).toEqual(["FM-120M", "QP-150P"]);
  // The cheapest per verified watt heads the whole table; rows without readings come last.
  const firstVerified = await page.locator('[data-testid="compare-table"] tbody tr').first().getByTestId("per-verified-w").getAttribute("data-amount");
  expect(Number(firstVerified)).toBeGreaterThan(0);
  await snap(page, "sourcing-compare-verified");

  // The pound offers show their rate and its date.
  expect(await page.locator('tr[data-supplier="Carrick & Dunmore Components"]').first().textContent()).toMatch(
    /1 GBP = 1\.1725 EUR, rate of \d{4}-\d{2}-\d{2}/,
  );

  // Batteries are counted for the bank (24 V, 4.8 kWh usable by default), not all at one count:
  // 2 V cells 12 in series, 12 V blocks 2 in series × 4 strings of 100 Ah at 50 % depth.
  await page.getByRole("navigation", { name: "Kind of part" }).getByRole("link", { name: "Batteries" }).click();
  await page.getByRole("heading", { name: "Compare batteries" }).waitFor();
  expect(await page.getByTestId("need-summary").textContent()).toContain("24 V bank that holds 4.8 kWh usable");
  const rowOf = (model: string) => page.locator(`[data-testid="compare-table"] tbody tr[data-model$="${model}"]`).first();
  expect(await rowOf("KS-1000F2").getByTestId("bank-count").textContent()).toMatch(/^for 12: 12 in series × 1 string,/);
  expect(await rowOf("KS-100AGM").getByTestId("bank-count").textContent()).toMatch(/^for 8: 2 in series × 4 strings,/);
  // The landed cost is for that count.
  expect(await rowOf("KS-1000F2").getByTestId("landed").locator("xpath=..").textContent()).toContain("for 12");
  expect(await rowOf("KS-100AGM").getByTestId("landed").locator("xpath=..").textContent()).toContain("for 8");
  expect(await rowOf("WP-LFP48-100").getByTestId("bank-count").textContent()).toContain("51.2 V blocks do not make a 24 V bank");
  // …so it has no landed cost for this bank, and sorting by landed cost puts it after every model that has.
  expect(await rowOf("WP-LFP48-100").getByTestId("landed-none").textContent()).toContain("not for a 24 V bank");
  const table = page.getByTestId("compare-table");
  await table.getByRole("button", { name: /^Landed/ }).click();
  const models = await table.locator("tbody tr").evaluateAll((rows) => rows.map((r) => r.getAttribute("data-model") ?? ""));
  expect(models.findIndex((m) => m.endsWith("WP-LFP48-100"))).toBe(models.length - 1);
  await table.getByRole("button", { name: /^Landed/ }).click(); // the other direction: still last
  const reversed = await table.locator("tbody tr").evaluateAll((rows) => rows.map((r) => r.getAttribute("data-model") ?? ""));
  expect(reversed[0]).not.toBe(models[0]);
  expect(reversed.findIndex((m) => m.endsWith("WP-LFP48-100"))).toBe(reversed.length - 1);
  await snap(page, "sourcing-compare-batteries");
  await browser.close();
});
