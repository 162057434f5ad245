// Browser: the friendly 404 and 403 pages. They keep the app shell (brand and the role's navigation),
// say what happened in plain words, answer with the right status and lead back to the start page.
import type { Page } from "playwright-core";
import { expect, it } from "vitest";
import { openBrowser, signInDemo } from "./helpers/browser";

async function mainNavLabels(page: Page) {
  return page.getByRole("banner").getByRole("navigation", { name: "Main" }).getByRole("link").allTextContents();
}

it("shows an unknown address as the 404 page, inside the shell, with a way back", async () => {
  const browser = await openBrowser();
  const { page } = browser;
  await signInDemo(page, "maren@tallowmere.example");
  const response = await page.goto("/plans-that-never-were/42");
  expect(response?.status()).toBe(404);
  expect(await page.title()).toContain("Kitwright");
  await page.getByRole("heading", { level: 1, name: "Nothing here" }).waitFor();
  expect(await page.getByRole("main").textContent()).toContain("We could not find that page. It may have moved, or the link may be mistyped.");
  expect(await mainNavLabels(page)).toContain("Kit plans");
  await page.getByRole("link", { name: "Back to the start page" }).click();
  await page.waitForURL((url) => url.pathname === "/");
  await page.getByRole("heading", { level: 1, name: "Good to see you, Maren" }).waitFor();
  expect(await page.getByRole("heading", { level: 1, name: "Nothing here" }).count()).toBe(0);
  await browser.close();
});

it("shows the 404 page to a visitor who is not signed in, with the sign-in links", async () => {
  const browser = await openBrowser({ width: 390, height: 844 });
  const { page } = browser;
  const response = await page.goto("/no-such-page");
  expect(response?.status()).toBe(404);
  await page.getByRole("heading", { level: 1, name: "Nothing here" }).waitFor();
  await page.locator("header details summary").click();
  await page.getByRole("banner").getByRole("link", { name: "Sign in" }).waitFor();
  await browser.close();
});

it.each(["/catalogue", "/admin/users"])("shows a customer the 403 page for %s, keeping their own navigation", async (path) => {
  const browser = await openBrowser();
  const { page } = browser;
  await signInDemo(page, "warden@vell-hut.example");
  const response = await page.goto(path);
  expect(response?.status()).toBe(403);
  await page.getByRole("heading", { level: 1, name: "Not open to your account" }).waitFor();
  expect(await page.getByRole("main").textContent()).toContain("Your account does not have access to this page.");
  // Nothing of the guarded page leaks into the error page.
  expect(await page.getByRole("table").count()).toBe(0);
  expect(await mainNavLabels(page)).toEqual(["Your quotes"]);
  await page.getByRole("link", { name: "Back to the start page" }).click();
  await page.waitForURL((url) => url.pathname === "/");
  await page.getByRole("heading", { level: 1, name: "Good to see you, Aurel" }).waitFor();
  await browser.close();
});
