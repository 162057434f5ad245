// The rest of the shared catalogue (batteries, charge controllers, inverters), the verified figures
// of modules, field readings with their evidence photo, and every moderation decision.
// Density and ratio columns are generated so that the catalogue can sort and filter on them in SQL.
import { sql, type CreateTableBuilder, type Kysely } from "kysely";

function partColumns(table: CreateTableBuilder<any, any>) {
  return table
    .addColumn("id", "uuid", (c) => c.primaryKey().defaultTo(sql`gen_random_uuid()`))
    .addColumn("maker", "text", (c) => c.notNull())
    .addColumn("model", "text", (c) => c.notNull())
    .addColumn("merged_into", "uuid")
    .addColumn("created_at", "timestamptz", (c) => c.notNull().defaultTo(sql`now()`))
    .addColumn("updated_at", "timestamptz", (c) => c.notNull().defaultTo(sql`now()`));
}

export async function up(db: Kysely<any>) {
  // Modules: merge bookkeeping and the figures derived from approved readings.
  await db.schema
    .alterTable("pv_module")
    .addColumn("merged_into", "uuid", (c) => c.references("pv_module.id"))
    .addColumn("verified_pmax_w", "double precision")
    .addColumn("verified_reading_count", "integer", (c) => c.notNull().defaultTo(0))
    .addColumn("verified_spread_pct", "double precision")
    .addColumn("verified_updated_at", "timestamptz")
    .execute();
  await sql`alter table pv_module
    add column area_m2 double precision generated always as (length_mm * width_mm / 1e6) stored,
    add column nameplate_density_wm2 double precision generated always as (pmax_w / (length_mm * width_mm / 1e6)) stored,
    add column measured_density_wm2 double precision generated always as (verified_pmax_w / (length_mm * width_mm / 1e6)) stored,
    add column verified_ratio double precision generated always as (verified_pmax_w / pmax_w) stored`.execute(db);
  for (const column of ["pmax_w", "nameplate_density_wm2", "measured_density_wm2", "verified_ratio", "verified_reading_count"]) {
    await db.schema.createIndex(`pv_module_${column}_idx`).on("pv_module").column(column).execute();
  }
  await sql`create index pv_module_search_idx on pv_module using gin (to_tsvector('simple', maker || ' ' || model))`.execute(db);

  await partColumns(db.schema.createTable("battery"))
    .addColumn("chemistry", "text", (c) => c.notNull()) // lead-acid-flooded | lead-acid-agm | lead-acid-gel | lifepo4 | nmc
    .addColumn("nominal_voltage_v", "double precision", (c) => c.notNull())
    .addColumn("capacity_ah", "double precision", (c) => c.notNull())
    .addColumn("capacity_hour_rate_h", "double precision", (c) => c.notNull())
    .addColumn("usable_dod_pct", "double precision", (c) => c.notNull())
    .addColumn("cycle_life", "integer", (c) => c.notNull())
    .addColumn("round_trip_efficiency_pct", "double precision", (c) => c.notNull())
    .addColumn("mass_kg", "double precision")
    .addUniqueConstraint("battery_maker_model_key", ["maker", "model"])
    .execute();

  await partColumns(db.schema.createTable("charge_controller"))
    .addColumn("kind", "text", (c) => c.notNull()) // pwm | mppt
    .addColumn("battery_voltages_v", sql`integer[]`, (c) => c.notNull())
    .addColumn("max_pv_voc_v", "double precision", (c) => c.notNull())
    .addColumn("max_charge_current_a", "double precision", (c) => c.notNull())
    // Rated PV power per nominal battery voltage, e.g. {"12": 520, "24": 1040}.
    .addColumn("max_pv_power_w", "jsonb", (c) => c.notNull())
    .addColumn("efficiency_pct", "double precision", (c) => c.notNull().defaultTo(97))
    .addUniqueConstraint("charge_controller_maker_model_key", ["maker", "model"])
    .execute();

  await partColumns(db.schema.createTable("inverter"))
    .addColumn("continuous_w", "double precision", (c) => c.notNull())
    .addColumn("surge_w", "double precision", (c) => c.notNull())
    .addColumn("dc_input_voltage_v", "integer", (c) => c.notNull())
    .addColumn("efficiency_pct", "double precision", (c) => c.notNull())
    .addColumn("idle_draw_w", "double precision", (c) => c.notNull())
    .addUniqueConstraint("inverter_maker_model_key", ["maker", "model"])
    .execute();

  // Evidence photos live in PostgreSQL so that every app instance can serve them.
  await db.schema
    .createTable("stored_file")
    .addColumn("id", "uuid", (c) => c.primaryKey().defaultTo(sql`gen_random_uuid()`))
    .addColumn("uploaded_by", "text", (c) => c.references("user.id").onDelete("set null"))
    .addColumn("content_type", "text", (c) => c.notNull())
    .addColumn("byte_size", "integer", (c) => c.notNull())
    .addColumn("sha256", "text", (c) => c.notNull())
    .addColumn("bytes", "bytea", (c) => c.notNull())
    .addColumn("created_at", "timestamptz", (c) => c.notNull().defaultTo(sql`now()`))
    .execute();

  await db.schema
    .createTable("field_reading")
    .addColumn("id", "uuid", (c) => c.primaryKey().defaultTo(sql`gen_random_uuid()`))
    .addColumn("module_id", "uuid", (c) => c.notNull().references("pv_module.id"))
    .addColumn("submitted_by", "text", (c) => c.references("user.id").onDelete("set null"))
    .addColumn("team_id", "text", (c) => c.references("organization.id").onDelete("set null"))
    .addColumn("status", "text", (c) => c.notNull().defaultTo("pending")) // pending | approved | rejected
    .addColumn("kind", "text", (c) => c.notNull()) // single | sweep
    // As measured
    .addColumn("measured_pmax_w", "double precision", (c) => c.notNull())
    .addColumn("measured_vmp_v", "double precision")
    .addColumn("measured_imp_a", "double precision")
    .addColumn("measured_voc_v", "double precision")
    .addColumn("measured_isc_a", "double precision")
    .addColumn("fill_factor", "double precision")
    .addColumn("sweep", "jsonb") // [{ voltageV, currentA }, …] as uploaded
    // Conditions
    .addColumn("taken_at", "timestamptz", (c) => c.notNull())
    .addColumn("latitude_deg", "double precision", (c) => c.notNull())
    .addColumn("longitude_deg", "double precision", (c) => c.notNull())
    .addColumn("tilt_deg", "double precision", (c) => c.notNull())
    .addColumn("azimuth_deg", "double precision", (c) => c.notNull())
    .addColumn("air_temp_c", "double precision", (c) => c.notNull())
    .addColumn("module_temp_c", "double precision")
    .addColumn("irradiance_wm2", "double precision", (c) => c.notNull())
    .addColumn("irradiance_source", "text", (c) => c.notNull()) // pyranometer | reference-cell | clear-sky-estimate
    .addColumn("instrument", "text", (c) => c.notNull())
    .addColumn("method", "text", (c) => c.notNull())
    .addColumn("photo_id", "uuid", (c) => c.references("stored_file.id"))
    // Normalised to STC by the engine
    .addColumn("cell_temp_c", "double precision", (c) => c.notNull())
    .addColumn("stc_pmax_w", "double precision", (c) => c.notNull())
    .addColumn("uncertainty_pct", "double precision", (c) => c.notNull())
    .addColumn("weight", "double precision", (c) => c.notNull().defaultTo(1))
    .addColumn("flags", "jsonb", (c) => c.notNull().defaultTo(sql`'[]'::jsonb`)) // [{ code, message }]
    .addColumn("created_at", "timestamptz", (c) => c.notNull().defaultTo(sql`now()`))
    .execute();
  await db.schema.createIndex("field_reading_module_status_idx").on("field_reading").columns(["module_id", "status"]).execute();
  await db.schema.createIndex("field_reading_status_created_idx").on("field_reading").columns(["status", "created_at"]).execute();
  await db.schema.createIndex("field_reading_submitted_by_idx").on("field_reading").column("submitted_by").execute();

  await db.schema
    .createTable("reading_decision")
    .addColumn("id", "uuid", (c) => c.primaryKey().defaultTo(sql`gen_random_uuid()`))
    .addColumn("reading_id", "uuid", (c) => c.notNull().references("field_reading.id").onDelete("cascade"))
    .addColumn("decided_by", "text", (c) => c.references("user.id").onDelete("set null"))
    .addColumn("decision", "text", (c) => c.notNull()) // approved | rejected
    .addColumn("reason", "text", (c) => c.notNull())
    .addColumn("decided_at", "timestamptz", (c) => c.notNull().defaultTo(sql`now()`))
    .execute();
  await db.schema.createIndex("reading_decision_reading_idx").on("reading_decision").column("reading_id").execute();
}

export async function down(db: Kysely<any>) {
  for (const table of ["reading_decision", "field_reading", "stored_file", "inverter", "charge_controller", "battery"]) {
    await db.schema.dropTable(table).execute();
  }
  await sql`alter table pv_module drop column area_m2, drop column nameplate_density_wm2, drop column measured_density_wm2, drop column verified_ratio,
    drop column merged_into, drop column verified_pmax_w, drop column verified_reading_count, drop column verified_spread_pct, drop column verified_updated_at`.execute(
    db,
  );
}
