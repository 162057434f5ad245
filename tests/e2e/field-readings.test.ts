// Browser: an installer uploads a load sweep, sees the derived Pmax, the chart and the STC result
// before sending, and submits; the curator approves it from the queue; the module's verified
// figures (measured density) change in the catalogue API; the installer's e-mail arrives.
import { writeFileSync, mkdtempSync } from "node:fs";
import { tmpdir } from "node:os";
import { join } from "node:path";
import { expect, it } from "vitest";
import { mailTo, openBrowser, signInDemo, snap } from "./helpers/browser";
import { demoModulePhoto } from "../../scripts/lib/demo-photo";
import { evaluateReading } from "~/domain/readings/evaluate-reading";
import { currentAtVoltageA, explicitIvModel } from "~/domain/solar/iv-model";

// An invented sweep of a 36-cell module on a clear day, from the explicit I–V model.
const CURVE = explicitIvModel({ vocV: 21.3, iscA: 4.9, vmpV: 17.2, impA: 4.5 });
const POINTS = Array.from({ length: 70 }, (_, i) => {
  const voltageV = (21.3 * i) / 69;
  return { voltageV: Number(voltageV.toFixed(4)), currentA: Number(currentAtVoltageA(CURVE, voltageV).toFixed(5)) };
});
const CSV = ["voltage (V),current (A)", ...POINTS.map((p) => `${p.voltageV},${p.currentA}`)].join("\n");
const CONDITIONS = {
  kind: "sweep" as const,
  takenAtLocal: "2026-09-08T12:40",
  utcOffsetH: 1,
  latitudeDeg: 46.41,
  longitudeDeg: 9.83,
  tiltDeg: 40,
  azimuthDeg: 180,
  airTempC: 18,
  moduleTempC: 40,
  irradianceSource: "pyranometer" as const,
  irradianceWm2: 910,
};
// Harrowgate Cells HG-100M36 (data/demo/modules.ts): 100 W, γ −0.39 %/°C, NOCT 45 °C.
const EXPECTED = evaluateReading(CONDITIONS, { pmaxW: 100, gammaPmaxPctPerC: -0.39, noctC: 45 }, { csv: CSV });

/** The form fills in the UTC offset from the browser's clock once React has taken over the page. */
async function hydrated(page: import("playwright-core").Page) {
  await expect.poll(() => page.getByLabel("UTC offset").inputValue(), { timeout: 15000 }).not.toBe("");
}

async function moduleApi(page: import("playwright-core").Page, moduleId: string) {
  const res = await page.request.get(`/api/v1/modules/${moduleId}`);
  expect(res.status()).toBe(200);
  return (await res.json()) as { readings: { approvedCount: number; verifiedPmaxW: number; measuredDensityWm2: number } };
}

it("an installer submits a sweep, the curator approves it, and the module's verified figures change", async () => {
  if (!EXPECTED.ok) throw new Error(EXPECTED.message);
  const dir = mkdtempSync(join(tmpdir(), "kitwright-reading-"));
  const csvPath = join(dir, "sweep.csv");
  const photoPath = join(dir, "module.png");
  writeFileSync(csvPath, CSV);
  writeFileSync(photoPath, demoModulePhoto(3));

  const installer = await openBrowser();
  const page = installer.page;
  await signInDemo(page, "tobin@tallowmere.example");
  await page.getByRole("link", { name: "Field readings" }).first().click();
  await page.getByRole("heading", { name: "Field readings" }).waitFor();
  await page.getByRole("link", { name: "Submit a reading" }).click();
  await page.getByRole("heading", { name: "Submit a field reading" }).waitFor();
  await page.getByRole("note", { name: "Measuring safely" }).waitFor();
  await hydrated(page);

  await page.getByLabel("Model").selectOption({ label: "Harrowgate Cells HG-100M36 — 100 W mono-PERC" });
  const moduleId = await page.getByLabel("Model").inputValue();
  const before = await moduleApi(page, moduleId);

  await page.getByLabel("Sweep file").setInputFiles(csvPath);
  const pmax = page.getByTestId("sweep-pmax");
  await pmax.waitFor();
  expect(await pmax.textContent()).toBe(`${EXPECTED.sweep!.analysis.pmaxW.toFixed(1)} W`);
  expect(await page.getByTestId("sweep-fill-factor").textContent()).toBe(EXPECTED.sweep!.analysis.fillFactor.toFixed(3));
  await page.getByRole("img", { name: /Load sweep of 70 points/ }).waitFor();

  await page.getByLabel("Date and time").fill(CONDITIONS.takenAtLocal);
  await page.getByLabel("UTC offset").fill("1");
  await page.getByLabel("Latitude").fill("46.41");
  await page.getByLabel("Longitude").fill("9.83");
  await page.getByLabel("Module tilt").fill("40");
  await page.getByLabel("Module azimuth").fill("180");
  await page.getByLabel("Air temperature").fill("18");
  await page.getByLabel("Back-sheet temperature").fill("40");
  await page.getByLabel("Measured with a pyranometer").check();
  await page.getByLabel("Irradiance in the module's plane").fill("910");
  await page.getByLabel("Instruments").fill("Invented EL-150 electronic load; pyranometer; contact thermometer");
  await page.getByLabel("Method").fill("Open rack behind the workshop, one-second sweep from short to open circuit.");
  await page.getByLabel("Evidence photo").setInputFiles(photoPath);

  // The result before sending: STC value and its uncertainty, as the engine computes it.
  const stc = page.getByTestId("stc-pmax");
  await stc.waitFor();
  expect(await stc.textContent()).toContain(`${EXPECTED.reading.stcPmaxW.toFixed(1)} W`);
  expect(await stc.textContent()).toContain(`± ${EXPECTED.reading.uncertaintyPct.toFixed(1)} %`);
  await page.getByText("measured with a pyranometer", { exact: true }).waitFor();
  await snap(page, "field-reading-form");

  await page.getByRole("button", { name: "Send to the curator" }).click();
  await page.waitForURL(/\/readings\/[0-9a-f-]{36}$/);
  const readingUrl = page.url();
  expect(await page.getByRole("status").textContent()).toContain("Reading sent to the curator");
  await page.getByText("Pending review").first().waitFor();
  await snap(page, "field-reading-pending");

  // The curator approves it from the queue.
  const curator = await openBrowser();
  const cpage = curator.page;
  await signInDemo(cpage, "curator@kitwright.example");
  await cpage.getByRole("link", { name: "Review" }).first().click();
  await cpage.getByRole("heading", { name: "Review" }).waitFor();
  const card = cpage.getByRole("article", { name: "Reading of the Harrowgate Cells HG-100M36" });
  await card.waitFor();
  expect(await card.textContent()).toContain(`${EXPECTED.reading.stcPmaxW.toFixed(1)} W`);
  await card.getByRole("img", { name: /Load sweep of 70 points/ }).waitFor();
  await snap(cpage, "review-queue");
  await card.getByLabel(/^Reason/).fill("Clear day, pyranometer in plane, label readable in the photo.");
  await card.getByRole("button", { name: "Approve" }).click();
  await cpage.getByText("Approved 1 reading").waitFor();
  expect(await cpage.getByRole("article", { name: "Reading of the Harrowgate Cells HG-100M36" }).count()).toBe(0);
  await curator.close();

  // The catalogue's figures follow at once.
  const after = await moduleApi(page, moduleId);
  expect(after.readings.approvedCount).toBe(before.readings.approvedCount + 1);
  expect(after.readings.verifiedPmaxW).not.toBe(before.readings.verifiedPmaxW);
  expect(after.readings.measuredDensityWm2).not.toBe(before.readings.measuredDensityWm2);
  await page.goto(readingUrl);
  await page.getByText("Approved").first().waitFor();
  expect(await page.getByTestId("module-verified").textContent()).toContain(
    `${after.readings.verifiedPmaxW.toFixed(1)} W verified from ${after.readings.approvedCount} readings`,
  );
  await page.getByText("Clear day, pyranometer in plane, label readable in the photo.").waitFor();
  await snap(page, "field-reading-approved");

  const mail = await mailTo("tobin@tallowmere.example", "is approved");
  expect(mail.text).toContain("Reason: Clear day, pyranometer in plane, label readable in the photo.");
  expect(mail.text).toContain(new URL(readingUrl).pathname);
  await installer.close();
});

