// The one Stripe SDK client of the process. STRIPE_API_URL points it at the local payments fake in
// development and tests, or at https://api.stripe.com in production; the SDK takes the address as
// host, port and protocol rather than as a URL.
import Stripe from "stripe";
import { env } from "../env.server";

export { Stripe };

export function stripeConfig(apiUrl: string): Stripe.StripeConfig {
  const url = new URL(apiUrl);
  const protocol = url.protocol === "http:" ? "http" : "https";
  return {
    host: url.hostname,
    port: url.port ? Number(url.port) : protocol === "https" ? 443 : 80,
    protocol,
    // One retry rides out a dropped connection; the SDK adds an idempotency key to retried POSTs,
    // so a retried create never makes a second Checkout Session.
    maxNetworkRetries: 1,
    // A customer waits on this call after pressing "Pay deposit": fail fast with a clear message.
    timeout: 15_000,
    telemetry: false,
  };
}

export function createStripeClient(apiUrl = env.STRIPE_API_URL, secretKey = env.STRIPE_SECRET_KEY) {
  return new Stripe(secretKey, stripeConfig(apiUrl));
}

export const stripe = createStripeClient();

export const STRIPE_WEBHOOK_SECRET = env.STRIPE_WEBHOOK_SECRET;

/** The service could not be reached or had trouble of its own: worth trying again later. */
export function isPaymentsServiceDown(error: unknown) {
  return (
    error instanceof Stripe.errors.StripeConnectionError ||
    error instanceof Stripe.errors.StripeAPIError ||
    error instanceof Stripe.errors.StripeRateLimitError ||
    (error instanceof Stripe.errors.StripeError && (error.statusCode ?? 0) >= 500)
  );
}
