// Team API keys: integrators call /api/v1/* with `Authorization: Bearer <key>` and act as the team.
// Only a SHA-256 hash of the key is stored (keys are 256-bit random, so a fast hash is enough);
// the prefix lets the owner recognise a key in the list.
import { sql, type Kysely } from "kysely";

export async function up(db: Kysely<any>) {
  await db.schema
    .createTable("team_api_key")
    .addColumn("id", "uuid", (c) => c.primaryKey().defaultTo(sql`gen_random_uuid()`))
    .addColumn("team_id", "text", (c) => c.notNull().references("organization.id").onDelete("cascade"))
    .addColumn("name", "text", (c) => c.notNull())
    .addColumn("prefix", "text", (c) => c.notNull())
    .addColumn("key_hash", "text", (c) => c.notNull().unique())
    .addColumn("created_by", "text", (c) => c.references("user.id").onDelete("set null"))
    .addColumn("created_at", "timestamptz", (c) => c.notNull().defaultTo(sql`now()`))
    .addColumn("last_used_at", "timestamptz")
    .addColumn("revoked_at", "timestamptz")
    .execute();
  await db.schema.createIndex("team_api_key_team_idx").on("team_api_key").column("team_id").execute();
}

export async function down(db: Kysely<any>) {
  await db.schema.dropTable("team_api_key").execute();
}