it("names a bad sweep at once, and a photo that is not an image after sending, keeping what was typed", async () => {
  const dir = mkdtempSync(join(tmpdir(), "kitwright-reading-bad-"));
  const badCsv = join(dir, "bad.csv");
  const fakePhoto = join(dir, "module.jpg");
  writeFileSync(badCsv, "voltage,current\n0,5.4\n8.2,five\n12,5.1\n");
  writeFileSync(fakePhoto, "This is a shopping list, not a photo.\n");

  const browser = await openBrowser({ width: 390, height: 844 });
  const page = browser.page;
  await signInDemo(page, "maren@tallowmere.example");
  const countBefore = ((await (await page.request.get("/api/v1/readings")).json()) as { total: number }).total;
  await page.goto("/readings/new");
  await hydrated(page);
  await page.getByLabel("Model").selectOption({ label: "Fellmark Solar FM-120M — 120 W mono-PERC" });
  await page.getByLabel("Sweep file").setInputFiles(badCsv);
  await page.getByRole("alert").filter({ hasText: 'Row 3: current "five" is not a number.' }).waitFor();

  await page.getByLabel("One reading").check();
  await page.getByRole("textbox", { name: "Power (W)" }).fill("104.5");
  await page.getByLabel("Date and time").fill("2026-09-08T12:50");
  await page.getByLabel("UTC offset").fill("1");
  await page.getByLabel("Latitude").fill("46.41");
  await page.getByLabel("Longitude").fill("9.83");
  await page.getByLabel("Module tilt").fill("35");
  await page.getByLabel("Module azimuth").fill("180");
  await page.getByLabel("Air temperature").fill("19");
  await page.getByLabel("Not measured").check();
  await page.getByText("estimated from a clear-sky model — weighted lower").waitFor();
  await page.getByText("Flagged:", { exact: false }).first().waitFor();
  await page.getByLabel("Instruments").fill("Invented MPPT controller display");
  await page.getByLabel("Method").fill("Read off the controller at the maximum power point.");
  await page.getByLabel("Evidence photo").setInputFiles(fakePhoto);
  await page.getByRole("button", { name: "Send to the curator" }).click();

  await page.getByText("This file is not a JPEG, PNG or WebP image").waitFor();
  expect(new URL(page.url()).pathname).toBe("/readings/new");
  expect(await page.getByRole("textbox", { name: "Power (W)" }).inputValue()).toBe("104.5");
  expect(await page.getByLabel("Method").inputValue()).toBe("Read off the controller at the maximum power point.");
  await snap(page, "field-reading-photo-refused-phone");
  const countAfter = ((await (await page.request.get("/api/v1/readings")).json()) as { total: number }).total;
  expect(countAfter).toBe(countBefore);
  await browser.close();
});
