// An approved quote ready for its deposit, written straight into the tables (the quote editor is
// tested on its own), and Stripe events signed the way Stripe signs its webhook deliveries.
import { randomBytes, randomUUID } from "node:crypto";
import Stripe from "stripe";
import { installerWithTeam, signUpUser, userWithRole } from "../helpers/fixtures";
import { planningSetup } from "../helpers/planning-fixtures";
import { BASE, toResult } from "../helpers/route-client";
import * as webhookRoute from "~/routes/api.v1.payments.webhook";
import { db } from "~/server/db.server";
import { env } from "~/server/env.server";
import type { QuotePlanSnapshot } from "~/domain/quotes/quote-types";

const SNAPSHOT: QuotePlanSnapshot = {
  planName: "Hut kit",
  planRevision: 1,
  siteName: "Vell Valley hut",
  systemVoltageV: 24,
  arrayStcPowerW: 1320,
  moduleCount: 4,
  batteryUsableKWh: 4.6,
  autonomyDays: 3,
  months: [],
  checks: [],
  cautions: ["Installed and signed off by a licensed person, following the local electrical code."],
};

/** Totals worked by hand: net 4115.00, tax 20 % = 823.00, gross 4938.00, deposit 30 % = 1481.40. */
export const TOTALS = { net: "4115.00", tax: "823.00", gross: "4938.00", deposit: "1481.40", balance: "3456.60" };

export async function approvedQuote(label: string, { withPayment = true } = {}) {
  const owner = await installerWithTeam(`${label}-owner`);
  // The quote's author is a plain member; another member gets no notice.
  const author = await signUpUser(`${label}-author`);
  const bystander = await signUpUser(`${label}-bystander`);
  for (const person of [author, bystander]) {
    await db
      .insertInto("member")
      .values({ id: randomUUID(), organizationId: owner.teamId, userId: person.userId, role: "member", createdAt: new Date() })
      .execute();
  }
  const customer = await userWithRole("customer", `${label}-customer`);
  const setup = await planningSetup(owner.teamId);
  const plan = await db
    .insertInto("kit_plan")
    .values({ team_id: owner.teamId, site_id: setup.siteId, load_sheet_id: setup.loadSheetId, name: "Hut kit", created_by: author.userId })
    .returning("id")
    .executeTakeFirstOrThrow();
  const quote = await db
    .insertInto("quote")
    .values({
      team_id: owner.teamId,
      number: 1,
      plan_id: plan.id,
      title: "Solar kit for the Vell hut",
      customer_name: "Mira Tallow",
      customer_email: customer.email,
      customer_user_id: customer.userId,
      currency: "EUR",
      status: "approved",
      latest_revision: 1,
      sent_revision: 1,
      decided_name: "Mira Tallow",
      decided_at: new Date(),
      created_by: author.userId,
    })
    .returning("id")
    .executeTakeFirstOrThrow();
  await db
    .insertInto("quote_revision")
    .values({
      quote_id: quote.id,
      revision: 1,
      plan_revision: 1,
      margin_pct: "20",
      discount_pct: "0",
      tax_rate_pct: "20",
      deposit_pct: "30",
      valid_until: "2099-12-31",
      net: TOTALS.net,
      tax: TOTALS.tax,
      gross: TOTALS.gross,
      deposit: TOTALS.deposit,
      tax_bands: JSON.stringify([{ ratePct: "20", net: TOTALS.net, tax: TOTALS.tax }]),
      plan_snapshot: JSON.stringify(SNAPSHOT),
      sent_at: new Date(),
      created_by: author.userId,
    })
    .execute();
  const sessionId = `cs_test_fixture_${randomBytes(12).toString("hex")}`;
  if (withPayment) {
    await db
      .insertInto("quote_payment")
      .values({
        quote_id: quote.id,
        revision: 1,
        checkout_session_id: sessionId,
        amount: TOTALS.deposit,
        currency: "EUR",
        status: "open",
        created_by: customer.userId,
      })
      .execute();
  }
  return { owner, author, bystander, customer, quoteId: quote.id, sessionId };
}

const eventId = () => `evt_test_${randomBytes(12).toString("hex")}`;

function event(type: string, object: Record<string, unknown>) {
  return { id: eventId(), object: "event", api_version: Stripe.API_VERSION, created: Math.floor(Date.now() / 1000), livemode: false, type, data: { object } };
}

export function sessionCompleted(sessionId: string, quoteId: string, intentId: string, amountTotal = 148140) {
  return event("checkout.session.completed", {
    id: sessionId,
    object: "checkout.session",
    amount_total: amountTotal,
    currency: "eur",
    client_reference_id: quoteId,
    metadata: { quoteId, revision: "1" },
    mode: "payment",
    payment_intent: intentId,
    payment_status: "paid",
    status: "complete",
  });
}

export function sessionExpired(sessionId: string, quoteId: string) {
  return event("checkout.session.expired", {
    id: sessionId,
    object: "checkout.session",
    metadata: { quoteId, revision: "1" },
    payment_status: "unpaid",
    status: "expired",
  });
}

export function paymentFailed(intentId: string, quoteId: string, message = "Your card was declined.") {
  return event("payment_intent.payment_failed", {
    id: intentId,
    object: "payment_intent",
    amount: 148140,
    currency: "eur",
    status: "requires_payment_method",
    last_payment_error: { type: "card_error", code: "card_declined", message },
    metadata: { quoteId, revision: "1" },
  });
}

/** Posts a body to the webhook action as Stripe would; `signature: null` leaves the header out. */
export async function deliver(
  payload: unknown,
  { secret = env.STRIPE_WEBHOOK_SECRET, timestamp, signature }: { secret?: string; timestamp?: number; signature?: string | null } = {},
) {
  const body = typeof payload === "string" ? payload : JSON.stringify(payload, null, 2);
  const header = signature === undefined ? Stripe.webhooks.generateTestHeaderString({ payload: body, secret, timestamp }) : signature;
  const headers = new Headers({ "Content-Type": "application/json; charset=utf-8" });
  if (header !== null) headers.set("Stripe-Signature", header);
  const request = new Request(new URL("/api/v1/payments/webhook", BASE), { method: "POST", headers, body });
  return toResult(await webhookRoute.action({ request, params: {}, context: {} } as Parameters<typeof webhookRoute.action>[0]));
}
