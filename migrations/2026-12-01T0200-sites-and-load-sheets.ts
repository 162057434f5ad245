// Sites (a customer's place and its monthly climate) and their load sheets. Both belong to a team;
// every query filters by team_id. Monthly climate and appliances are edited as wholes, so they are
// stored as JSON arrays validated by the app's schemas.
import { sql, type Kysely } from "kysely";

export async function up(db: Kysely<any>) {
  await db.schema
    .createTable("site")
    .addColumn("id", "uuid", (c) => c.primaryKey().defaultTo(sql`gen_random_uuid()`))
    .addColumn("team_id", "text", (c) => c.notNull().references("organization.id").onDelete("cascade"))
    .addColumn("name", "text", (c) => c.notNull())
    .addColumn("customer_name", "text", (c) => c.notNull())
    .addColumn("customer_email", "text")
    .addColumn("customer_phone", "text")
    .addColumn("latitude_deg", "double precision", (c) => c.notNull())
    .addColumn("longitude_deg", "double precision", (c) => c.notNull())
    .addColumn("elevation_m", "double precision", (c) => c.notNull().defaultTo(0))
    .addColumn("time_zone", "text", (c) => c.notNull())
    .addColumn("tilt_deg", "double precision", (c) => c.notNull())
    .addColumn("azimuth_deg", "double precision", (c) => c.notNull())
    .addColumn("albedo", "double precision", (c) => c.notNull())
    .addColumn("shading_derate_pct", "double precision", (c) => c.notNull().defaultTo(0))
    .addColumn("coldest_temp_c", "double precision", (c) => c.notNull())
    .addColumn("irradiance_source", "text", (c) => c.notNull()) // measured | clearness-preset
    .addColumn("clearness_preset", "text")
    .addColumn("months", "jsonb", (c) => c.notNull())
    .addColumn("notes", "text", (c) => c.notNull().defaultTo(""))
    .addColumn("created_by", "text", (c) => c.references("user.id").onDelete("set null"))
    .addColumn("created_at", "timestamptz", (c) => c.notNull().defaultTo(sql`now()`))
    .addColumn("updated_at", "timestamptz", (c) => c.notNull().defaultTo(sql`now()`))
    .execute();
  await db.schema.createIndex("site_team_idx").on("site").columns(["team_id", "updated_at"]).execute();

  await db.schema
    .createTable("load_sheet")
    .addColumn("id", "uuid", (c) => c.primaryKey().defaultTo(sql`gen_random_uuid()`))
    .addColumn("team_id", "text", (c) => c.notNull().references("organization.id").onDelete("cascade"))
    .addColumn("site_id", "uuid", (c) => c.notNull().references("site.id").onDelete("cascade"))
    .addColumn("name", "text", (c) => c.notNull())
    .addColumn("appliances", "jsonb", (c) => c.notNull())
    .addColumn("created_by", "text", (c) => c.references("user.id").onDelete("set null"))
    .addColumn("created_at", "timestamptz", (c) => c.notNull().defaultTo(sql`now()`))
    .addColumn("updated_at", "timestamptz", (c) => c.notNull().defaultTo(sql`now()`))
    .execute();
  await db.schema.createIndex("load_sheet_team_site_idx").on("load_sheet").columns(["team_id", "site_id"]).execute();
}

export async function down(db: Kysely<any>) {
  await db.schema.dropTable("load_sheet").execute();
  await db.schema.dropTable("site").execute();
}
