import { afterAll, beforeAll, describe, expect, it } from "vitest";
import { startPaymentsFake, type PaymentsFake } from "../../../fakes/payments-server.ts";
import { createDepositSession, stripeFor, WEBHOOK_SECRET } from "./payments-helpers.ts";
import { startWebhookReceiver } from "./webhook-receiver.ts";

let fake: PaymentsFake;
let receiver: Awaited<ReturnType<typeof startWebhookReceiver>>;

beforeAll(async () => {
  receiver = await startWebhookReceiver();
  fake = await startPaymentsFake({ port: 0, webhookUrl: receiver.url, webhookSecret: WEBHOOK_SECRET, log: () => {} });
});
afterAll(async () => {
  await fake?.close();
  await receiver?.close();
});

function submit(url: string, fields: Record<string, string>) {
  return fetch(url, {
    method: "POST",
    body: new URLSearchParams({ expiry: "12/34", cvc: "123", name: "Ana Installer", ...fields }),
    redirect: "manual",
  });
}

describe("payments fake: hosted test payment page", () => {
  it("shows the amount, the items and that it is a test page", async () => {
    const session = await createDepositSession(stripeFor(fake.port));
    const response = await fetch(session.url!);
    const html = await response.text();

    expect(response.status).toBe(200);
    expect(html).toContain("Test payment page — local fake, no real money");
    expect(html).toContain("€133.45");
    expect(html).toContain("Deposit for quote Q-104");
    expect(html).toContain('name="card"');
  });

  it("escapes product names", async () => {
    const session = await createDepositSession(stripeFor(fake.port), {
      line_items: [{ price_data: { currency: "eur", unit_amount: 100, product_data: { name: "<script>x</script>" } }, quantity: 1 }],
    });
    const html = await (await fetch(session.url!)).text();
    expect(html).not.toContain("<script>x");
    expect(html).toContain("&lt;script&gt;x");
  });

  it("redirects to success_url with the session id after paying with 4242…", async () => {
    const session = await createDepositSession(stripeFor(fake.port));
    const response = await submit(session.url!, { card: "4242 4242 4242 4242" });

    expect(response.status).toBe(303);
    expect(response.headers.get("location")).toBe(`http://127.0.0.1:3000/quotes/104/paid?session=${session.id}`);
    const after = await (await fetch(`${fake.url}/pay/${session.id}`)).text();
    expect(after).toContain("This payment is complete.");
    expect(after).not.toContain('name="card"');
  });

  it("shows the decline and keeps the form for another try", async () => {
    const session = await createDepositSession(stripeFor(fake.port));
    const response = await submit(session.url!, { card: "4000 0000 0000 0002" });
    const html = await response.text();

    expect(response.status).toBe(402);
    expect(html).toContain("Your card was declined.");
    expect(html).toContain('name="card"');
  });

  it("asks for a test card or a complete form", async () => {
    const session = await createDepositSession(stripeFor(fake.port));
    expect(await (await submit(session.url!, { card: "4111 1111 1111 1111" })).text()).toContain("Use a test card");
    expect(await (await submit(session.url!, { card: "4242424242424242", expiry: "01/20" })).text()).toContain("expiry date");
  });

  it("answers an unknown session with a 404 page", async () => {
    expect((await fetch(`${fake.url}/pay/cs_test_unknown`)).status).toBe(404);
  });
});
