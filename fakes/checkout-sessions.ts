// Builds a checkout.session from create params, validating what the hosted page and the
// payment step rely on. Checks mirror Stripe's messages where the fake knows them.
import { invalidParam, missingParam, StripeFakeError } from "./stripe-errors.ts";
import type { Params } from "./stripe-params.ts";
import { newId, nowSeconds, type CheckoutSession, type LineItem, type Metadata, type SessionRecord } from "./payments-state.ts";
import { readLineItems } from "./checkout-line-items.ts";

// Params the fake models, plus common ones it accepts and ignores. Anything else is logged,
// not rejected: the fake cannot know every Stripe parameter, and real Stripe is the judge.
const KNOWN_PARAMS = new Set([
  "mode",
  "line_items",
  "success_url",
  "cancel_url",
  "customer_email",
  "client_reference_id",
  "metadata",
  "expires_at",
  "payment_intent_data",
  "expand",
  "locale",
  "payment_method_types",
  "submit_type",
  "billing_address_collection",
  "allow_promotion_codes",
  "customer_creation",
  "phone_number_collection",
  "custom_text",
  "ui_mode",
]);

const DAY_SECONDS = 24 * 60 * 60;

export function createSessionRecord(params: Params, baseUrl: string, warn: (line: string) => void): SessionRecord {
  for (const key of Object.keys(params)) {
    if (!KNOWN_PARAMS.has(key)) warn(`payments fake: ignoring unmodelled parameter '${key}'`);
  }
  const mode = optionalString(params, "mode");
  if (!mode) throw missingParam("mode");
  if (mode !== "payment") {
    throw invalidParam("mode", `The payments fake supports mode=payment only, got '${mode}'.`);
  }
  const successUrl = optionalString(params, "success_url");
  if (!successUrl) throw missingParam("success_url");
  checkUrl("success_url", successUrl);
  const cancelUrl = optionalString(params, "cancel_url");
  if (cancelUrl) checkUrl("cancel_url", cancelUrl);

  const customerEmail = optionalString(params, "customer_email");
  if (customerEmail && !/^[^\s@]+@[^\s@]+$/.test(customerEmail)) {
    throw invalidParam("customer_email", "Invalid email address: " + customerEmail);
  }
  const clientReferenceId = optionalString(params, "client_reference_id");
  if (clientReferenceId && clientReferenceId.length > 200) {
    throw invalidParam("client_reference_id", "client_reference_id must be at most 200 characters.");
  }

  const lineItems = readLineItems(params.line_items);
  const created = nowSeconds();
  const amountTotal = lineItems.reduce((sum, item) => sum + item.amount_total, 0);
  const id = newId("cs_test_", 58);
  const session: CheckoutSession = {
    id,
    object: "checkout.session",
    amount_subtotal: amountTotal,
    amount_total: amountTotal,
    cancel_url: cancelUrl ?? null,
    client_reference_id: clientReferenceId ?? null,
    created,
    currency: lineItems[0]!.currency,
    customer: null,
    customer_details: null,
    customer_email: customerEmail ?? null,
    expires_at: readExpiresAt(params.expires_at, created),
    livemode: false,
    metadata: readMetadata(params.metadata, "metadata"),
    mode: "payment",
    payment_intent: null,
    payment_status: "unpaid",
    status: "open",
    success_url: successUrl,
    url: `${baseUrl}/pay/${id}`,
  };
  const intentData = params.payment_intent_data;
  const intentMetadata =
    intentData && typeof intentData === "object" && !Array.isArray(intentData) ? readMetadata(intentData.metadata, "payment_intent_data[metadata]") : {};
  return { session, lineItems, paymentIntentMetadata: intentMetadata };
}

/** Replaces ids with objects for `expand[]=line_items` / `expand[]=payment_intent`. */
export function expandSession(record: SessionRecord, expand: unknown, findIntent: (id: string) => unknown): unknown {
  const fields = Array.isArray(expand) ? expand : typeof expand === "string" ? [expand] : [];
  const out: Record<string, unknown> = { ...record.session };
  if (fields.includes("line_items")) out.line_items = lineItemList(record.session.id, record.lineItems);
  if (fields.includes("payment_intent") && record.session.payment_intent) {
    out.payment_intent = findIntent(record.session.payment_intent) ?? record.session.payment_intent;
  }
  return out;
}

export function lineItemList(sessionId: string, items: LineItem[]) {
  return {
    object: "list",
    data: items,
    has_more: false,
    url: `/v1/checkout/sessions/${sessionId}/line_items`,
  };
}

function optionalString(params: Params, key: string): string | undefined {
  const value: unknown = params[key];
  if (value === undefined || value === "") return undefined;
  if (typeof value !== "string") throw invalidParam(key, `Invalid string: ${key}`);
  return value;
}

function checkUrl(param: string, value: string): void {
  // {CHECKOUT_SESSION_ID} is a template Stripe fills in, not valid URL syntax everywhere.
  const candidate = value.replaceAll("{CHECKOUT_SESSION_ID}", "x");
  const url = URL.canParse(candidate) ? new URL(candidate) : null;
  // http(s) only: the page puts cancel_url in a link and redirects to success_url.
  if (!url || (url.protocol !== "http:" && url.protocol !== "https:")) {
    throw invalidParam(param, `Not a valid URL: ${param}`);
  }
}

function readMetadata(value: unknown, param: string): Metadata {
  if (value === undefined || value === "") return {};
  if (typeof value !== "object" || value === null || Array.isArray(value)) {
    throw invalidParam(param, `Invalid object: ${param}`);
  }
  const entries = Object.entries(value);
  if (entries.length > 50) throw invalidParam(param, "Metadata can have at most 50 keys.");
  const metadata: Metadata = {};
  for (const [key, raw] of entries) {
    const text = typeof raw === "string" ? raw : typeof raw === "number" ? String(raw) : null;
    if (text === null) throw invalidParam(`${param}[${key}]`, `Invalid string: ${param}[${key}]`);
    if (key.length > 40 || text.length > 500) {
      throw invalidParam(`${param}[${key}]`, "Metadata keys are limited to 40 and values to 500 characters.");
    }
    metadata[key] = text;
  }
  return metadata;
}

function readExpiresAt(value: unknown, created: number): number {
  if (value === undefined || value === "") return created + DAY_SECONDS;
  const at = Number(value);
  if (!Number.isInteger(at) || at < created + 30 * 60 || at > created + DAY_SECONDS) {
    throw new StripeFakeError(400, "The `expires_at` timestamp must be between 30 minutes and 24 hours from Checkout Session creation.", {
      param: "expires_at",
    });
  }
  return at;
}
