// Quotes: a team's priced offer to its customer, built from a saved kit plan. Each revision keeps its
// own lines and totals (numeric, never float) and a snapshot of the plan figures it was priced from,
// so a sent revision reads the same forever. Events record every status change with time and actor;
// payments and received webhook events make the deposit idempotent (one row per Checkout Session,
// one per Stripe event id).
import { sql, type Kysely } from "kysely";

const STATUSES = "('draft', 'sent', 'viewed', 'approved', 'declined', 'expired', 'withdrawn', 'deposit_paid')";

export async function up(db: Kysely<any>) {
  await db.schema
    .createTable("quote")
    .addColumn("id", "uuid", (c) => c.primaryKey().defaultTo(sql`gen_random_uuid()`))
    .addColumn("team_id", "text", (c) => c.notNull().references("organization.id").onDelete("cascade"))
    // The team's own running number, shown as Q-0001.
    .addColumn("number", "integer", (c) => c.notNull().check(sql`number > 0`))
    .addColumn("plan_id", "uuid", (c) => c.notNull().references("kit_plan.id").onDelete("restrict"))
    .addColumn("title", "text", (c) => c.notNull())
    .addColumn("customer_name", "text", (c) => c.notNull())
    .addColumn("customer_email", "text", (c) => c.notNull())
    // Set when the quote is first sent: the account (created or reused) that may read it.
    .addColumn("customer_user_id", "text", (c) => c.references("user.id").onDelete("set null"))
    .addColumn("currency", "text", (c) => c.notNull().check(sql`currency ~ '^[A-Z]{3}$'`))
    .addColumn("status", "text", (c) =>
      c
        .notNull()
        .defaultTo("draft")
        .check(sql.raw(`status in ${STATUSES}`)),
    )
    .addColumn("latest_revision", "integer", (c) => c.notNull().defaultTo(1))
    // The revision the customer sees (the latest one sent); null until the first send.
    .addColumn("sent_revision", "integer")
    // SHA-256 of the link token in the last e-mail: it lets a new customer choose a first password.
    .addColumn("access_token_hash", "text")
    .addColumn("decided_name", "text")
    .addColumn("decision_comment", "text")
    .addColumn("decided_at", "timestamptz")
    .addColumn("created_by", "text", (c) => c.references("user.id").onDelete("set null"))
    .addColumn("created_at", "timestamptz", (c) => c.notNull().defaultTo(sql`now()`))
    .addColumn("updated_at", "timestamptz", (c) => c.notNull().defaultTo(sql`now()`))
    .addUniqueConstraint("quote_team_number_key", ["team_id", "number"])
    .execute();
  await db.schema.createIndex("quote_team_updated_idx").on("quote").columns(["team_id", "updated_at"]).execute();
  await db.schema.createIndex("quote_customer_idx").on("quote").column("customer_user_id").execute();

  await db.schema
    .createTable("quote_revision")
    .addColumn("id", "uuid", (c) => c.primaryKey().defaultTo(sql`gen_random_uuid()`))
    .addColumn("quote_id", "uuid", (c) => c.notNull().references("quote.id").onDelete("cascade"))
    .addColumn("revision", "integer", (c) => c.notNull())
    .addColumn("plan_revision", "integer", (c) => c.notNull())
    // Quote-wide margin, discount and tax rate: a line without its own uses these.
    .addColumn("margin_pct", "numeric", (c) => c.notNull().check(sql`margin_pct >= 0 and margin_pct <= 1000`))
    .addColumn("discount_pct", "numeric", (c) => c.notNull().check(sql`discount_pct >= 0 and discount_pct <= 100`))
    .addColumn("tax_rate_pct", "numeric", (c) => c.notNull().check(sql`tax_rate_pct >= 0 and tax_rate_pct <= 100`))
    .addColumn("deposit_pct", "numeric", (c) => c.notNull().check(sql`deposit_pct > 0 and deposit_pct <= 100`))
    .addColumn("valid_until", "date", (c) => c.notNull())
    .addColumn("terms", "text", (c) => c.notNull().defaultTo(""))
    // Totals as computed by app/domain/money/quote-totals.ts when the revision was saved.
    .addColumn("net", "numeric", (c) => c.notNull())
    .addColumn("tax", "numeric", (c) => c.notNull())
    .addColumn("gross", "numeric", (c) => c.notNull())
    .addColumn("deposit", "numeric", (c) => c.notNull())
    // [{ ratePct, net, tax }] as decimal text.
    .addColumn("tax_bands", "jsonb", (c) => c.notNull())
    // What the customer reads about the kit: energy per month against loads, key checks, cautions.
    .addColumn("plan_snapshot", "jsonb", (c) => c.notNull())
    .addColumn("note", "text", (c) => c.notNull().defaultTo(""))
    .addColumn("sent_at", "timestamptz")
    .addColumn("created_by", "text", (c) => c.references("user.id").onDelete("set null"))
    .addColumn("created_at", "timestamptz", (c) => c.notNull().defaultTo(sql`now()`))
    .addUniqueConstraint("quote_revision_quote_revision_key", ["quote_id", "revision"])
    .execute();

  await db.schema
    .createTable("quote_line")
    .addColumn("id", "uuid", (c) => c.primaryKey().defaultTo(sql`gen_random_uuid()`))
    .addColumn("revision_id", "uuid", (c) => c.notNull().references("quote_revision.id").onDelete("cascade"))
    .addColumn("position", "integer", (c) => c.notNull())
    .addColumn("kind", "text", (c) => c.notNull().check(sql`kind in ('part', 'labour', 'mounting', 'freight', 'extra')`))
    .addColumn("description", "text", (c) => c.notNull())
    .addColumn("part_kind", "text", (c) => c.check(sql`part_kind in ('modules', 'batteries', 'controllers', 'inverters')`))
    .addColumn("part_id", "uuid")
    .addColumn("offer_id", "uuid", (c) => c.references("offer.id").onDelete("set null"))
    .addColumn("quantity", "numeric", (c) => c.notNull().check(sql`quantity > 0`))
    .addColumn("unit_cost", "numeric", (c) => c.notNull().check(sql`unit_cost >= 0`))
    // Null: the revision's own margin, discount or tax rate applies.
    .addColumn("margin_pct", "numeric", (c) => c.check(sql`margin_pct >= 0 and margin_pct <= 1000`))
    .addColumn("discount_pct", "numeric", (c) => c.check(sql`discount_pct >= 0 and discount_pct <= 100`))
    .addColumn("tax_rate_pct", "numeric", (c) => c.check(sql`tax_rate_pct >= 0 and tax_rate_pct <= 100`))
    .addColumn("unit_price", "numeric", (c) => c.notNull())
    .addColumn("line_net", "numeric", (c) => c.notNull())
    .addUniqueConstraint("quote_line_revision_position_key", ["revision_id", "position"])
    .execute();

  await db.schema
    .createTable("quote_event")
    .addColumn("id", "uuid", (c) => c.primaryKey().defaultTo(sql`gen_random_uuid()`))
    .addColumn("quote_id", "uuid", (c) => c.notNull().references("quote.id").onDelete("cascade"))
    .addColumn("revision", "integer")
    .addColumn("kind", "text", (c) => c.notNull())
    .addColumn("actor_user_id", "text", (c) => c.references("user.id").onDelete("set null"))
    // Kept as text so the timeline still names a person (or "Payments") after an account goes.
    .addColumn("actor_name", "text", (c) => c.notNull())
    .addColumn("detail", "text", (c) => c.notNull().defaultTo(""))
    .addColumn("at", "timestamptz", (c) => c.notNull().defaultTo(sql`clock_timestamp()`))
    .execute();
  await db.schema.createIndex("quote_event_quote_idx").on("quote_event").columns(["quote_id", "at"]).execute();

  await db.schema
    .createTable("quote_payment")
    .addColumn("id", "uuid", (c) => c.primaryKey().defaultTo(sql`gen_random_uuid()`))
    .addColumn("quote_id", "uuid", (c) => c.notNull().references("quote.id").onDelete("restrict"))
    .addColumn("revision", "integer", (c) => c.notNull())
    .addColumn("checkout_session_id", "text", (c) => c.notNull().unique())
    .addColumn("payment_intent_id", "text")
    .addColumn("amount", "numeric", (c) => c.notNull().check(sql`amount > 0`))
    .addColumn("currency", "text", (c) => c.notNull())
    .addColumn("status", "text", (c) =>
      c
        .notNull()
        .defaultTo("open")
        .check(sql`status in ('open', 'paid', 'failed', 'expired')`),
    )
    .addColumn("failure_message", "text")
    .addColumn("created_by", "text", (c) => c.references("user.id").onDelete("set null"))
    .addColumn("created_at", "timestamptz", (c) => c.notNull().defaultTo(sql`now()`))
    .addColumn("updated_at", "timestamptz", (c) => c.notNull().defaultTo(sql`now()`))
    .addColumn("paid_at", "timestamptz")
    .execute();
  await db.schema.createIndex("quote_payment_quote_idx").on("quote_payment").column("quote_id").execute();
  // At most one paid deposit per quote, whatever order webhooks arrive in.
  await sql`create unique index quote_payment_one_paid_key on quote_payment (quote_id) where status = 'paid'`.execute(db);

  await db.schema
    .createTable("payment_webhook_event")
    .addColumn("event_id", "text", (c) => c.primaryKey())
    .addColumn("type", "text", (c) => c.notNull())
    .addColumn("object_id", "text")
    .addColumn("outcome", "text", (c) => c.notNull())
    .addColumn("received_at", "timestamptz", (c) => c.notNull().defaultTo(sql`now()`))
    .execute();
}

export async function down(db: Kysely<any>) {
  await db.schema.dropTable("payment_webhook_event").execute();
  await db.schema.dropTable("quote_payment").execute();
  await db.schema.dropTable("quote_event").execute();
  await db.schema.dropTable("quote_line").execute();
  await db.schema.dropTable("quote_revision").execute();
  await db.schema.dropTable("quote").execute();
}
