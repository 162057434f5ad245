// Browser: every demo role can use Kitwright on a phone (390 px) and a small tablet (768 px). Every
// link in the rendered navigation (so a new section is covered without editing this test) opens a
// page that answers 200 and never scrolls sideways; wide tables scroll inside their own box. The
// collapsed menu closes once a link is chosen. At 1280 px the full navigation fits on one line.
import type { Page } from "playwright-core";
import { describe, expect, it } from "vitest";
import { openBrowser, signInDemo } from "./helpers/browser";

const ROLES = [
  { role: "installer", email: "maren@tallowmere.example" },
  { role: "curator", email: "curator@kitwright.example" },
  { role: "admin", email: "admin@kitwright.example" },
  { role: "customer", email: "warden@vell-hut.example" },
];
const PHONE = { width: 390, height: 844 };
const TABLET = { width: 768, height: 1024 };

/** How far the page is wider than the screen, in CSS pixels (0 when it does not scroll sideways). */
async function sidewaysOverflow(page: Page) {
  await page.waitForLoadState("networkidle");
  return page.evaluate(() => document.documentElement.scrollWidth - document.documentElement.clientWidth);
}

function menu(page: Page) {
  return page.locator("header details");
}

async function menuLinks(page: Page) {
  await menu(page).locator("summary").click();
  const links = menu(page).getByRole("navigation", { name: "Main" }).getByRole("link");
  await links.first().waitFor();
  return links.evaluateAll((anchors) => anchors.map((a) => ({ label: a.textContent!.trim(), href: a.getAttribute("href")! })));
}

describe.each(ROLES)("the $role", ({ email }) => {
  it.each([PHONE, TABLET])("opens every navigation link at $width px without sideways scrolling", async (viewport) => {
    const browser = await openBrowser(viewport);
    const { page } = browser;
    await signInDemo(page, email);
    await page.goto("/");
    // Below the full-navigation width the header shows only the brand and the menu button.
    expect(await page.getByRole("button", { name: "Sign out" }).isVisible()).toBe(false);
    expect(await sidewaysOverflow(page)).toBe(0);
    const links = await menuLinks(page);
    expect(links.length).toBeGreaterThan(0);
    await menu(page).locator("summary").click();

    const problems: string[] = [];
    for (const { label, href } of links) {
      const status = (await page.request.get(href)).status();
      if (status !== 200) problems.push(`${href} answered ${status}`);
      // Choose the link from the menu, as a person would: the menu must close over the new page.
      await menu(page).locator("summary").click();
      await menu(page).getByRole("link", { name: label, exact: true }).click();
      await page.waitForURL((url) => url.pathname === href);
      await expect.poll(() => menu(page).evaluate((details: HTMLDetailsElement) => details.open), { message: `menu still open on ${href}` }).toBe(false);
      await page.getByRole("heading", { level: 1 }).first().waitFor();
      const overflow = await sidewaysOverflow(page);
      if (overflow > 0) problems.push(`${href} is ${overflow} px wider than the ${viewport.width} px screen`);
    }
    expect(problems).toEqual([]);
    await browser.close();
  });
});

async function firstLink(page: Page, list: string, pattern: RegExp) {
  await page.goto(list);
  const hrefs = await page.locator("main a").evaluateAll((anchors) => anchors.map((a) => a.getAttribute("href") ?? ""));
  const href = hrefs.find((h) => pattern.test(h));
  expect(href, `a link matching ${pattern} on ${list}`).toBeDefined();
  return href!;
}

it("shows an installer's plan, its alternatives, a site, a comparison and a quote at 390 px without sideways scrolling", async () => {
  const browser = await openBrowser(PHONE);
  const { page } = browser;
  await signInDemo(page, "maren@tallowmere.example");
  const plan = await firstLink(page, "/plans", /^\/plans\/(?!new$)[^/]+$/);
  const site = await firstLink(page, "/sites", /^\/sites\/(?!new$)[^/]+$/);
  const quote = await firstLink(page, "/quotes", /^\/quotes\/[^/]+$/);
  const pages = [plan, `${plan}/alternatives`, site, "/sourcing/compare/modules", "/sourcing/compare/batteries", quote];
  const problems: string[] = [];
  for (const path of pages) {
    const response = await page.goto(path);
    if (response?.status() !== 200) problems.push(`${path} answered ${response?.status()}`);
    const overflow = await sidewaysOverflow(page);
    if (overflow > 0) problems.push(`${path} is ${overflow} px wider than the screen`);
  }
  expect(problems).toEqual([]);
  await browser.close();
});

it("shows a customer's quote at 390 px without sideways scrolling", async () => {
  const browser = await openBrowser(PHONE);
  const { page } = browser;
  await signInDemo(page, "warden@vell-hut.example");
  const quote = await firstLink(page, "/my-quotes", /^\/my-quotes\/[^/]+$/);
  expect((await page.goto(quote))?.status()).toBe(200);
  expect(await sidewaysOverflow(page)).toBe(0);
  await browser.close();
});

it.each(ROLES)("fits the full navigation of the $role on one line at 1280 px", async ({ email }) => {
  const browser = await openBrowser({ width: 1280, height: 800 });
  const { page } = browser;
  await signInDemo(page, email);
  await page.goto("/");
  const nav = page.getByRole("banner").getByRole("navigation", { name: "Main" });
  // A label's text lies on one line box unless it wrapped.
  const lines = await nav.getByRole("link").evaluateAll((anchors) =>
    anchors.map((a) => {
      const range = document.createRange();
      range.selectNodeContents(a);
      return `${a.textContent}: ${range.getClientRects().length}`;
    }),
  );
  expect(lines.length).toBeGreaterThan(0);
  expect(lines.filter((line) => !line.endsWith(": 1"))).toEqual([]);
  const signOut = await page.getByRole("button", { name: "Sign out" }).boundingBox();
  expect(signOut!.x + signOut!.width).toBeLessThanOrEqual(1280);
  expect(await menu(page).isVisible()).toBe(false);
  expect(await sidewaysOverflow(page)).toBe(0);
  await browser.close();
});
