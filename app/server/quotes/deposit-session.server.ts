// Talking to Stripe Checkout for a deposit: find a session the customer can still pay on, or make a
// new one for the sent revision's deposit. Called inside startDepositCheckout's transaction.
import type Stripe from "stripe";
import { formatQuoteNumber } from "~/domain/quotes/quote-status";
import { formatMoney, money, type Money } from "~/domain/money/money";
import { toMinorUnits } from "~/domain/money/minor-units";
import type { Executor } from "./quote-events.server";
import { settleUnlessPaid, unsettledPayments } from "./quote-payments.server";

export type OpenSession = { kind: "open"; id: string; url: string } | { kind: "paid" } | { kind: "none" };

/** The newest session of this revision that Stripe still shows as open; stale rows are marked expired. */
export async function findOpenSession(trx: Executor, client: Stripe, quoteId: string, revision: number): Promise<OpenSession> {
  for (const payment of await unsettledPayments(trx, quoteId, revision)) {
    const session = await retrieveOrNull(client, payment.checkout_session_id);
    if (session?.status === "open" && session.url) return { kind: "open", id: session.id, url: session.url };
    // Paid, but the webhook that records it has not arrived yet: never offer a second payment.
    if (session?.status === "complete") return { kind: "paid" };
    // Expired (its webhook may still be on the way) or unknown to Stripe: not payable any more.
    await settleUnlessPaid(trx, payment.id, "expired");
  }
  return { kind: "none" };
}

async function retrieveOrNull(client: Stripe, sessionId: string) {
  try {
    return await client.checkout.sessions.retrieve(sessionId);
  } catch (error) {
    if ((error as { statusCode?: number }).statusCode === 404) return null;
    throw error;
  }
}

export interface CreatedDepositSession {
  session: Stripe.Checkout.Session;
  deposit: Money;
  customerName: string;
  /** For the quote's timeline, e.g. "EUR 1,234.50 by card". */
  detail: string;
}

export async function createDepositSession(
  trx: Executor,
  client: Stripe,
  { quoteId, revision, origin }: { quoteId: string; revision: number; origin: string },
): Promise<CreatedDepositSession> {
  const row = await trx
    .selectFrom("quote")
    .innerJoin("quote_revision as r", (join) => join.onRef("r.quote_id", "=", "quote.id").on("r.revision", "=", revision))
    .innerJoin("organization as team", "team.id", "quote.team_id")
    .leftJoin("user as customer", "customer.id", "quote.customer_user_id")
    .select(["quote.number", "quote.title", "quote.currency", "quote.customer_name", "quote.customer_email", "r.deposit", "team.name as teamName"])
    .select(["customer.email as accountEmail", "customer.name as accountName"])
    .where("quote.id", "=", quoteId)
    .executeTakeFirstOrThrow();
  const deposit = money(row.deposit, row.currency);
  const number = formatQuoteNumber(row.number);
  const metadata = { quoteId, revision: String(revision) };
  const base = origin.replace(/\/+$/, "");
  const session = await client.checkout.sessions.create({
    mode: "payment",
    line_items: [
      {
        quantity: 1,
        price_data: {
          currency: deposit.currency.toLowerCase(),
          unit_amount: toMinorUnits(deposit),
          product_data: { name: `Deposit on quote ${number} from ${row.teamName}`.slice(0, 250) },
        },
      },
    ],
    customer_email: row.accountEmail ?? row.customer_email,
    client_reference_id: quoteId,
    metadata,
    // Stripe puts these on the PaymentIntent: a payment_intent.payment_failed event maps back by them.
    payment_intent_data: { metadata },
    success_url: `${base}/my-quotes/${quoteId}?payment=done&session={CHECKOUT_SESSION_ID}`,
    cancel_url: `${base}/my-quotes/${quoteId}?payment=cancelled`,
  });
  return {
    session,
    deposit,
    customerName: row.accountName ?? row.customer_name,
    detail: `Deposit ${formatMoney(deposit)} for ${number} revision ${revision}: sent to card checkout`,
  };
}
