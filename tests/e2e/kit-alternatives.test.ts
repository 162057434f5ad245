// Browser: the demo owner opens the cheaper kits for the seeded "Station kit, 24 V AGM" plan, reads the
// search's counts, uses the cheapest kit and finds it saved as the plan's next revision with its note.
import { expect, it } from "vitest";
import { openBrowser, signInDemo, snap } from "./helpers/browser";

it("applies the cheapest kit alternative to a demo plan as a new revision", async () => {
  const browser = await openBrowser();
  const { page } = browser;
  try {
    await signInDemo(page, "maren@tallowmere.example");
    await page.goto("/plans");
    await page.getByRole("link", { name: "Station kit, 24 V AGM" }).first().click();
    await page.waitForURL(/\/plans\/[0-9a-f-]+$/);
    const planUrl = new URL(page.url()).pathname;
    const lead = page.locator("p", { hasText: /Revision \d+ \(latest\)/ }).first();
    await lead.waitFor();
    const before = Number(/Revision (\d+)/.exec((await lead.textContent()) ?? "")?.[1]);
    expect(before).toBeGreaterThanOrEqual(1);

    await page.getByRole("link", { name: "Cheaper kits from your offers →" }).click();
    await page.waitForURL(`${planUrl}/alternatives`);
    const figures = page.getByTestId("search-figures");
    await figures.waitFor();
    expect(await figures.textContent()).toMatch(/candidate kits considered/);
    expect(await figures.textContent()).toMatch(/pruned/);
    const rows = page.getByTestId("alternative-row");
    expect(await rows.count()).toBeGreaterThan(0);
    expect(await rows.count()).toBeLessThanOrEqual(10);
    expect(await rows.first().textContent()).toMatch(/EUR\/kWh/);
    await snap(page, "kit-alternatives");

    await rows.first().getByRole("button", { name: "Use this kit" }).click();
    await page.waitForURL(planUrl);
    await page.getByText("Kit applied: saved as revision").waitFor();
    const newLead = page.locator("p", { hasText: `Revision ${before + 1} (latest)` }).first();
    await newLead.waitFor();
    const after = (await newLead.textContent()) ?? "";
    expect(after).toContain("Applied kit alternative:");
    await snap(page, "kit-alternatives-applied");
  } finally {
    await browser.close();
  }
});
