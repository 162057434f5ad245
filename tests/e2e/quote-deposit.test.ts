// Browser: the demo owner quotes the ranger station's plan and sends it to a new customer; the customer
// opens the e-mailed link, chooses a password, approves, is declined on the first card and pays with the
// second; both the customer and the installer then see the deposit paid.
import { expect, it } from "vitest";
import { openBrowser, mailTo, signInDemo, snap } from "./helpers/browser";

const customerEmail = `ranger-${Date.now().toString(36)}@fenmoor.example`;

it("sends a quote, and the customer approves it and pays the deposit by card", async () => {
  const installer = await openBrowser();
  const customer = await openBrowser({ width: 390, height: 844 });
  try {
    const { page } = installer;
    await signInDemo(page, "maren@tallowmere.example");
    await page.goto("/plans");
    await page.getByRole("link", { name: "Station kit, 24 V AGM" }).first().click();
    await page.getByRole("button", { name: "Quote this plan" }).click();
    await page.waitForURL(/\/quotes\/[0-9a-f-]+$/);
    const quoteUrl = new URL(page.url()).pathname;
    await page.getByText("Quote drafted from the plan").waitFor();

    // Each kit part names the offer its cost comes from; another offer brings its own landed cost.
    const picker = page.getByLabel("Line 1 offer");
    const options = picker.locator("option");
    expect(await options.count()).toBeGreaterThan(0);
    if ((await options.count()) > 1) {
      const second = (await options.nth(1).textContent()) ?? "";
      await picker.selectOption({ index: 1 });
      const cost = /([\d.]+) a unit landed/.exec(second)![1];
      expect(await page.getByLabel("Line 1 unit cost").inputValue()).toBe(cost);
    }

    await page.getByLabel("Customer's name").fill("Petra Fenwick");
    await page.getByLabel("Customer's e-mail").fill(customerEmail);
    // Labour, mounting and freight start without a cost: sending is refused until they have one.
    const lines = page.getByTestId("quote-line");
    const count = await lines.count();
    for (let i = 0; i < count; i++) {
      const cost = page.getByLabel(`Line ${i + 1} unit cost`);
      if ((await cost.inputValue()) === "0") await cost.fill("120");
    }
    await snap(page, "quote-editor");
    await page.getByRole("button", { name: "Save draft" }).click();
    await page.getByText("Draft saved.").waitFor();
    await page.getByRole("button", { name: "Send to customer" }).click();
    await page.getByText("Revision 1 sent to the customer.").waitFor();

    const mail = await mailTo(customerEmail, "sent you quote");
    const link = /https?:\/\/[^\s]+\/quote-access\/[A-Za-z0-9_-]+/.exec(mail.text)![0];

    const c = customer.page;
    await c.goto(new URL(link).pathname);
    await c.getByLabel("Password (at least 10 characters)").fill("ranger-station-1");
    await c.getByLabel("The same password again").fill("ranger-station-1");
    await c.getByRole("button", { name: "Save password and open the quote" }).click();
    await c.waitForURL(/\/my-quotes\/[0-9a-f-]+$/);
    const customerUrl = new URL(c.url()).pathname;
    await c.getByTestId("quote-document").waitFor();
    expect(await c.getByTestId("quote-document").textContent()).toMatch(/licensed person/);
    await snap(c, "quote-customer-view");

    await c.getByLabel("Type your full name").fill("Petra Fenwick");
    await c.getByRole("checkbox").check();
    await c.getByRole("button", { name: "Approve quote" }).click();
    await c.getByText("Thank you: the quote is approved.").waitFor();

    // The declined test card: the payment page says so; back on the quote it is still unpaid.
    await c.getByRole("button", { name: /Pay deposit of/ }).click();
    await c.waitForURL(/\/pay\//);
    await c.getByLabel("Card number").fill("4000 0000 0000 0002");
    await c.getByLabel("Expiry (MM/YY)").fill("12/34");
    await c.getByLabel("CVC").fill("123");
    await c.getByLabel("Name on card").fill("Petra Fenwick");
    await c.getByRole("button", { name: /^Pay / }).click();
    await c.getByText("Your card was declined.").waitFor();
    await c.getByRole("link", { name: "Cancel and go back" }).click();
    await c.waitForURL((url) => url.pathname === customerUrl);
    await c.getByText("Your last card payment did not go through").waitFor();
    expect(await c.getByTestId("quote-status").first().textContent()).toContain("Approved");
    await snap(c, "quote-declined-card");

    await c.getByRole("button", { name: /Pay deposit of/ }).click();
    await c.waitForURL(/\/pay\//);
    await c.getByLabel("Card number").fill("4242 4242 4242 4242");
    await c.getByLabel("Expiry (MM/YY)").fill("12/34");
    await c.getByLabel("CVC").fill("123");
    await c.getByLabel("Name on card").fill("Petra Fenwick");
    await c.getByRole("button", { name: /^Pay / }).click();
    await c.waitForURL((url) => url.pathname === customerUrl);
    await c.getByText(/Deposit of .* paid/).waitFor({ timeout: 20000 });
    expect(await c.getByTestId("quote-status").first().textContent()).toContain("Deposit paid");
    await snap(c, "quote-paid-customer");
    const receipt = await mailTo(customerEmail, "Deposit received");
    expect(receipt.text).toMatch(/Q-\d{4}/);

    await page.goto(quoteUrl);
    expect(await page.getByTestId("quote-status").first().textContent()).toContain("Deposit paid");
    expect(await page.getByTestId("quote-timeline").textContent()).toMatch(/Deposit payment failed[\s\S]*Deposit paid/);
    await snap(page, "quote-paid-installer");
  } finally {
    await customer.close();
    await installer.close();
  }
});
