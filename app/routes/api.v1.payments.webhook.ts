// POST /api/v1/payments/webhook — Stripe's deliveries (the local payments fake in development and
// tests). No session or API key: the Stripe-Signature header over the raw body is the credential, so
// the body is read as text, unparsed, and handed to the verifier as it came.
import type { Route } from "./+types/api.v1.payments.webhook";
import { jsonError, MAX_JSON_BYTES } from "~/server/json-body.server";
import { receivePaymentWebhook } from "~/server/quotes/payment-webhook.server";

function postOnly() {
  const response = jsonError(405, "Send webhook events with POST.");
  response.headers.set("Allow", "POST");
  return response;
}

export function loader() {
  return postOnly();
}

export async function action({ request }: Route.ActionArgs) {
  if (request.method !== "POST") return postOnly();
  if (Number(request.headers.get("Content-Length") ?? 0) > MAX_JSON_BYTES) return jsonError(413, "The event is too large.");
  const rawBody = await request.text();
  if (rawBody.length > MAX_JSON_BYTES) return jsonError(413, "The event is too large.");
  const answer = await receivePaymentWebhook(rawBody, request.headers.get("Stripe-Signature"));
  return Response.json(answer.body, { status: answer.status });
}
