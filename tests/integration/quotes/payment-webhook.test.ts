// The deposit webhook: signed events only, each event id applied once, a paid deposit never undone by
// a late or repeated event, and the receipt and team notice sent once, on the move to paid.
import Stripe from "stripe";
import { describe, expect, it } from "vitest";
import { loader as webhookLoader } from "~/routes/api.v1.payments.webhook";
import { env } from "~/server/env.server";
import { listOutbox } from "~/server/outbox.server";
import { db } from "~/server/db.server";
import { approvedQuote, deliver, paymentFailed, sessionCompleted, sessionExpired } from "./quote-fixtures";
import { latestMailTo } from "../helpers/fixtures";

function payments(quoteId: string) {
  return db.selectFrom("quote_payment").selectAll().where("quote_id", "=", quoteId).execute();
}

async function quoteStatus(quoteId: string) {
  return (await db.selectFrom("quote").select("status").where("id", "=", quoteId).executeTakeFirstOrThrow()).status;
}

function events(quoteId: string, kind: string) {
  return db.selectFrom("quote_event").selectAll().where("quote_id", "=", quoteId).where("kind", "=", kind).execute();
}

function webhookRow(eventId: string) {
  return db.selectFrom("payment_webhook_event").selectAll().where("event_id", "=", eventId).executeTakeFirst();
}

async function mailsTo(email: string, subjectPart: string) {
  return (await listOutbox(email)).filter((m) => m.subject.includes(subjectPart));
}

const intentId = () => `pi_test_${Math.random().toString(36).slice(2)}`;

