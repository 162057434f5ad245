// What each Stripe event does to a deposit, inside the webhook's transaction. Events can arrive twice,
// late or out of order, so every step reads the locked rows and moves forward only: a paid deposit is
// never made unpaid, failed or expired by a later event.
import type Stripe from "stripe";
import { formatMoney, money } from "~/domain/money/money";
import { toMinorUnits } from "~/domain/money/minor-units";
import { isUuid } from "../modules.server";
import { logPayments } from "../payments/payments-log.server";
import { changeQuoteStatus, PAYMENTS_ACTOR, recordQuoteEvent, type Executor } from "./quote-events.server";
import { findPaymentBySession, hasPaidPayment, lockPayment, lockQuote, settleUnlessPaid } from "./quote-payments.server";

export interface AppliedEvent {
  /** Stored with the event id in payment_webhook_event, for whoever reads it later. */
  outcome: string;
  /** Set only when this event turned a payment into a paid one (receipts go out after commit). */
  paidPaymentId: string | null;
}

const done = (outcome: string, paidPaymentId: string | null = null): AppliedEvent => ({ outcome, paidPaymentId });

export async function applyPaymentEvent(trx: Executor, event: Stripe.Event): Promise<AppliedEvent> {
  switch (event.type) {
    case "checkout.session.completed":
    case "checkout.session.async_payment_succeeded":
      return sessionPaid(trx, event.data.object);
    case "checkout.session.expired":
      return sessionExpired(trx, event.data.object);
    case "payment_intent.payment_failed":
      return intentFailed(trx, event.data.object);
    default:
      return done("ignored");
  }
}

async function sessionPaid(trx: Executor, session: Stripe.Checkout.Session): Promise<AppliedEvent> {
  // A delayed payment method completes the session before the money arrives; only "paid" counts.
  if (session.payment_status !== "paid") return done("completed, not paid yet");
  const found = await findPaymentBySession(trx, session.id);
  if (!found) return done("unknown session");
  const quote = await lockQuote(trx, found.quote_id);
  const payment = await lockPayment(trx, found.id);
  if (payment.status === "paid") return done("already paid");
  const intentId = typeof session.payment_intent === "string" ? session.payment_intent : (session.payment_intent?.id ?? null);

  if (await hasPaidPayment(trx, payment.quote_id, payment.id)) {
    // Two sessions of one quote both paid: the unique index keeps one paid row, so this one is
    // flagged for a refund rather than recorded twice or retried by Stripe forever.
    const note = "A second deposit was paid on a quote already paid: refund it from the payments dashboard.";
    await trx
      .updateTable("quote_payment")
      .set({ payment_intent_id: intentId, failure_message: note, updated_at: new Date() })
      .where("id", "=", payment.id)
      .execute();
    await recordQuoteEvent(trx, { quoteId: payment.quote_id, revision: payment.revision, kind: "payment_duplicate", actor: PAYMENTS_ACTOR, detail: note });
    logPayments("error", "second deposit paid on one quote", { quoteId: payment.quote_id, checkoutSessionId: session.id, paymentIntentId: intentId });
    return done("second payment on a paid quote: refund needed");
  }

  const deposit = money(payment.amount, payment.currency);
  if (session.amount_total !== toMinorUnits(deposit) || session.currency?.toUpperCase() !== deposit.currency) {
    // The card was charged, so the payment is recorded; the mismatch is for a person to look at.
    logPayments("error", "paid amount differs from the deposit", {
      checkoutSessionId: session.id,
      amountTotal: session.amount_total,
      currency: session.currency,
    });
  }
  await trx
    .updateTable("quote_payment")
    .set({ status: "paid", paid_at: new Date(), payment_intent_id: intentId, failure_message: null, updated_at: new Date() })
    .where("id", "=", payment.id)
    .execute();
  if (quote?.status !== "deposit_paid") {
    await changeQuoteStatus(trx, "deposit_paid", {
      quoteId: payment.quote_id,
      revision: payment.revision,
      kind: "deposit_paid",
      actor: PAYMENTS_ACTOR,
      detail: `Deposit of ${formatMoney(deposit)} paid by card`,
    });
  }
  return done("paid", payment.id);
}

async function sessionExpired(trx: Executor, session: Stripe.Checkout.Session): Promise<AppliedEvent> {
  const found = await findPaymentBySession(trx, session.id);
  if (!found) return done("unknown session");
  await lockQuote(trx, found.quote_id);
  await lockPayment(trx, found.id);
  return (await settleUnlessPaid(trx, found.id, "expired")) ? done("expired") : done("expiry after payment ignored");
}

async function intentFailed(trx: Executor, intent: Stripe.PaymentIntent): Promise<AppliedEvent> {
  const found = await paymentForIntent(trx, intent);
  if (!found) return done("unknown payment intent");
  await lockQuote(trx, found.quote_id);
  const payment = await lockPayment(trx, found.id);
  if (payment.status === "paid") return done("failure after payment ignored");
  if (payment.status === "expired") return done("failure after expiry ignored");
  const message = intent.last_payment_error?.message || "The card payment did not go through.";
  await settleUnlessPaid(trx, payment.id, "failed", message);
  await trx.updateTable("quote_payment").set({ payment_intent_id: intent.id }).where("id", "=", payment.id).where("payment_intent_id", "is", null).execute();
  await recordQuoteEvent(trx, { quoteId: payment.quote_id, revision: payment.revision, kind: "payment_failed", actor: PAYMENTS_ACTOR, detail: message });
  return done("failed");
}

/** By the intent id once known; before that, by the quote and revision the session put in its metadata. */
async function paymentForIntent(trx: Executor, intent: Stripe.PaymentIntent) {
  const byIntent = await trx.selectFrom("quote_payment").select(["id", "quote_id"]).where("payment_intent_id", "=", intent.id).executeTakeFirst();
  if (byIntent) return byIntent;
  const quoteId = intent.metadata?.quoteId ?? "";
  const revision = Number(intent.metadata?.revision);
  if (!isUuid(quoteId) || !Number.isInteger(revision)) return undefined;
  return trx
    .selectFrom("quote_payment")
    .select(["id", "quote_id"])
    .where("quote_id", "=", quoteId)
    .where("revision", "=", revision)
    .where("payment_intent_id", "is", null)
    .where("status", "in", ["open", "failed"])
    .orderBy("created_at", "desc")
    .executeTakeFirst();
}
