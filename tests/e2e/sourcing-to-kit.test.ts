// Browser: the sourcing journey from end to end. The demo owner imports the demo supplier price list
// (data/demo/kestrel-row-price-list.csv) after a dry run, opens the kits that meet the seeded
// "Station kit, 24 V AGM" plan, finds them cheapest first, uses the first one, and finds its module,
// battery and module count on the plan as the next revision.
import { fileURLToPath } from "node:url";
import type { Locator, Page } from "playwright-core";
import { expect, it } from "vitest";
import { openBrowser, signInDemo, snap } from "./helpers/browser";

const PRICE_LIST = fileURLToPath(new URL("../../data/demo/kestrel-row-price-list.csv", import.meta.url));
const SUPPLIER = "Kestrel Row Wholesale";
const PLAN = "Station kit, 24 V AGM";

/** "8 × Maker Model (Supplier, EUR 1,123.45 landed)" → count and part name, from one part line of a kit row. */
async function partOf(line: Locator) {
  const text = (await line.textContent()) ?? "";
  const match = /(\d+) × (.+?) \(/.exec(text);
  if (!match) throw new Error(`No "count × part" in: ${text}`);
  return { count: Number(match[1]), label: match[2].trim() };
}

async function hidden(row: Locator, name: string) {
  return Number(await row.locator(`input[type="hidden"][name="${name}"]`).getAttribute("value"));
}

async function revisionOf(page: Page) {
  const lead = page.locator("p", { hasText: /Revision \d+ \(latest\)/ }).first();
  await lead.waitFor();
  return { number: Number(/Revision (\d+) \(latest\)/.exec((await lead.textContent()) ?? "")?.[1]), lead };
}

it("imports the demo price list, then applies the cheapest kit that meets a plan", async () => {
  const browser = await openBrowser({ width: 1440, height: 900 });
  const { page } = browser;
  try {
    await signInDemo(page, "maren@tallowmere.example");

    // 1. The price list: a dry run that writes nothing, then the import.
    await page.getByRole("link", { name: "Sourcing" }).first().click();
    await page.getByRole("heading", { name: "Sourcing", exact: true }).waitFor();
    await page.getByRole("link", { name: "Import CSV" }).click();
    await page.getByLabel("CSV file of offers").setInputFiles(PRICE_LIST);
    await page.getByRole("button", { name: "Check the file (writes nothing)" }).click();
    await page.getByTestId("import-summary").waitFor();
    expect(await page.getByTestId("import-summary").textContent()).toContain("8 rows: 8 ready. Nothing has been written yet.");
    const effects = await page.getByTestId("import-effects").textContent();
    expect(effects).toContain(`New supplier: ${SUPPLIER} (EUR)`);
    expect(effects).toContain("8 new offers");
    await snap(page, "journey-import-dry-run");
    await page.getByRole("button", { name: "Import 8 offers" }).click();
    await page.waitForURL((url) => url.pathname === "/sourcing");
    expect(await page.getByRole("status").textContent()).toContain("Imported from the CSV file: 8 new offers, 1 new supplier");
    await page.getByTestId("supplier-list").getByRole("link", { name: SUPPLIER }).waitFor();

    // 2. The plan, and the kits that meet it.
    await page.goto("/plans");
    await page.getByRole("link", { name: PLAN }).first().click();
    await page.waitForURL(/\/plans\/[0-9a-f-]+$/);
    const planUrl = new URL(page.url()).pathname;
    const before = (await revisionOf(page)).number;
    expect(before).toBeGreaterThanOrEqual(1);
    await page.locator(`a[href="${planUrl}/alternatives"]`).first().click();
    await page.waitForURL(`${planUrl}/alternatives`);
    const figures = page.getByTestId("search-figures");
    await figures.waitFor();
    expect(await figures.textContent()).toMatch(/candidate kits considered/);
    const rows = page.getByTestId("alternative-row");
    const count = await rows.count();
    expect(count).toBeGreaterThan(0);
    expect(count).toBeLessThanOrEqual(10);

    // Cheapest first: every total is at least the one above it (totals are exact two-digit decimals).
    const totals = (await rows.getByTestId("total-landed").allTextContents()).map((t) => {
      const match = /^\s*EUR ([\d,]+)\.(\d{2})\s*$/.exec(t);
      if (!match) throw new Error(`Not a total in EUR: "${t}"`);
      return Number(match[1].replaceAll(",", "")) * 100 + Number(match[2]);
    });
    expect(totals).toHaveLength(count);
    for (let i = 1; i < totals.length; i++) expect(totals[i], `row ${i + 1} after row ${i}`).toBeGreaterThanOrEqual(totals[i - 1]);

    // Row 1: its module, battery and module count (the count agrees with its string layout).
    const first = rows.first();
    const module = await partOf(first.getByTestId("part-modules"));
    const battery = await partOf(first.getByTestId("part-batteries"));
    expect(module.count).toBe((await hidden(first, "modulesInSeries")) * (await hidden(first, "stringsInParallel")));
    await snap(page, "journey-kit-alternatives");

    // 3. Use it: the plan comes back as the next revision with exactly those parts and counts.
    await first.getByRole("button", { name: "Use this kit" }).click();
    await page.waitForURL(planUrl);
    await page.getByText(`Kit applied: saved as revision ${before + 1}.`).waitFor();
    const after = await revisionOf(page);
    expect(after.number).toBe(before + 1);
    expect(await after.lead.textContent()).toContain("Applied kit alternative:");
    const moduleRow = page.getByTestId("part-module").first();
    const batteryRow = page.getByTestId("part-battery").first();
    expect((await moduleRow.locator("td").first().textContent())?.trim()).toBe(String(module.count));
    expect(await moduleRow.locator("td").nth(1).textContent()).toContain(module.label);
    expect((await batteryRow.locator("td").first().textContent())?.trim()).toBe(String(battery.count));
    expect(await batteryRow.locator("td").nth(1).textContent()).toContain(battery.label);
    await snap(page, "journey-kit-applied");
  } finally {
    await browser.close();
  }
});