describe("deposit webhook", () => {
  it("records a completed payment: payment paid, quote deposit paid, receipt and team notice sent", async () => {
    const q = await approvedQuote("wh-paid");
    const pi = intentId();
    const event = sessionCompleted(q.sessionId, q.quoteId, pi);
    const result = await deliver(event);
    expect(result.status, JSON.stringify(result.data)).toBe(200);
    expect(result.data).toEqual({ received: true, outcome: "paid" });

    const [payment, ...others] = await payments(q.quoteId);
    expect(others).toEqual([]);
    expect(payment).toMatchObject({ status: "paid", payment_intent_id: pi, failure_message: null });
    expect(payment!.paid_at).toBeInstanceOf(Date);
    expect(await quoteStatus(q.quoteId)).toBe("deposit_paid");
    const [paidEvent] = await events(q.quoteId, "deposit_paid");
    expect(paidEvent).toMatchObject({ actor_name: "Payments", actor_user_id: null, revision: 1 });
    expect(paidEvent!.detail).toContain("EUR 1,481.40");
    expect(await webhookRow(event.id)).toMatchObject({ type: "checkout.session.completed", object_id: q.sessionId, outcome: "paid" });

    const receipt = await latestMailTo(q.customer.email);
    expect(receipt.subject).toBe("Deposit received for quote Q-0001");
    const today = new Intl.DateTimeFormat("en-GB", { dateStyle: "long", timeZone: "UTC" }).format(new Date());
    expect(receipt.text).toContain(`${q.owner.teamName} has received your deposit`);
    expect(receipt.text).toContain("deposit of EUR 1,481.40 for quote Q-0001");
    expect(receipt.text).toContain("Quote total EUR 4,938.00; deposit paid EUR 1,481.40; balance remaining EUR 3,456.60.");
    expect(receipt.text).toContain(today);
    expect(receipt.text).toContain(`/my-quotes/${q.quoteId}`);
    for (const member of [q.owner, q.author]) {
      const [notice, ...more] = await mailsTo(member.email, "Deposit paid on Q-0001");
      expect(more).toEqual([]);
      expect(notice!.text).toContain("Mira Tallow paid the deposit of EUR 1,481.40 on quote Q-0001");
      expect(notice!.text).toContain(`/quotes/${q.quoteId}`);
    }
    expect(await mailsTo(q.bystander.email, "Deposit")).toEqual([]);
  });

  it("applies the same event once when it arrives ten times at once", async () => {
    const q = await approvedQuote("wh-repeat");
    const event = sessionCompleted(q.sessionId, q.quoteId, intentId());
    const results = await Promise.all(Array.from({ length: 10 }, () => deliver(event)));
    expect(results.map((r) => r.status)).toEqual(Array(10).fill(200));
    expect(results.filter((r) => r.data.duplicate === true)).toHaveLength(9);
    expect(results.every((r) => r.data.outcome === "paid")).toBe(true);

    const rows = await payments(q.quoteId);
    expect(rows.map((p) => p.status)).toEqual(["paid"]);
    expect(await events(q.quoteId, "deposit_paid")).toHaveLength(1);
    expect(await mailsTo(q.customer.email, "Deposit received")).toHaveLength(1);
    expect(await mailsTo(q.owner.email, "Deposit paid")).toHaveLength(1);
    expect(await db.selectFrom("payment_webhook_event").select("event_id").where("object_id", "=", q.sessionId).execute()).toHaveLength(1);
  });

  it("refuses a forged, tampered or unsigned event with 400 and records nothing", async () => {
    const q = await approvedQuote("wh-forged");
    const forged = sessionCompleted(q.sessionId, q.quoteId, intentId());
    const wrongSecret = await deliver(forged, { secret: "whsec_someone_else" });
    expect(wrongSecret.status).toBe(400);
    expect(wrongSecret.data.error.message).toMatch(/signature/i);

    // A real signature over a different body: the amount was changed after signing.
    const genuine = sessionCompleted(q.sessionId, q.quoteId, intentId());
    const body = JSON.stringify(genuine, null, 2);
    const signature = Stripe.webhooks.generateTestHeaderString({ payload: body, secret: env.STRIPE_WEBHOOK_SECRET });
    const tamperedBody = body.replace('"amount_total": 148140', '"amount_total": 1');
    expect(tamperedBody).not.toBe(body);
    const tampered = await deliver(tamperedBody, { signature });
    expect(tampered.status).toBe(400);
    const unsigned = await deliver(genuine, { signature: null });
    expect(unsigned.status).toBe(400);
    expect(unsigned.data.error.message).toMatch(/Stripe-Signature header is missing/);

    for (const id of [forged.id, genuine.id]) expect(await webhookRow(id)).toBeUndefined();
    expect((await payments(q.quoteId)).map((p) => p.status)).toEqual(["open"]);
    expect(await quoteStatus(q.quoteId)).toBe("approved");
    expect(await events(q.quoteId, "deposit_paid")).toEqual([]);
  });

  it("refuses a correctly signed event whose timestamp is older than the 300 s tolerance", async () => {
    const q = await approvedQuote("wh-stale");
    const event = sessionCompleted(q.sessionId, q.quoteId, intentId());
    const stale = await deliver(event, { timestamp: Math.floor(Date.now() / 1000) - 301 });
    expect(stale.status).toBe(400);
    expect(stale.data.error.message).toMatch(/tolerance/i);
    expect(await webhookRow(event.id)).toBeUndefined();
    expect(await quoteStatus(q.quoteId)).toBe("approved");
    // The same event freshly signed is accepted: only the age was wrong.
    expect((await deliver(event)).data.outcome).toBe("paid");
  });

  it("keeps a payment paid when its failure arrives after its success", async () => {
    const q = await approvedQuote("wh-late-fail");
    const pi = intentId();
    expect((await deliver(sessionCompleted(q.sessionId, q.quoteId, pi))).data.outcome).toBe("paid");
    const late = paymentFailed(pi, q.quoteId);
    const result = await deliver(late);
    expect(result.status).toBe(200);
    expect(result.data.outcome).toBe("failure after payment ignored");

    expect(await payments(q.quoteId)).toMatchObject([{ status: "paid", failure_message: null, payment_intent_id: pi }]);
    expect(await quoteStatus(q.quoteId)).toBe("deposit_paid");
    expect(await events(q.quoteId, "payment_failed")).toEqual([]);
  });

  it("records a declined card, then the payment that follows on the same session", async () => {
    const q = await approvedQuote("wh-fail-then-pay");
    const pi = intentId();
    expect((await deliver(paymentFailed(pi, q.quoteId, "Your card was declined."))).data.outcome).toBe("failed");
    expect(await payments(q.quoteId)).toMatchObject([{ status: "failed", failure_message: "Your card was declined.", payment_intent_id: pi }]);
    expect(await events(q.quoteId, "payment_failed")).toMatchObject([{ actor_name: "Payments", detail: "Your card was declined." }]);
    expect(await quoteStatus(q.quoteId)).toBe("approved");

    expect((await deliver(sessionCompleted(q.sessionId, q.quoteId, pi))).data.outcome).toBe("paid");
    expect(await payments(q.quoteId)).toMatchObject([{ status: "paid", failure_message: null }]);
    expect(await quoteStatus(q.quoteId)).toBe("deposit_paid");
    expect(await mailsTo(q.customer.email, "Deposit received")).toHaveLength(1);
  });

  it("ends paid when a completion and a failure for one session are delivered at the same moment", async () => {
    const q = await approvedQuote("wh-race");
    const pi = intentId();
    const results = await Promise.all([deliver(paymentFailed(pi, q.quoteId)), deliver(sessionCompleted(q.sessionId, q.quoteId, pi))]);
    expect(results.map((r) => r.status)).toEqual([200, 200]);
    expect(await payments(q.quoteId)).toMatchObject([{ status: "paid", failure_message: null }]);
    expect(await quoteStatus(q.quoteId)).toBe("deposit_paid");
    expect(await events(q.quoteId, "deposit_paid")).toHaveLength(1);
  });

  it("marks an expired session expired, but never a paid one", async () => {
    const q = await approvedQuote("wh-expired");
    const expired = await deliver(sessionExpired(q.sessionId, q.quoteId));
    expect(expired.data.outcome).toBe("expired");
    expect((await payments(q.quoteId)).map((p) => p.status)).toEqual(["expired"]);

    const p = await approvedQuote("wh-expired-late");
    await deliver(sessionCompleted(p.sessionId, p.quoteId, intentId()));
    expect((await deliver(sessionExpired(p.sessionId, p.quoteId))).data.outcome).toBe("expiry after payment ignored");
    expect((await payments(p.quoteId)).map((row) => row.status)).toEqual(["paid"]);
  });

  it("answers 200 for a session it does not know, recording the event but no payment", async () => {
    const q = await approvedQuote("wh-unknown", { withPayment: false });
    const unknownSession = "cs_test_nobody_made_this_one";
    const event = sessionCompleted(unknownSession, q.quoteId, intentId());
    const result = await deliver(event);
    expect(result.status).toBe(200);
    expect(result.data.outcome).toBe("unknown session");
    expect(await webhookRow(event.id)).toMatchObject({ outcome: "unknown session", object_id: unknownSession });
    expect(await db.selectFrom("quote_payment").select("id").where("checkout_session_id", "=", unknownSession).execute()).toEqual([]);
    expect(await payments(q.quoteId)).toEqual([]);
    expect(await quoteStatus(q.quoteId)).toBe("approved");
  });

  it("ignores event types it has no use for, and refuses GET", async () => {
    const ignored = await deliver({ id: "evt_test_ignored_" + Date.now(), object: "event", type: "customer.created", data: { object: { id: "cus_1" } } });
    expect(ignored).toMatchObject({ status: 200, data: { outcome: "ignored" } });
    const get = webhookLoader();
    expect(get.status).toBe(405);
    expect(get.headers.get("Allow")).toBe("POST");
  });
});
