// Starting a deposit payment against the payments fake (started by the global setup; STRIPE_API_URL
// points the app's SDK client at it): one open Checkout Session per revision, reused until paid, and
// the payment recorded when the fake's own signed event reaches the webhook action.
import { createServer } from "node:net";
import { describe, expect, it } from "vitest";
import { db } from "~/server/db.server";
import { env } from "~/server/env.server";
import { createStripeClient, stripe } from "~/server/payments/stripe.server";
import { startDepositCheckout } from "~/server/quotes/deposit-checkout.server";
import { BASE } from "../helpers/route-client";
import { approvedQuote, deliver } from "./quote-fixtures";

async function payOnFake(sessionId: string, card: string) {
  const response = await fetch(`${env.STRIPE_API_URL}/_fake/sessions/${sessionId}/pay`, {
    method: "POST",
    headers: { "Content-Type": "application/json" },
    body: JSON.stringify({ card }),
  });
  expect(response.status).toBe(200);
  const result = (await response.json()) as { outcome: string; event: { id: string } };
  // The event as Stripe keeps it, read back through the SDK, then delivered like the fake would.
  return { outcome: result.outcome, event: await stripe.events.retrieve(result.event.id) };
}

function payments(quoteId: string) {
  return db.selectFrom("quote_payment").selectAll().where("quote_id", "=", quoteId).orderBy("created_at").execute();
}

async function closedPort() {
  const server = createServer();
  await new Promise<void>((resolve) => server.listen(0, "127.0.0.1", resolve));
  const { port } = server.address() as { port: number };
  await new Promise((resolve) => server.close(resolve));
  return port;
}

describe("starting a deposit payment", () => {
  it("creates one Checkout Session, reuses it, survives a declined card and records the payment", async () => {
    const q = await approvedQuote("co-flow", { withPayment: false });
    const input = { quoteId: q.quoteId, customerUserId: q.customer.userId, origin: BASE };
    const first = await startDepositCheckout(input);
    if (!first.ok) throw new Error(first.message);
    expect(first.url).toBe(`${env.STRIPE_API_URL}/pay/${first.checkoutSessionId}`);
    expect(first.reused).toBe(false);

    const session = await stripe.checkout.sessions.retrieve(first.checkoutSessionId);
    expect(session).toMatchObject({
      mode: "payment",
      amount_total: 148140, // EUR 1,481.40 in cents
      currency: "eur",
      customer_email: q.customer.email,
      client_reference_id: q.quoteId,
      metadata: { quoteId: q.quoteId, revision: "1" },
      success_url: `${BASE}/my-quotes/${q.quoteId}?payment=done&session={CHECKOUT_SESSION_ID}`,
      cancel_url: `${BASE}/my-quotes/${q.quoteId}?payment=cancelled`,
    });
    expect(await payments(q.quoteId)).toMatchObject([{ status: "open", amount: "1481.40", currency: "EUR", checkout_session_id: first.checkoutSessionId }]);
    const started = await db.selectFrom("quote_event").selectAll().where("quote_id", "=", q.quoteId).where("kind", "=", "payment_started").execute();
    expect(started).toMatchObject([{ actor_user_id: q.customer.userId, revision: 1 }]);

    const again = await startDepositCheckout(input);
    expect(again).toEqual({ ok: true, url: first.url, checkoutSessionId: first.checkoutSessionId, reused: true });

    // A declined card leaves the session open: the next click offers the same session again.
    const declined = await payOnFake(first.checkoutSessionId, "4000 0000 0000 0002");
    expect(declined.event.type).toBe("payment_intent.payment_failed");
    expect((await deliver(declined.event)).data.outcome).toBe("failed");
    expect(await startDepositCheckout(input)).toMatchObject({ ok: true, checkoutSessionId: first.checkoutSessionId, reused: true });

    const paid = await payOnFake(first.checkoutSessionId, "4242 4242 4242 4242");
    expect(paid.outcome).toBe("succeeded");
    expect(paid.event.type).toBe("checkout.session.completed");
    expect((await deliver(paid.event)).data.outcome).toBe("paid");
    const [payment, ...others] = await payments(q.quoteId);
    expect(others).toEqual([]);
    const intent = await stripe.paymentIntents.retrieve(payment!.payment_intent_id!);
    expect(intent.metadata).toEqual({ quoteId: q.quoteId, revision: "1" });
    expect(payment).toMatchObject({ status: "paid", failure_message: null });
    expect((await db.selectFrom("quote").select("status").where("id", "=", q.quoteId).executeTakeFirstOrThrow()).status).toBe("deposit_paid");

    expect(await startDepositCheckout(input)).toMatchObject({ ok: false, error: "already_paid" });
  });

  it("makes a new session when the last one expired", async () => {
    const q = await approvedQuote("co-expired", { withPayment: false });
    const input = { quoteId: q.quoteId, customerUserId: q.customer.userId, origin: BASE };
    const first = await startDepositCheckout(input);
    if (!first.ok) throw new Error(first.message);
    await stripe.checkout.sessions.expire(first.checkoutSessionId);
    const second = await startDepositCheckout(input);
    if (!second.ok) throw new Error(second.message);
    expect(second.checkoutSessionId).not.toBe(first.checkoutSessionId);
    expect((await payments(q.quoteId)).map((p) => [p.checkout_session_id, p.status])).toEqual([
      [first.checkoutSessionId, "expired"],
      [second.checkoutSessionId, "open"],
    ]);
  });

  it("refuses another customer, a quote not approved, and says so when payments are unreachable", async () => {
    const q = await approvedQuote("co-refused", { withPayment: false });
    const input = { quoteId: q.quoteId, customerUserId: q.customer.userId, origin: BASE };
    expect(await startDepositCheckout({ ...input, customerUserId: q.owner.userId })).toMatchObject({ ok: false, error: "not_found" });
    expect(await startDepositCheckout({ ...input, quoteId: "not-a-uuid" })).toMatchObject({ ok: false, error: "not_found" });

    const offline = createStripeClient(`http://127.0.0.1:${await closedPort()}`, "sk_test_offline");
    const down = await startDepositCheckout(input, offline);
    expect(down).toMatchObject({ ok: false, error: "payments_unavailable" });
    if (!down.ok) expect(down.message).toMatch(/Nothing was charged/);
    expect(await payments(q.quoteId)).toEqual([]);

    await db.updateTable("quote").set({ status: "sent" }).where("id", "=", q.quoteId).execute();
    expect(await startDepositCheckout(input)).toMatchObject({ ok: false, error: "not_approved" });
    expect(await payments(q.quoteId)).toEqual([]);
  });
});
