// Runs the Kysely migrations in migrations/ (dated names sort in the order they were written).
import { promises as fs } from "node:fs";
import path from "node:path";
import { fileURLToPath } from "node:url";
import { FileMigrationProvider, Kysely, Migrator, PostgresDialect } from "kysely";
import pg from "pg";

export const migrationFolder = fileURLToPath(new URL("../../migrations", import.meta.url));

export function createMigrator(db: Kysely<any>) {
  return new Migrator({ db, provider: new FileMigrationProvider({ fs, path, migrationFolder }) });
}

export async function migrateToLatest(databaseUrl: string, log: (line: string) => void = console.log) {
  const db = new Kysely<any>({ dialect: new PostgresDialect({ pool: new pg.Pool({ connectionString: databaseUrl, max: 1 }) }) });
  try {
    const { error, results } = await createMigrator(db).migrateToLatest();
    for (const r of results ?? []) log(`migration ${r.migrationName}: ${r.status}`);
    if (error) throw error;
  } finally {
    await db.destroy();
  }
}
