// Limits on sign-in and password-reset attempts, kept in PostgreSQL so that every app instance counts
// against the same numbers. `auth_attempt_limit` is ours: one fixed window per bucket (an account's
// e-mail or a client address, both stored as SHA-256 hashes). `rateLimit` is better-auth 1.7.25's own
// table for its built-in limiter on /api/auth/* (SQL from getMigrations(...).compileMigrations()
// with `rateLimit.storage: "database"`, frozen here).
import { sql, type Kysely } from "kysely";

export async function up(db: Kysely<any>) {
  await db.schema
    .createTable("auth_attempt_limit")
    .addColumn("bucket", "text", (c) => c.primaryKey())
    .addColumn("hits", "integer", (c) => c.notNull().check(sql`hits >= 0`))
    .addColumn("window_started_at", "timestamptz", (c) => c.notNull())
    .execute();
  // Pruning deletes windows that ended long ago.
  await db.schema.createIndex("auth_attempt_limit_window_idx").on("auth_attempt_limit").column("window_started_at").execute();
  await sql`create table "rateLimit" ("id" text not null primary key, "key" text not null unique, "count" integer not null, "lastRequest" bigint not null)`.execute(
    db,
  );
}

export async function down(db: Kysely<any>) {
  await db.schema.dropTable("rateLimit").ifExists().execute();
  await db.schema.dropTable("auth_attempt_limit").ifExists().execute();
}
