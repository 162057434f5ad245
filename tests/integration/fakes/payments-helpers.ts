// Shared by the payments fake tests: an SDK client pointed at the fake and a typical session.
import Stripe from "stripe";

export const TEST_KEY = "sk_test_kitwright_fakes";
export const WEBHOOK_SECRET = "whsec_test_fakes";

export function stripeFor(port: number, key = TEST_KEY): Stripe {
  return new Stripe(key, { host: "127.0.0.1", port, protocol: "http", maxNetworkRetries: 0, telemetry: false });
}

/** A deposit on a quote, the way the app asks for one. */
export function createDepositSession(stripe: Stripe, overrides: Partial<Stripe.Checkout.SessionCreateParams> = {}) {
  return stripe.checkout.sessions.create({
    mode: "payment",
    line_items: [
      {
        price_data: { currency: "eur", unit_amount: 12345, product_data: { name: "Deposit for quote Q-104" } },
        quantity: 1,
      },
      {
        price_data: { currency: "eur", unit_amount: 500, product_data: { name: "Site survey" } },
        quantity: 2,
      },
    ],
    success_url: "http://127.0.0.1:3000/quotes/104/paid?session={CHECKOUT_SESSION_ID}",
    cancel_url: "http://127.0.0.1:3000/quotes/104",
    customer_email: "ana@example.test",
    client_reference_id: "quote_104",
    metadata: { quoteId: "104", teamId: "t1" },
    ...overrides,
  });
}
