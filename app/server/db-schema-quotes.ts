// Team-owned quote tables and the deposit payments made on them. Money columns are `numeric`, read
// and written as decimal text (see NumericText); totals are those of app/domain/money/quote-totals.ts.
import type { ColumnType, Generated, Selectable } from "kysely";
import type { NumericText, OfferPartKind } from "./db-schema-sourcing";
import type { QuoteStatus } from "~/domain/quotes/quote-status";
import type { QuoteLineKind, QuotePlanSnapshot } from "~/domain/quotes/quote-types";

type Timestamp = ColumnType<Date, Date | string | undefined, Date | string>;
type Json<T> = ColumnType<T, string, string>;
/** A `date` column, selected as `::text` (YYYY-MM-DD) like the sourcing tables' dates. */
type DateColumn = ColumnType<Date | string, string, string>;

export interface QuoteTable {
  id: Generated<string>;
  team_id: string;
  number: number;
  plan_id: string;
  title: string;
  customer_name: string;
  customer_email: string;
  customer_user_id: string | null;
  currency: string;
  status: ColumnType<QuoteStatus, QuoteStatus | undefined, QuoteStatus>;
  latest_revision: Generated<number>;
  sent_revision: number | null;
  access_token_hash: string | null;
  decided_name: string | null;
  decision_comment: string | null;
  decided_at: Timestamp | null;
  created_by: string | null;
  created_at: Timestamp;
  updated_at: Timestamp;
}

export interface TaxBandJson {
  ratePct: string;
  net: string;
  tax: string;
}

export interface QuoteRevisionTable {
  id: Generated<string>;
  quote_id: string;
  revision: number;
  plan_revision: number;
  margin_pct: NumericText;
  discount_pct: NumericText;
  tax_rate_pct: NumericText;
  deposit_pct: NumericText;
  valid_until: DateColumn;
  terms: Generated<string>;
  net: NumericText;
  tax: NumericText;
  gross: NumericText;
  deposit: NumericText;
  tax_bands: Json<TaxBandJson[]>;
  plan_snapshot: Json<QuotePlanSnapshot>;
  note: Generated<string>;
  sent_at: Timestamp | null;
  created_by: string | null;
  created_at: Timestamp;
}

export interface QuoteLineTable {
  id: Generated<string>;
  revision_id: string;
  position: number;
  kind: QuoteLineKind;
  description: string;
  part_kind: OfferPartKind | null;
  part_id: string | null;
  offer_id: string | null;
  quantity: NumericText;
  unit_cost: NumericText;
  margin_pct: NumericText | null;
  discount_pct: NumericText | null;
  tax_rate_pct: NumericText | null;
  unit_price: NumericText;
  line_net: NumericText;
}

export interface QuoteEventTable {
  id: Generated<string>;
  quote_id: string;
  revision: number | null;
  kind: string;
  actor_user_id: string | null;
  actor_name: string;
  detail: Generated<string>;
  at: Timestamp;
}

export type QuotePaymentStatus = "open" | "paid" | "failed" | "expired";

export interface QuotePaymentTable {
  id: Generated<string>;
  quote_id: string;
  revision: number;
  checkout_session_id: string;
  payment_intent_id: string | null;
  amount: NumericText;
  currency: string;
  status: ColumnType<QuotePaymentStatus, QuotePaymentStatus | undefined, QuotePaymentStatus>;
  failure_message: string | null;
  created_by: string | null;
  created_at: Timestamp;
  updated_at: Timestamp;
  paid_at: Timestamp | null;
}

export interface PaymentWebhookEventTable {
  event_id: string;
  type: string;
  object_id: string | null;
  outcome: string;
  received_at: Timestamp;
}

export interface QuoteTables {
  quote: QuoteTable;
  quote_revision: QuoteRevisionTable;
  quote_line: QuoteLineTable;
  quote_event: QuoteEventTable;
  quote_payment: QuotePaymentTable;
  payment_webhook_event: PaymentWebhookEventTable;
}

export type Quote = Selectable<QuoteTable>;
export type QuoteRevision = Selectable<QuoteRevisionTable>;
export type QuoteLineRow = Selectable<QuoteLineTable>;
export type QuoteEvent = Selectable<QuoteEventTable>;
export type QuotePayment = Selectable<QuotePaymentTable>;
