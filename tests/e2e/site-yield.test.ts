// Browser: an installer edits a site on the yield page; the figures follow through the API, a bad
// value is named at its field, and PWM harvests less than MPPT.
import { expect, it } from "vitest";
import { openBrowser, signInDemo, snap } from "./helpers/browser";

async function annualKWh(page: import("playwright-core").Page) {
  return Number((await page.getByTestId("annual-kwh").textContent())!.replace(/[^\d.]/g, ""));
}

async function settled(page: import("playwright-core").Page) {
  // The page recalculates 350 ms after the last edit; wait for the request to start and to finish.
  await page
    .getByText("Recalculating…")
    .waitFor({ state: "visible", timeout: 5000 })
    .catch(() => {});
  await page.getByText("Recalculating…").waitFor({ state: "hidden" });
}

it("recalculates as the installer edits, and names bad input at the field", async () => {
  const browser = await openBrowser();
  const { page } = browser;
  await signInDemo(page, "maren@tallowmere.example");
  await page.getByRole("link", { name: "Site yield" }).first().click();
  await page.getByRole("heading", { name: "Site yield" }).waitFor();
  const start = await annualKWh(page);
  expect(start).toBeGreaterThan(50);
  expect(await page.getByTestId("assumptions").textContent()).toContain("Klein");

  // A vertical array gathers less over the year than one near the latitude tilt.
  await page.getByLabel("Tilt").fill("90");
  await settled(page);
  const vertical = await annualKWh(page);
  expect(vertical).toBeLessThan(start);

  await page.getByLabel("Latitude").fill("95");
  await settled(page);
  await page.getByText("Latitude must be at most 90°.").waitFor();
  expect(await page.getByRole("alert").textContent()).toContain("last valid input");
  expect(await annualKWh(page)).toBe(vertical);
  await page.getByLabel("Latitude").fill("46.4");
  await page.getByLabel("Tilt").fill("55");
  await settled(page);
  expect(await annualKWh(page)).toBeCloseTo(start, 1);

  // A 36-cell module on a 12 V battery: PWM holds it near battery voltage and harvests less.
  await page.getByLabel("Controller").selectOption("pwm");
  await settled(page);
  expect(await annualKWh(page)).toBeLessThan(start * 0.95);
  await snap(page, "site-yield-pwm");
  await browser.close();
});
