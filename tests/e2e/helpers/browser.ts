// Debian's Chromium driven by playwright-core (no browser download). Each test gets a fresh profile.
import { mkdtempSync, mkdirSync, rmSync } from "node:fs";
import { tmpdir } from "node:os";
import { join } from "node:path";
import { chromium, type BrowserContext, type Page } from "playwright-core";

export const BASE_URL = process.env.E2E_BASE_URL ?? "http://127.0.0.1:3310";
export const MAIL_URL = process.env.E2E_MAIL_URL ?? "http://127.0.0.1:2680";

const FLAGS = [
  "--headless",
  "--no-sandbox",
  "--disable-gpu",
  "--disable-quic",
  "--no-first-run",
  "--disable-background-networking",
  "--disable-component-update",
  "--disable-sync",
];

export async function openBrowser(viewport = { width: 1280, height: 900 }): Promise<{ context: BrowserContext; page: Page; close(): Promise<void> }> {
  const profile = mkdtempSync(join(tmpdir(), "kitwright-e2e-"));
  const context = await chromium.launchPersistentContext(profile, {
    executablePath: process.env.CHROMIUM_PATH ?? "/usr/bin/chromium",
    args: FLAGS,
    viewport,
    baseURL: BASE_URL,
  });
  const page = context.pages()[0] ?? (await context.newPage());
  const errors: string[] = [];
  page.on("pageerror", (error) => errors.push(error.message));
  return {
    context,
    page,
    async close() {
      await context.close();
      rmSync(profile, { recursive: true, force: true });
      if (errors.length) throw new Error(`The page raised errors: ${errors.join(" | ")}`);
    },
  };
}

/** Saves a screenshot under test-results/ (for a person to look at; tests never compare pixels). */
export async function snap(page: Page, name: string) {
  mkdirSync("test-results", { recursive: true });
  await page.screenshot({ path: join("test-results", `${name}.png`), fullPage: true });
}

export async function mailTo(email: string, subjectPart: string) {
  for (let attempt = 0; attempt < 50; attempt++) {
    const res = await fetch(`${MAIL_URL}/messages?to=${encodeURIComponent(email)}`);
    const body = (await res.json()) as { messages: { subject: string; text: string; html: string }[] };
    const found = body.messages.find((m) => m.subject.includes(subjectPart));
    if (found) return found;
    await new Promise((r) => setTimeout(r, 100));
  }
  throw new Error(`No mail "${subjectPart}" to ${email}`);
}

/** Signs in one of the seeded demo accounts (data/demo/people.ts). */
export async function signInDemo(page: Page, email: string) {
  await page.goto("/sign-in");
  await page.getByLabel("E-mail").fill(email);
  await page.getByLabel("Password").fill("vell-valley-demo");
  await page.getByRole("button", { name: "Sign in" }).click();
  await page.waitForURL((url) => !url.pathname.startsWith("/sign-in"));
}
