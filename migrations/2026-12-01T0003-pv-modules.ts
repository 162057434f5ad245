// The shared module catalogue's nameplate figures (all at STC). Physical quantities are measured
// values, not money, so double precision is the right type. Field readings arrive with a later migration.
import { sql, type Kysely } from "kysely";

export async function up(db: Kysely<any>) {
  await db.schema
    .createTable("pv_module")
    .addColumn("id", "uuid", (c) => c.primaryKey().defaultTo(sql`gen_random_uuid()`))
    .addColumn("maker", "text", (c) => c.notNull())
    .addColumn("model", "text", (c) => c.notNull())
    .addColumn("cell_technology", "text", (c) => c.notNull())
    .addColumn("cells_in_series", "integer", (c) => c.notNull())
    .addColumn("pmax_w", "double precision", (c) => c.notNull())
    .addColumn("vmp_v", "double precision", (c) => c.notNull())
    .addColumn("imp_a", "double precision", (c) => c.notNull())
    .addColumn("voc_v", "double precision", (c) => c.notNull())
    .addColumn("isc_a", "double precision", (c) => c.notNull())
    .addColumn("gamma_pmax_pct_per_c", "double precision", (c) => c.notNull())
    .addColumn("beta_voc_pct_per_c", "double precision", (c) => c.notNull())
    .addColumn("alpha_isc_pct_per_c", "double precision", (c) => c.notNull())
    .addColumn("noct_c", "double precision", (c) => c.notNull())
    .addColumn("length_mm", "double precision", (c) => c.notNull())
    .addColumn("width_mm", "double precision", (c) => c.notNull())
    .addColumn("mass_kg", "double precision", (c) => c.notNull())
    .addColumn("created_at", "timestamptz", (c) => c.notNull().defaultTo(sql`now()`))
    .addColumn("updated_at", "timestamptz", (c) => c.notNull().defaultTo(sql`now()`))
    .addUniqueConstraint("pv_module_maker_model_key", ["maker", "model"])
    .execute();
}

export async function down(db: Kysely<any>) {
  await db.schema.dropTable("pv_module").execute();
}
