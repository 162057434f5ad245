// Stripe's webhook deliveries: verified against the endpoint secret, applied once per event id in one
// transaction (the event row and its effect commit together or not at all), and answered 2xx once
// recorded so that Stripe stops retrying. Receipts go out after commit, only on the move to paid.
import { db } from "../db.server";
import { errorText, logPayments } from "../payments/payments-log.server";
import { Stripe, stripe, STRIPE_WEBHOOK_SECRET } from "../payments/stripe.server";
import { sendDepositPaidMails } from "./deposit-paid-mail.server";
import { applyPaymentEvent } from "./payment-webhook-events.server";

export interface WebhookAnswer {
  status: 200 | 400;
  body: { received: true; outcome: string; duplicate?: true } | { error: { message: string } };
}

function rejected(message: string): WebhookAnswer {
  return { status: 400, body: { error: { message } } };
}

/** Verifies the Stripe-Signature header over the raw body (default tolerance: 300 s). */
export function verifyWebhookEvent(rawBody: string, signature: string | null, secret = STRIPE_WEBHOOK_SECRET) {
  if (!signature) return { ok: false as const, message: "The Stripe-Signature header is missing." };
  try {
    return { ok: true as const, event: stripe.webhooks.constructEvent(rawBody, signature, secret) };
  } catch (error) {
    if (error instanceof Stripe.errors.StripeSignatureVerificationError) {
      return { ok: false as const, message: `The webhook signature does not verify: ${error.message}` };
    }
    // Signed but not JSON: constructEvent's JSON.parse throws a SyntaxError.
    if (error instanceof SyntaxError) return { ok: false as const, message: "The webhook body is not valid JSON." };
    throw error;
  }
}

export async function receivePaymentWebhook(rawBody: string, signature: string | null): Promise<WebhookAnswer> {
  const verified = verifyWebhookEvent(rawBody, signature);
  if (!verified.ok) return rejected(verified.message);
  const event = verified.event;
  const objectId = (event.data?.object as { id?: unknown } | undefined)?.id;
  if (typeof event.id !== "string" || typeof event.type !== "string" || typeof objectId !== "string") {
    return rejected("The event has no id, type or object id.");
  }

  const applied = await db.transaction().execute(async (trx) => {
    // Claims the event id first: a second delivery of the same event waits here until the first
    // commits, then finds the row and does nothing.
    const claimed = await trx
      .insertInto("payment_webhook_event")
      .values({ event_id: event.id, type: event.type, object_id: objectId, outcome: "received" })
      .onConflict((oc) => oc.column("event_id").doNothing())
      .returning("event_id")
      .executeTakeFirst();
    if (!claimed) return null;
    const result = await applyPaymentEvent(trx, event);
    await trx.updateTable("payment_webhook_event").set({ outcome: result.outcome }).where("event_id", "=", event.id).execute();
    return result;
  });

  if (!applied) {
    const earlier = await db.selectFrom("payment_webhook_event").select("outcome").where("event_id", "=", event.id).executeTakeFirst();
    return { status: 200, body: { received: true, duplicate: true, outcome: earlier?.outcome ?? "already received" } };
  }
  if (applied.paidPaymentId) {
    try {
      await sendDepositPaidMails(applied.paidPaymentId);
    } catch (error) {
      // The payment is committed; a mail problem must not make Stripe deliver the event again.
      logPayments("error", "deposit receipt mail failed", { eventId: event.id, paymentId: applied.paidPaymentId, error: errorText(error) });
    }
  }
  return { status: 200, body: { received: true, outcome: applied.outcome } };
}
