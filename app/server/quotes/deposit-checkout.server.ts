// The customer's "Pay deposit" step: one Stripe Checkout Session per quote revision, reused while it
// is still open, recorded as a quote_payment row before the customer is sent to it. The quote row is
// locked meanwhile, so two clicks in two tabs end on the same session, never on two payable ones.
import { moneyText } from "~/domain/money/money";
import { db } from "../db.server";
import { isUuid } from "../modules.server";
import { logPayments, errorText } from "../payments/payments-log.server";
import { isPaymentsServiceDown, Stripe, stripe } from "../payments/stripe.server";
import { recordQuoteEvent } from "./quote-events.server";
import { hasPaidPayment, lockQuote } from "./quote-payments.server";
import { createDepositSession, findOpenSession } from "./deposit-session.server";

export type DepositCheckoutError = "not_found" | "not_approved" | "already_paid" | "payments_unavailable";

export type DepositCheckoutResult =
  { ok: true; url: string; checkoutSessionId: string; reused: boolean } | { ok: false; error: DepositCheckoutError; message: string };

export interface StartDepositCheckoutInput {
  quoteId: string;
  /** The signed-in customer; a quote sent to anyone else reads as not found. */
  customerUserId: string;
  /** Where Checkout sends the customer back, e.g. "https://app.example" (no trailing slash). */
  origin: string;
}

const MESSAGES: Record<DepositCheckoutError, string> = {
  not_found: "There is no such quote on your account.",
  not_approved: "The deposit can be paid once the quote is approved.",
  already_paid: "The deposit on this quote is already paid.",
  payments_unavailable: "The card payment service cannot be reached just now. Nothing was charged; please try again in a few minutes.",
};

function failure(error: DepositCheckoutError, message = MESSAGES[error]): DepositCheckoutResult {
  return { ok: false, error, message };
}

export async function startDepositCheckout(input: StartDepositCheckoutInput, client: Stripe = stripe): Promise<DepositCheckoutResult> {
  if (!isUuid(input.quoteId)) return failure("not_found");
  try {
    return await db.transaction().execute(async (trx) => {
      const quote = await lockQuote(trx, input.quoteId);
      if (!quote || quote.customer_user_id !== input.customerUserId) return failure("not_found");
      if (quote.status === "deposit_paid" || (await hasPaidPayment(trx, quote.id))) return failure("already_paid");
      if (quote.status !== "approved" || quote.sent_revision === null) return failure("not_approved");

      const open = await findOpenSession(trx, client, quote.id, quote.sent_revision);
      if (open.kind === "open") return { ok: true, url: open.url, checkoutSessionId: open.id, reused: true };
      if (open.kind === "paid") return failure("already_paid", "Your payment went through and is being recorded; this page will show it in a moment.");

      const created = await createDepositSession(trx, client, { quoteId: quote.id, revision: quote.sent_revision, origin: input.origin });
      await trx
        .insertInto("quote_payment")
        .values({
          quote_id: quote.id,
          revision: quote.sent_revision,
          checkout_session_id: created.session.id,
          amount: moneyText(created.deposit),
          currency: created.deposit.currency,
          status: "open",
          created_by: input.customerUserId,
        })
        .execute();
      await recordQuoteEvent(trx, {
        quoteId: quote.id,
        revision: quote.sent_revision,
        kind: "payment_started",
        actor: { userId: input.customerUserId, name: created.customerName },
        detail: created.detail,
      });
      return { ok: true, url: created.session.url!, checkoutSessionId: created.session.id, reused: false };
    });
  } catch (error) {
    // Any refusal by the payments service is ours to fix, never the customer's: log it, say sorry.
    if (error instanceof Stripe.errors.StripeError) {
      logPayments(isPaymentsServiceDown(error) ? "warn" : "error", "deposit checkout failed", {
        quoteId: input.quoteId,
        type: error.type,
        error: errorText(error),
      });
      return failure("payments_unavailable");
    }
    throw error;
  }
}
