import Stripe from "stripe";
import { afterEach, describe, expect, it } from "vitest";
import { startPaymentsFake, type PaymentsFake } from "../../../fakes/payments-server.ts";
import { createDepositSession, stripeFor, WEBHOOK_SECRET } from "./payments-helpers.ts";
import { startWebhookReceiver } from "./webhook-receiver.ts";

type Receiver = Awaited<ReturnType<typeof startWebhookReceiver>>;
let fake: PaymentsFake | undefined;
let receiver: Receiver | undefined;

async function setup(statuses: number[] = []) {
  receiver = await startWebhookReceiver(statuses);
  fake = await startPaymentsFake({
    port: 0,
    webhookUrl: receiver.url,
    webhookSecret: WEBHOOK_SECRET,
    retryDelaysMs: [50, 50, 50],
    log: () => {},
  });
  return { fake, receiver, stripe: stripeFor(fake.port) };
}

afterEach(async () => {
  await fake?.close();
  await receiver?.close();
});

function pay(baseUrl: string, sessionId: string, card: string) {
  return fetch(`${baseUrl}/_fake/sessions/${sessionId}/pay`, {
    method: "POST",
    headers: { "Content-Type": "application/json" },
    body: JSON.stringify({ card }),
  });
}

describe("payments fake: paying and webhooks", () => {
  it("pays with 4242… and delivers a signed checkout.session.completed", async () => {
    const { fake, receiver, stripe } = await setup();
    const session = await createDepositSession(stripe);

    const response = await pay(fake.url, session.id, "4242 4242 4242 4242");
    expect(response.status).toBe(200);
    expect(await response.json()).toMatchObject({ outcome: "succeeded", delivery: { statusCode: 200 } });

    const [delivery] = await receiver.waitFor(1);
    const event = stripe.webhooks.constructEvent(delivery!.rawBody, delivery!.signature, WEBHOOK_SECRET);
    expect(event.type).toBe("checkout.session.completed");
    expect(event.id).toMatch(/^evt_/);
    expect(event.data.object).toMatchObject({
      id: session.id,
      status: "complete",
      payment_status: "paid",
      metadata: { quoteId: "104", teamId: "t1" },
      client_reference_id: "quote_104",
    });
    // The signature covers the body: a changed amount must not verify.
    const tampered = delivery!.rawBody.replace('"amount_total": 13345', '"amount_total": 1');
    expect(() => stripe.webhooks.constructEvent(tampered, delivery!.signature, WEBHOOK_SECRET)).toThrow(Stripe.errors.StripeSignatureVerificationError);

    const paid = await stripe.checkout.sessions.retrieve(session.id);
    expect(paid).toMatchObject({ status: "complete", payment_status: "paid" });
    expect(paid.payment_intent).toMatch(/^pi_test_/);
    expect((await stripe.events.retrieve(event.id)).type).toBe("checkout.session.completed");
  });

  it("declines 4000…0002: session stays open and unpaid, a failure event is delivered", async () => {
    const { fake, receiver, stripe } = await setup();
    const session = await createDepositSession(stripe);

    const response = await pay(fake.url, session.id, "4000000000000002");
    expect(await response.json()).toMatchObject({ outcome: "declined", message: "Your card was declined." });

    const [delivery] = await receiver.waitFor(1);
    const event = stripe.webhooks.constructEvent(delivery!.rawBody, delivery!.signature, WEBHOOK_SECRET);
    expect(event.type).toBe("payment_intent.payment_failed");
    expect(event.data.object).toMatchObject({ last_payment_error: { code: "card_declined" } });
    expect(await stripe.checkout.sessions.retrieve(session.id)).toMatchObject({
      status: "open",
      payment_status: "unpaid",
    });

    // The customer can then pay with a good card on the same session.
    await pay(fake.url, session.id, "4242424242424242");
    await receiver.waitFor(2);
    expect((await stripe.checkout.sessions.retrieve(session.id)).payment_status).toBe("paid");
  });

  it("refuses other cards without changing anything", async () => {
    const { fake, receiver, stripe } = await setup();
    const session = await createDepositSession(stripe);

    const response = await pay(fake.url, session.id, "5555 5555 5555 4444");
    expect(response.status).toBe(400);
    expect(((await response.json()) as { error: { message: string } }).error.message).toContain("Use a test card");
    expect((await stripe.checkout.sessions.retrieve(session.id)).status).toBe("open");
    expect(receiver.received).toHaveLength(0);
  });

  it("retries a delivery the app answered with 500, and records every attempt", async () => {
    const { fake, receiver, stripe } = await setup([500, 200]);
    const session = await createDepositSession(stripe);

    await pay(fake.url, session.id, "4242424242424242");
    const [first, second] = await receiver.waitFor(2);
    expect(JSON.parse(second!.rawBody).id).toBe(JSON.parse(first!.rawBody).id);

    const deliveries = (await (await fetch(`${fake.url}/_fake/deliveries`)).json()) as {
      data: { attempt: number; statusCode: number }[];
    };
    expect(deliveries.data.map((d) => [d.attempt, d.statusCode])).toEqual([
      [2, 200],
      [1, 500],
    ]);
  });

  it("records an unreachable app and gives up after the configured retries", async () => {
    const { fake, receiver, stripe } = await setup();
    await receiver.close();
    const session = await createDepositSession(stripe);

    await pay(fake.url, session.id, "4242424242424242");
    // 1 attempt + 3 retries 50 ms apart; poll rather than guess how long that takes here.
    await expect.poll(() => fake.state.deliveries.length, { timeout: 5000, interval: 50 }).toBe(4);
    await new Promise((resolve) => setTimeout(resolve, 200));
    const deliveries = (await (await fetch(`${fake.url}/_fake/deliveries`)).json()) as {
      data: { statusCode: number | null; error: string | null }[];
    };
    expect(deliveries.data).toHaveLength(4);
    expect(deliveries.data.every((d) => d.statusCode === null && d.error)).toBe(true);
  });
});
