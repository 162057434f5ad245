// Sourcing: a team's suppliers, their offers on catalogue parts, the team's quoting currency and its
// own dated exchange rates. Every money column is `numeric` without a fixed scale, so an amount reads
// back exactly as it was written (the app keeps it a string and does arithmetic in decimal.js).
// An offer's team is tied to its supplier's team by a composite foreign key: an offer can never
// point at another team's supplier, whatever the app does.
import { sql, type Kysely } from "kysely";

const CURRENCY_CHECK = (column: string) => sql.raw(`${column} ~ '^[A-Z]{3}$'`);

export async function up(db: Kysely<any>) {
  await db.schema
    .createTable("team_sourcing_settings")
    .addColumn("team_id", "text", (c) => c.primaryKey().references("organization.id").onDelete("cascade"))
    .addColumn("quoting_currency", "text", (c) => c.notNull().check(CURRENCY_CHECK("quoting_currency")))
    .addColumn("updated_at", "timestamptz", (c) => c.notNull().defaultTo(sql`now()`))
    .execute();

  await db.schema
    .createTable("exchange_rate")
    .addColumn("id", "uuid", (c) => c.primaryKey().defaultTo(sql`gen_random_uuid()`))
    .addColumn("team_id", "text", (c) => c.notNull().references("organization.id").onDelete("cascade"))
    .addColumn("from_currency", "text", (c) => c.notNull().check(CURRENCY_CHECK("from_currency")))
    .addColumn("to_currency", "text", (c) => c.notNull().check(CURRENCY_CHECK("to_currency")))
    // Units of to_currency that one unit of from_currency buys.
    .addColumn("rate", "numeric", (c) => c.notNull().check(sql`rate > 0`))
    .addColumn("as_of", "date", (c) => c.notNull())
    .addColumn("created_by", "text", (c) => c.references("user.id").onDelete("set null"))
    .addColumn("created_at", "timestamptz", (c) => c.notNull().defaultTo(sql`now()`))
    .addCheckConstraint("exchange_rate_pair_check", sql`from_currency <> to_currency`)
    .addUniqueConstraint("exchange_rate_team_pair_date_key", ["team_id", "from_currency", "to_currency", "as_of"])
    .execute();

  await db.schema
    .createTable("supplier")
    .addColumn("id", "uuid", (c) => c.primaryKey().defaultTo(sql`gen_random_uuid()`))
    .addColumn("team_id", "text", (c) => c.notNull().references("organization.id").onDelete("cascade"))
    .addColumn("name", "text", (c) => c.notNull())
    .addColumn("contact", "text", (c) => c.notNull().defaultTo(""))
    .addColumn("currency", "text", (c) => c.notNull().check(CURRENCY_CHECK("currency")))
    .addColumn("shipping_terms", "text", (c) => c.notNull().defaultTo(""))
    // Defaults that a new offer from this supplier starts from.
    .addColumn("default_shipping_per_unit", "numeric", (c) =>
      c
        .notNull()
        .defaultTo(0)
        .check(sql`default_shipping_per_unit >= 0`),
    )
    .addColumn("default_shipping_per_order", "numeric", (c) =>
      c
        .notNull()
        .defaultTo(0)
        .check(sql`default_shipping_per_order >= 0`),
    )
    .addColumn("default_lead_time_days", "integer", (c) => c.check(sql`default_lead_time_days >= 0`))
    .addColumn("notes", "text", (c) => c.notNull().defaultTo(""))
    .addColumn("created_by", "text", (c) => c.references("user.id").onDelete("set null"))
    .addColumn("created_at", "timestamptz", (c) => c.notNull().defaultTo(sql`now()`))
    .addColumn("updated_at", "timestamptz", (c) => c.notNull().defaultTo(sql`now()`))
    .addUniqueConstraint("supplier_id_team_key", ["id", "team_id"])
    .execute();
  await sql`create unique index supplier_team_name_key on supplier (team_id, lower(name))`.execute(db);

  await db.schema
    .createTable("offer")
    .addColumn("id", "uuid", (c) => c.primaryKey().defaultTo(sql`gen_random_uuid()`))
    .addColumn("team_id", "text", (c) => c.notNull().references("organization.id").onDelete("cascade"))
    .addColumn("supplier_id", "uuid", (c) => c.notNull())
    // The catalogue part: part_kind names its table (modules → pv_module, batteries → battery, …).
    .addColumn("part_kind", "text", (c) => c.notNull().check(sql`part_kind in ('modules', 'batteries', 'controllers', 'inverters')`))
    .addColumn("part_id", "uuid", (c) => c.notNull())
    .addColumn("sku", "text", (c) => c.notNull().defaultTo(""))
    .addColumn("currency", "text", (c) => c.notNull().check(CURRENCY_CHECK("currency")))
    .addColumn("unit_price", "numeric", (c) => c.notNull().check(sql`unit_price >= 0`))
    .addColumn("minimum_order", "integer", (c) =>
      c
        .notNull()
        .defaultTo(1)
        .check(sql`minimum_order >= 1`),
    )
    .addColumn("shipping_per_unit", "numeric", (c) =>
      c
        .notNull()
        .defaultTo(0)
        .check(sql`shipping_per_unit >= 0`),
    )
    .addColumn("shipping_per_order", "numeric", (c) =>
      c
        .notNull()
        .defaultTo(0)
        .check(sql`shipping_per_order >= 0`),
    )
    .addColumn("lead_time_days", "integer", (c) => c.check(sql`lead_time_days >= 0`))
    .addColumn("stock", "integer", (c) => c.check(sql`stock >= 0`))
    // The last day the price holds; null = no end date given. Expired offers stay, flagged.
    .addColumn("valid_until", "date")
    .addColumn("notes", "text", (c) => c.notNull().defaultTo(""))
    .addColumn("created_by", "text", (c) => c.references("user.id").onDelete("set null"))
    .addColumn("created_at", "timestamptz", (c) => c.notNull().defaultTo(sql`now()`))
    .addColumn("updated_at", "timestamptz", (c) => c.notNull().defaultTo(sql`now()`))
    .addForeignKeyConstraint("offer_supplier_team_fkey", ["supplier_id", "team_id"], "supplier", ["id", "team_id"], (fk) => fk.onDelete("cascade"))
    // One offer per supplier and part: a re-import replaces the terms instead of piling up copies.
    .addUniqueConstraint("offer_supplier_part_key", ["supplier_id", "part_kind", "part_id"])
    .execute();
  await db.schema.createIndex("offer_team_kind_idx").on("offer").columns(["team_id", "part_kind", "part_id"]).execute();

  await db.schema
    .createTable("offer_price_break")
    .addColumn("offer_id", "uuid", (c) => c.notNull().references("offer.id").onDelete("cascade"))
    .addColumn("min_quantity", "integer", (c) => c.notNull().check(sql`min_quantity >= 2`))
    .addColumn("unit_price", "numeric", (c) => c.notNull().check(sql`unit_price >= 0`))
    .addPrimaryKeyConstraint("offer_price_break_pkey", ["offer_id", "min_quantity"])
    .execute();
}

export async function down(db: Kysely<any>) {
  for (const table of ["offer_price_break", "offer", "supplier", "exchange_rate", "team_sourcing_settings"]) {
    await db.schema.dropTable(table).execute();
  }
}
