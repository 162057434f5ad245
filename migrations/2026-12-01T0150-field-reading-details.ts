// Details of a field reading that the first schema left out: the UTC offset the installer gave (to
// show the time as they read it), the sweep's duration (a slow sweep is flagged), and the
// normalisation's working (sun position, clear-sky estimate, uncertainty terms) so the curator
// sees what the engine saw. Also indexes for "my team's readings" and photo access checks, and a
// size guard on stored files (the app checks 5 MiB first; this keeps the rule true in the data).
import { sql, type Kysely } from "kysely";

export async function up(db: Kysely<any>) {
  await db.schema
    .alterTable("field_reading")
    .addColumn("utc_offset_min", "integer")
    .addColumn("sweep_duration_s", "double precision")
    .addColumn("normalisation", "jsonb", (c) => c.notNull().defaultTo(sql`'{}'::jsonb`))
    .execute();
  await db.schema.createIndex("field_reading_team_created_idx").on("field_reading").columns(["team_id", "created_at"]).execute();
  await db.schema.createIndex("field_reading_photo_idx").on("field_reading").column("photo_id").execute();
  await sql`alter table stored_file add constraint stored_file_size_check check (byte_size > 0 and byte_size <= 5242880 and byte_size = octet_length(bytes))`.execute(
    db,
  );
}

export async function down(db: Kysely<any>) {
  await sql`alter table stored_file drop constraint stored_file_size_check`.execute(db);
  await db.schema.dropIndex("field_reading_photo_idx").execute();
  await db.schema.dropIndex("field_reading_team_created_idx").execute();
  await db.schema.alterTable("field_reading").dropColumn("normalisation").dropColumn("sweep_duration_s").dropColumn("utc_offset_min").execute();
}
