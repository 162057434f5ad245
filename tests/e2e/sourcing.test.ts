// Browser: an installer imports the demo supplier price list (data/demo/kestrel-row-price-list.csv),
// reads the dry-run report, commits it, then opens the module comparison: ranked per nameplate watt
// the QP-150P leads the FM-120M; ranked per verified watt the order reverses.
import { fileURLToPath } from "node:url";
import type { Page } from "playwright-core";
import { expect, it } from "vitest";
import { openBrowser, signInDemo, snap } from "./helpers/browser";

const PRICE_LIST = fileURLToPath(new URL("../../data/demo/kestrel-row-price-list.csv", import.meta.url));
const SUPPLIER = "Kestrel Row Wholesale";

/** The models of one supplier's rows, in the order the table shows them. */
async function modelsOf(page: Page, supplier: string) {
  return page
    .locator(`[data-testid="compare-table"] tbody tr[data-supplier="${supplier}"]`)
    .evaluateAll((rows) => rows.map((r) => r.getAttribute("data-model")));
}

function pairOrder(models: (string | null)[]) {
  return models.filter((m) => m?.endsWith("QP-150P") || m?.endsWith("FM-120M")).map((m) => m!.split(" ").pop());
}

it("imports a price list after a dry run, then ranks modules per verified watt", async () => {
  const browser = await openBrowser({ width: 1440, height: 900 });
  const { page } = browser;
  await signInDemo(page, "maren@tallowmere.example");
  await page.getByRole("link", { name: "Sourcing" }).first().click();
  await page.getByRole("heading", { name: "Sourcing", exact: true }).waitFor();
  // The seeded expired offer is kept and flagged.
  await page.getByTestId("expired-flag").first().waitFor();
  expect(await page.getByRole("note").first().textContent()).toContain("left out of the comparisons");
  await snap(page, "sourcing-overview");

  await page.getByRole("link", { name: "Import CSV" }).click();
  await page.getByLabel("CSV file of offers").setInputFiles(PRICE_LIST);
  await page.getByRole("button", { name: "Check the file (writes nothing)" }).click();
  await page.getByTestId("import-summary").waitFor();
  expect(await page.getByTestId("import-summary").textContent()).toContain("8 rows: 8 ready. Nothing has been written yet.");
  const effects = await page.getByTestId("import-effects").textContent();
  expect(effects).toContain(`New supplier: ${SUPPLIER} (EUR)`);
  expect(effects).toContain("8 new offers");
  await snap(page, "sourcing-import-dry-run");

  await page.getByRole("button", { name: "Import 8 offers" }).click();
  await page.waitForURL((url) => url.pathname === "/sourcing");
  expect(await page.getByRole("status").textContent()).toContain("Imported from the CSV file: 8 new offers, 1 new supplier");
  await page.getByTestId("supplier-list").getByRole("link", { name: SUPPLIER }).waitFor();

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
  await browser.close();
});
