// The one step real Stripe does out of sight: charging the card on the hosted page. Shared by
// the HTML form and the POST /_fake/sessions/:id/pay test hook so both behave identically.
import {
  newId,
  nowSeconds,
  recordEvent,
  type CheckoutSession,
  type PaymentIntent,
  type PaymentsState,
  type SessionRecord,
  type StripeEvent,
} from "./payments-state.ts";
import type { WebhookSender } from "./webhook-delivery.ts";

export const TEST_CARDS = {
  succeeds: "4242 4242 4242 4242",
  declined: "4000 0000 0000 0002",
};

export const DECLINED_MESSAGE = "Your card was declined.";
export const USE_TEST_CARD_MESSAGE =
  `Use a test card: ${TEST_CARDS.succeeds} to pay, or ${TEST_CARDS.declined} to see a decline. ` + "This page never charges a real card.";

export type PaymentResult =
  | { outcome: "succeeded"; session: CheckoutSession; event: StripeEvent }
  | { outcome: "declined"; message: string; session: CheckoutSession; event: StripeEvent }
  | { outcome: "rejected"; message: string };

export async function payCheckoutSession(
  state: PaymentsState,
  webhooks: WebhookSender,
  record: SessionRecord,
  card: { number: string; name?: string },
): Promise<PaymentResult> {
  const { session } = record;
  if (session.status === "complete") {
    return { outcome: "rejected", message: "This payment has already been made." };
  }
  if (session.status === "expired") {
    return { outcome: "rejected", message: "This payment link has expired." };
  }
  const digits = card.number.replace(/[\s-]/g, "");
  if (digits !== TEST_CARDS.succeeds.replaceAll(" ", "") && digits !== TEST_CARDS.declined.replaceAll(" ", "")) {
    return { outcome: "rejected", message: USE_TEST_CARD_MESSAGE };
  }

  const intent = intentFor(state, record);
  if (digits === TEST_CARDS.declined.replaceAll(" ", "")) {
    intent.status = "requires_payment_method";
    intent.last_payment_error = {
      type: "card_error",
      code: "card_declined",
      decline_code: "generic_decline",
      message: DECLINED_MESSAGE,
    };
    // The session stays open so the customer can try another card, as on Stripe.
    const event = recordEvent(state, "payment_intent.payment_failed", intent);
    await webhooks.deliver(event);
    return { outcome: "declined", message: DECLINED_MESSAGE, session, event };
  }

  intent.status = "succeeded";
  intent.amount_received = intent.amount;
  intent.last_payment_error = null;
  session.status = "complete";
  session.payment_status = "paid";
  session.url = null;
  session.customer_details = { email: session.customer_email, name: card.name?.trim() || null };
  const event = recordEvent(state, "checkout.session.completed", session);
  // Awaiting the first attempt means the app has usually recorded the payment before the
  // browser lands on success_url; the app must still tolerate the webhook arriving late.
  await webhooks.deliver(event);
  return { outcome: "succeeded", session, event };
}

// Stripe creates the intent when the customer first submits the form and reuses it for retries.
function intentFor(state: PaymentsState, record: SessionRecord): PaymentIntent {
  const existing = record.session.payment_intent && state.paymentIntents.get(record.session.payment_intent);
  if (existing) return existing;
  const intent: PaymentIntent = {
    id: newId("pi_test_"),
    object: "payment_intent",
    amount: record.session.amount_total,
    amount_received: 0,
    currency: record.session.currency,
    created: nowSeconds(),
    status: "requires_payment_method",
    last_payment_error: null,
    metadata: { ...record.paymentIntentMetadata },
    livemode: false,
  };
  state.paymentIntents.set(intent.id, intent);
  record.session.payment_intent = intent.id;
  return intent;
}

/** success_url may carry Stripe's {CHECKOUT_SESSION_ID} template. */
export function successRedirect(session: CheckoutSession): string {
  return session.success_url.replaceAll("{CHECKOUT_SESSION_ID}", session.id);
}
