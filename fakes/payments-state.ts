// Everything the payments fake remembers, in memory: sessions, payment intents, events and
// webhook deliveries. Shapes follow Stripe's JSON closely enough for the SDK and the app.
import { randomInt } from "node:crypto";
import Stripe from "stripe";
import type { WebhookSender } from "./webhook-delivery.ts";

export type Metadata = Record<string, string>;

export type LineItem = {
  id: string;
  object: "item";
  amount_subtotal: number;
  amount_total: number;
  currency: string;
  description: string;
  quantity: number;
  price: { object: "price"; unit_amount: number; currency: string; product_name: string };
};

export type CheckoutSession = {
  id: string;
  object: "checkout.session";
  amount_subtotal: number;
  amount_total: number;
  cancel_url: string | null;
  client_reference_id: string | null;
  created: number;
  currency: string;
  customer: null;
  customer_details: { email: string | null; name: string | null } | null;
  customer_email: string | null;
  expires_at: number;
  livemode: false;
  metadata: Metadata;
  mode: "payment";
  payment_intent: string | null;
  payment_status: "unpaid" | "paid";
  status: "open" | "complete" | "expired";
  success_url: string;
  url: string | null;
};

export type PaymentIntent = {
  id: string;
  object: "payment_intent";
  amount: number;
  amount_received: number;
  currency: string;
  created: number;
  status: "requires_payment_method" | "succeeded";
  last_payment_error: { type: "card_error"; code: string; decline_code: string; message: string } | null;
  metadata: Metadata;
  livemode: false;
};

export type StripeEvent = {
  id: string;
  object: "event";
  api_version: string;
  created: number;
  data: { object: unknown };
  livemode: false;
  pending_webhooks: number;
  request: { id: null; idempotency_key: null };
  type: string;
};

export type Delivery = {
  eventId: string;
  eventType: string;
  url: string;
  attempt: number;
  at: string;
  statusCode: number | null;
  error: string | null;
  durationMs: number;
};

export type SessionRecord = {
  session: CheckoutSession;
  lineItems: LineItem[];
  /** payment_intent_data.metadata: Stripe puts it on the intent, not on the session. */
  paymentIntentMetadata: Metadata;
};

export type PaymentsState = ReturnType<typeof createPaymentsState>;

export function createPaymentsState() {
  return {
    sessions: new Map<string, SessionRecord>(),
    paymentIntents: new Map<string, PaymentIntent>(),
    /** Oldest first; list endpoints reverse. */
    events: [] as StripeEvent[],
    deliveries: [] as Delivery[],
    /** Idempotency-Key → the response first given for it. */
    idempotent: new Map<string, { status: number; body: unknown }>(),
  };
}

export function recordEvent(state: PaymentsState, type: string, object: unknown): StripeEvent {
  const event: StripeEvent = {
    id: newId("evt_"),
    object: "event",
    api_version: Stripe.API_VERSION,
    created: nowSeconds(),
    // A snapshot: later changes to the session must not rewrite an event already sent.
    data: { object: structuredClone(object) },
    livemode: false,
    pending_webhooks: 1,
    request: { id: null, idempotency_key: null },
    type,
  };
  state.events.push(event);
  return event;
}

const ALPHABET = "0123456789ABCDEFGHIJKLMNOPQRSTUVWXYZabcdefghijklmnopqrstuvwxyz";

/** Stripe-looking ids: a prefix plus random base62, e.g. cs_test_a1B2c3… */
export function newId(prefix: string, length = 24): string {
  let id = prefix;
  for (let i = 0; i < length; i++) id += ALPHABET[randomInt(ALPHABET.length)];
  return id;
}

export function nowSeconds(): number {
  return Math.floor(Date.now() / 1000);
}

/** Stripe expires open sessions at expires_at; the fake does it lazily when one is read. */
export function findSession(state: PaymentsState, id: string): SessionRecord | undefined {
  const record = state.sessions.get(id);
  if (record && record.session.status === "open" && record.session.expires_at <= nowSeconds()) {
    record.session.status = "expired";
    record.session.url = null;
  }
  return record;
}

/** What every payments route handler gets: the state, the webhook sender, where we live. */
export type PaymentsContext = {
  state: PaymentsState;
  webhooks: WebhookSender;
  /** e.g. http://127.0.0.1:12111, for session.url */
  baseUrl: string;
  log: (line: string) => void;
};
