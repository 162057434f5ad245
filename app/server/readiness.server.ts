// Readiness: the database answers and every migration in the deployed code has been applied.
import { sql } from "kysely";
import { db } from "./db.server";

const migrationFiles = import.meta.glob("../../migrations/*.ts");
const EXPECTED_MIGRATIONS = Object.keys(migrationFiles)
  .map((path) => path.split("/").pop()!.replace(/\.ts$/, ""))
  .sort();

export async function checkReadiness() {
  try {
    const result = await sql<{ name: string }>`select name from kysely_migration order by name`.execute(db);
    const applied = new Set(result.rows.map((r) => r.name));
    const pending = EXPECTED_MIGRATIONS.filter((name) => !applied.has(name));
    return { database: "reachable" as const, pendingMigrations: pending, ready: pending.length === 0 };
  } catch (error) {
    return { database: "unreachable" as const, pendingMigrations: [], ready: false, detail: error instanceof Error ? error.message : String(error) };
  }
}
