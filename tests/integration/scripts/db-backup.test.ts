// npm run db:backup and db:restore: a backup of the integration database restored into a fresh one
// holds the same rows; a database that already holds tables is not overwritten without --force.
import { spawnSync } from "node:child_process";
import { existsSync, mkdtempSync, rmSync, statSync } from "node:fs";
import { tmpdir } from "node:os";
import { join } from "node:path";
import pg from "pg";
import { afterAll, beforeAll, describe, expect, it } from "vitest";
import { installerWithTeam, createTestModule } from "../helpers/fixtures";
import { addOffer, addSupplier, offerForm } from "../sourcing/helpers";
import { dropDatabase } from "../../../scripts/lib/postgres-cluster";
import { databaseUrl, TEST_PG_PORT } from "../../setup/test-env";

const sourceUrl = process.env.DATABASE_URL!;
const restoredName = `kitwright_restore_${process.pid}`;
const restoredUrl = databaseUrl(restoredName);
const dir = mkdtempSync(join(tmpdir(), "kw-backup-"));
const file = join(dir, "kitwright.dump");

function runScript(script: string, args: string[]) {
  const result = spawnSync("node_modules/.bin/tsx", [script, ...args], { encoding: "utf8", env: { ...process.env, DATABASE_URL: sourceUrl } });
  return { status: result.status, output: `${result.stdout}${result.stderr}` };
}

async function snapshot(url: string) {
  const client = new pg.Client({ connectionString: url });
  await client.connect();
  try {
    const tables = (await client.query<{ name: string }>("select tablename as name from pg_tables where schemaname = 'public' order by 1")).rows.map(
      (r) => r.name,
    );
    const counts: Record<string, number> = {};
    for (const table of tables) counts[table] = (await client.query(`select count(*)::int as n from "${table}"`)).rows[0].n;
    // Every column of every row, in a fixed order: any lost or altered value changes the digest.
    const checksums: Record<string, string> = {};
    for (const table of ["user", "account", "pv_module", "offer", "kysely_migration"]) {
      checksums[table] = (await client.query(`select md5(coalesce(string_agg(t::text, '|' order by t::text), '')) as d from "${table}" t`)).rows[0].d;
    }
    return { counts, checksums };
  } finally {
    await client.end();
  }
}

beforeAll(async () => {
  // Rows in the tables compared below, whatever else ran before this file.
  const owner = await installerWithTeam("backup");
  const module = await createTestModule("backup");
  const supplierId = await addSupplier(owner.client, "Backup Supply Co");
  await addOffer(owner.client, offerForm(supplierId, module.id));
  await dropDatabase(TEST_PG_PORT, restoredName);
});

afterAll(async () => {
  await dropDatabase(TEST_PG_PORT, restoredName);
  rmSync(dir, { recursive: true, force: true });
});

describe("backup and restore", () => {
  it("restores a backup into a new database with the same rows", async () => {
    const backup = runScript("scripts/db-backup.ts", [file]);
    expect(backup.status, backup.output).toBe(0);
    expect(statSync(file).size).toBeGreaterThan(0);
    expect(existsSync(`${file}.partial`)).toBe(false);

    const restore = runScript("scripts/db-restore.ts", [file, "--to", restoredUrl]);
    expect(restore.status, restore.output).toBe(0);

    const [source, restored] = await Promise.all([snapshot(sourceUrl), snapshot(restoredUrl)]);
    expect(Object.keys(restored.counts)).toEqual(Object.keys(source.counts));
    expect(restored.counts).toEqual(source.counts);
    for (const table of ["user", "pv_module", "offer"]) expect(source.counts[table]).toBeGreaterThan(0);
    expect(restored.checksums).toEqual(source.checksums);
  });

  it("refuses to overwrite a database that holds tables, and replaces it with --force", async () => {
    const client = new pg.Client({ connectionString: restoredUrl });
    await client.connect();
    await client.query("delete from offer");
    await client.end();

    const refused = runScript("scripts/db-restore.ts", [file, `--to=${restoredUrl}`]);
    expect(refused.status).toBe(1);
    expect(refused.output).toMatch(/already holds \d+ tables: not overwriting it/);
    expect((await snapshot(restoredUrl)).counts.offer).toBe(0);

    const forced = runScript("scripts/db-restore.ts", [file, `--to=${restoredUrl}`, "--force"]);
    expect(forced.status, forced.output).toBe(0);
    expect((await snapshot(restoredUrl)).checksums).toEqual((await snapshot(sourceUrl)).checksums);
  });

  it("says so when the file is not a backup", () => {
    const result = runScript("scripts/db-restore.ts", ["package.json", "--to", restoredUrl]);
    expect(result.status).toBe(2);
    expect(result.output).toMatch(/not a pg_dump custom-format backup/);
  });
});
