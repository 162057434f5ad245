import Stripe from "stripe";
import { afterAll, beforeAll, describe, expect, it } from "vitest";
import { startPaymentsFake, type PaymentsFake } from "../../../fakes/payments-server.ts";
import { createDepositSession, stripeFor } from "./payments-helpers.ts";

let fake: PaymentsFake;
let stripe: Stripe;

beforeAll(async () => {
  fake = await startPaymentsFake({ port: 0, log: () => {} });
  stripe = stripeFor(fake.port);
});
afterAll(async () => {
  await fake?.close();
});

describe("payments fake: Stripe API through the official SDK", () => {
  it("creates a checkout session and returns it again by id", async () => {
    const created = await createDepositSession(stripe);

    expect(created.id).toMatch(/^cs_test_/);
    expect(created).toMatchObject({
      object: "checkout.session",
      status: "open",
      payment_status: "unpaid",
      amount_total: 12345 + 2 * 500,
      currency: "eur",
      client_reference_id: "quote_104",
      customer_email: "ana@example.test",
      metadata: { quoteId: "104", teamId: "t1" },
    });
    expect(created.url).toBe(`${fake.url}/pay/${created.id}`);
    expect(created.expires_at).toBeGreaterThan(created.created);

    const fetched = await stripe.checkout.sessions.retrieve(created.id);
    expect(fetched).toMatchObject({ id: created.id, amount_total: 13345, status: "open" });

    const items = await stripe.checkout.sessions.listLineItems(created.id);
    expect(items.data.map((item) => [item.description, item.quantity, item.amount_total])).toEqual([
      ["Deposit for quote Q-104", 1, 12345],
      ["Site survey", 2, 1000],
    ]);
  });

  it("rejects a session without line_items with the SDK's invalid-request error", async () => {
    const attempt = stripe.checkout.sessions.create({
      mode: "payment",
      success_url: "http://127.0.0.1:3000/ok",
    });
    await expect(attempt).rejects.toBeInstanceOf(Stripe.errors.StripeInvalidRequestError);
    await expect(attempt).rejects.toMatchObject({ statusCode: 400, param: "line_items" });
  });

  it("rejects a line item without a product name", async () => {
    const attempt = createDepositSession(stripe, {
      line_items: [{ price_data: { currency: "eur", unit_amount: 100, product_data: { name: "" } }, quantity: 1 }],
    });
    await expect(attempt).rejects.toMatchObject({
      statusCode: 400,
      param: "line_items[0][price_data][product_data][name]",
    });
  });

  it("answers a live or missing key with an authentication error", async () => {
    const live = stripeFor(fake.port, "sk_live_not_for_a_fake");
    await expect(createDepositSession(live)).rejects.toBeInstanceOf(Stripe.errors.StripeAuthenticationError);

    const bare = await fetch(`${fake.url}/v1/checkout/sessions`, { method: "POST" });
    expect(bare.status).toBe(401);
    expect(await bare.json()).toMatchObject({ error: { type: "invalid_request_error" } });
  });

  it("answers an unknown session or route with a Stripe-style 404", async () => {
    const missing = stripe.checkout.sessions.retrieve("cs_test_does_not_exist");
    await expect(missing).rejects.toBeInstanceOf(Stripe.errors.StripeInvalidRequestError);
    await expect(missing).rejects.toMatchObject({ statusCode: 404, code: "resource_missing" });

    expect((await fetch(`${fake.url}/healthz`)).status).toBe(200);
    const route = await fetch(`${fake.url}/v1/nothing-here`, { headers: { Authorization: "Bearer sk_test_x" } });
    expect(route.status).toBe(404);
    expect(await route.json()).toMatchObject({ error: { type: "invalid_request_error" } });
  });

  it("expires an open session, after which it can no longer be expired", async () => {
    const session = await createDepositSession(stripe);
    const expired = await stripe.checkout.sessions.expire(session.id);
    expect(expired).toMatchObject({ status: "expired", url: null });
    await expect(stripe.checkout.sessions.expire(session.id)).rejects.toMatchObject({ statusCode: 400 });

    const events = await stripe.events.list({ type: "checkout.session.expired" });
    expect(events.data[0]?.data.object).toMatchObject({ id: session.id });
  });

  it("survives malformed bodies with a 400 instead of crashing", async () => {
    const response = await fetch(`${fake.url}/v1/checkout/sessions`, {
      method: "POST",
      headers: { Authorization: "Bearer sk_test_x", "Content-Type": "application/x-www-form-urlencoded" },
      body: "line_items=1&line_items[0][quantity]=2&__proto__[x]=1",
    });
    expect(response.status).toBe(400);
    const json = await fetch(`${fake.url}/_fake/sessions/cs_test_x/pay`, {
      method: "POST",
      headers: { "Content-Type": "application/json" },
      body: "{not json",
    });
    expect(json.status).toBe(400);
    // Still serving afterwards.
    expect((await createDepositSession(stripe)).status).toBe("open");
  });
});
