// Every status change of a quote goes through here: the quote's status and the timeline event are
// written in the caller's transaction, so a timeline never shows a change that did not happen.
import type { Kysely, Transaction } from "kysely";
import type { Database } from "../db-schema";
import type { QuoteStatus } from "~/domain/quotes/quote-status";

export type Executor = Kysely<Database> | Transaction<Database>;

export interface QuoteActor {
  userId: string | null;
  /** Shown in the timeline: a person's name, or "Payments" for the card processor. */
  name: string;
}

export const PAYMENTS_ACTOR: QuoteActor = { userId: null, name: "Payments" };

export interface QuoteEventInput {
  quoteId: string;
  revision: number | null;
  /** created, revised, sent, resent, viewed, approved, declined, expired, withdrawn, payment_started, payment_failed, deposit_paid */
  kind: string;
  actor: QuoteActor;
  detail?: string;
}

export async function recordQuoteEvent(trx: Executor, event: QuoteEventInput) {
  await trx
    .insertInto("quote_event")
    .values({
      quote_id: event.quoteId,
      revision: event.revision,
      kind: event.kind,
      actor_user_id: event.actor.userId,
      actor_name: event.actor.name,
      detail: event.detail ?? "",
    })
    .execute();
}

/** Sets the status and records the event in one go (call inside a transaction). */
export async function changeQuoteStatus(trx: Executor, status: QuoteStatus, event: QuoteEventInput) {
  await trx.updateTable("quote").set({ status, updated_at: new Date() }).where("id", "=", event.quoteId).execute();
  await recordQuoteEvent(trx, event);
}
