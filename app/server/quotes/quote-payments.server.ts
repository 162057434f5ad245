// Queries on a quote's deposit payments, shared by Checkout and the webhook. Locks are always taken
// quote first, then payment, so the two paths can never wait on each other in a cycle.
import type { QuotePaymentStatus } from "../db-schema-quotes";
import type { Executor } from "./quote-events.server";

/** Locks the quote row for the rest of the transaction (FOR UPDATE). */
export function lockQuote(trx: Executor, quoteId: string) {
  return trx
    .selectFrom("quote")
    .select(["id", "team_id", "number", "status", "sent_revision", "customer_user_id", "currency"])
    .where("id", "=", quoteId)
    .forUpdate()
    .executeTakeFirst();
}

/** Locks one payment row (FOR UPDATE); call after lockQuote on its quote. */
export function lockPayment(trx: Executor, paymentId: string) {
  return trx.selectFrom("quote_payment").selectAll().where("id", "=", paymentId).forUpdate().executeTakeFirstOrThrow();
}

export function findPaymentBySession(trx: Executor, checkoutSessionId: string) {
  return trx.selectFrom("quote_payment").select(["id", "quote_id"]).where("checkout_session_id", "=", checkoutSessionId).executeTakeFirst();
}

export async function hasPaidPayment(trx: Executor, quoteId: string, exceptPaymentId?: string) {
  let query = trx.selectFrom("quote_payment").select("id").where("quote_id", "=", quoteId).where("status", "=", "paid");
  if (exceptPaymentId) query = query.where("id", "!=", exceptPaymentId);
  return (await query.executeTakeFirst()) !== undefined;
}

/** Sessions a customer might still pay on: open, or open again after a declined card. */
export function unsettledPayments(trx: Executor, quoteId: string, revision: number) {
  return trx
    .selectFrom("quote_payment")
    .select(["id", "checkout_session_id"])
    .where("quote_id", "=", quoteId)
    .where("revision", "=", revision)
    .where("status", "in", ["open", "failed"])
    .orderBy("created_at", "desc")
    .limit(5)
    .execute();
}

/** Moves a payment to a new status unless it is already paid: a paid deposit is never undone. */
export async function settleUnlessPaid(trx: Executor, paymentId: string, status: Exclude<QuotePaymentStatus, "paid">, failureMessage: string | null = null) {
  const result = await trx
    .updateTable("quote_payment")
    .set({ status, failure_message: failureMessage, updated_at: new Date() })
    .where("id", "=", paymentId)
    .where("status", "!=", "paid")
    .executeTakeFirst();
  return result.numUpdatedRows > 0n;
}
