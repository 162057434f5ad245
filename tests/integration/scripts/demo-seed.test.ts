// npm run seed, whole: people, teams, catalogue, readings, sourcing, plans and quotes loaded into an
// empty scratch database, then loaded again. The second run adds nothing to any table.
import { spawnSync } from "node:child_process";
import { afterAll, beforeAll, describe, expect, it } from "vitest";
import { DEMO_TEAMS, DEMO_USERS } from "../../../data/demo/people";
import { dropDatabase, ensureDatabase } from "../../../scripts/lib/postgres-cluster";
import { databaseUrl, TEST_PG_PORT } from "../../setup/test-env";
import { openDatabase, type RowCounts } from "../../production/helpers/row-counts";

const SCRATCH = `kitwright_scratch_seed_${process.pid}`;
const url = databaseUrl(SCRATCH);

function runScript(script: string) {
  const result = spawnSync("node_modules/.bin/tsx", [script], { encoding: "utf8", env: { ...process.env, DATABASE_URL: url } });
  if (result.status !== 0) throw new Error(`${script} failed (${result.status}):\n${result.stdout}${result.stderr}`);
  return result.stdout;
}

let database: Awaited<ReturnType<typeof openDatabase>>;

beforeAll(async () => {
  await ensureDatabase(TEST_PG_PORT, SCRATCH, { fresh: true });
  runScript("scripts/migrate.ts");
  database = await openDatabase(url);
}, 120_000);

afterAll(async () => {
  await database?.close();
  await dropDatabase(TEST_PG_PORT, SCRATCH);
});

describe("npm run seed", () => {
  it("loads the whole demo scenario once, and a second run adds no row to any table", { timeout: 240_000 }, async () => {
    const empty = await database.rowCounts();
    expect(empty.user).toBe(0);

    const firstOutput = runScript("scripts/seed.ts");
    const first = await database.rowCounts();
    expect(firstOutput).toContain("Demo data is in place.");
    expect(first.user).toBe(DEMO_USERS.length);
    expect(first.organization).toBe(DEMO_TEAMS.length);
    // Every part of the scenario is there, so that "unchanged" below means something.
    const filled = (counts: RowCounts) => Object.keys(counts).filter((t) => counts[t] > 0);
    for (const table of ["member", "pv_module", "supplier", "offer", "site", "kit_plan", "quote"]) {
      expect(filled(first), table).toContain(table);
    }

    runScript("scripts/seed.ts");
    const second = await database.rowCounts();
    expect(second).toEqual(first);
  });
});
