// The comparison on the demo scenario itself, seeded into a scratch database exactly as `npm run seed`
// seeds it (catalogue, field readings normalised by the engine, sourcing): ranked per verified watt,
// QP-150P and FM-120M swap places against the nameplate ranking, for every supplier.
import { Kysely, PostgresDialect } from "kysely";
import pg from "pg";
import { afterAll, beforeAll, describe, expect, it } from "vitest";
import type { Database } from "~/server/db-schema";
import { compareOffers } from "~/server/sourcing/comparison.server";
import { DEFAULT_NEED } from "~/domain/sourcing/comparison-need";
import { compareAmounts, rankBy } from "~/domain/sourcing/ranking";
import type { ModuleComparisonRow } from "~/domain/sourcing/module-rows";
import { dropDatabase, ensureDatabase } from "../../../scripts/lib/postgres-cluster";
import { execFileSync } from "node:child_process";
import { databaseUrl, TEST_PG_PORT } from "../../setup/test-env";
import { seedDemoCatalogue } from "../../../scripts/lib/seed-catalogue";
import { seedDemoReadings } from "../../../scripts/lib/seed-readings";
import { seedDemoSourcing } from "../../../scripts/lib/seed-sourcing";
import { DEMO_USERS } from "../../../data/demo/people";

const SCRATCH = `kitwright_scratch_sourcing_${process.pid}`;
let scratch: Kysely<Database>;
let teamId: string;

beforeAll(async () => {
  await ensureDatabase(TEST_PG_PORT, SCRATCH, { fresh: true });
  // Migrations are TypeScript files: run them through tsx, as the test setup does.
  execFileSync("node_modules/.bin/tsx", ["scripts/migrate.ts"], {
    env: { ...process.env, DATABASE_URL: databaseUrl(SCRATCH) },
    stdio: ["ignore", "ignore", "inherit"],
  });
  scratch = new Kysely<Database>({ dialect: new PostgresDialect({ pool: new pg.Pool({ connectionString: databaseUrl(SCRATCH), max: 2 }) }) });
  // The demo people and teams, written directly (the readings name their submitters by e-mail).
  const now = new Date();
  teamId = "team-tallowmere";
  await scratch
    .insertInto("organization")
    .values({ id: teamId, name: "Tallowmere Power Works", slug: "tallowmere-power-works", logo: null, createdAt: now, metadata: null })
    .execute();
  for (const [i, person] of DEMO_USERS.entries()) {
    const userId = `user-${i}`;
    await scratch
      .insertInto("user")
      .values({
        id: userId,
        name: person.name,
        email: person.email,
        emailVerified: true,
        image: null,
        createdAt: now,
        updatedAt: now,
        role: person.role,
        banned: false,
        banReason: null,
        banExpires: null,
      })
      .execute();
    if (person.team?.slug === "tallowmere-power-works")
      await scratch
        .insertInto("member")
        .values({ id: `member-${i}`, organizationId: teamId, userId, role: person.team.membership, createdAt: now })
        .execute();
  }
  await seedDemoCatalogue(scratch, () => {});
  await seedDemoReadings(scratch, () => {});
  await seedDemoSourcing(scratch, () => {});
}, 120_000);

afterAll(async () => {
  await scratch?.destroy();
  await dropDatabase(TEST_PG_PORT, SCRATCH);
});

const need = { ...DEFAULT_NEED, quantity: null, source: { kind: "typed" as const } };
const order = (rows: ModuleComparisonRow[]) => rows.map((r) => r.model);

describe("the demo scenario's module comparison", () => {
  it("rests on the demo readings: QP-150P verifies near 84 % of nameplate, FM-120M near 99 %", async () => {
    const { rows } = await compareOffers(scratch, teamId, "modules", need);
    const qp = rows.find((r) => r.model === "QP-150P")!;
    const fm = rows.find((r) => r.model === "FM-120M")!;
    expect(qp.verifiedRatio).toBeGreaterThan(0.8);
    expect(qp.verifiedRatio).toBeLessThan(0.88);
    expect(fm.verifiedRatio).toBeGreaterThan(0.95);
    expect(fm.readingCount).toBeGreaterThan(0);
  });

  it("ranks per verified watt in the reverse order of per nameplate watt, for every supplier", async () => {
    const { rows } = await compareOffers(scratch, teamId, "modules", need);
    const pair = rows.filter((r) => r.model === "QP-150P" || r.model === "FM-120M");
    const suppliers = [...new Set(pair.map((r) => r.supplierName))].filter((s) => pair.filter((r) => r.supplierName === s).length === 2);
    expect(suppliers.length).toBeGreaterThanOrEqual(2);
    for (const supplier of suppliers) {
      const both = pair.filter((r) => r.supplierName === supplier);
      expect(order(rankBy(both, (r) => r.pricePerNameplateW)), supplier).toEqual(["QP-150P", "FM-120M"]);
      expect(order(rankBy(both, (r) => r.pricePerVerifiedW)), supplier).toEqual(["FM-120M", "QP-150P"]);
    }
    // Across all suppliers too: every QP-150P offer beats every FM-120M offer per nameplate watt,
    // and loses to every one of them per verified watt.
    const byNameplate = order(rankBy(pair, (r) => r.pricePerNameplateW));
    const byVerified = order(rankBy(pair, (r) => r.pricePerVerifiedW));
    const qpCount = pair.filter((r) => r.model === "QP-150P").length;
    expect(byNameplate.slice(0, qpCount).every((m) => m === "QP-150P")).toBe(true);
    expect(byVerified.slice(-qpCount).every((m) => m === "QP-150P")).toBe(true);
  });

  it("leaves the expired offer out and converts the pound offers with the team's rate", async () => {
    const { rows, expiredCount } = await compareOffers(scratch, teamId, "modules", need);
    expect(expiredCount).toBe(1);
    expect(rows.some((r) => r.supplierName === "Carrick & Dunmore Components" && r.model === "QP-150P")).toBe(false);
    const gbp = rows.find((r) => r.supplierName === "Carrick & Dunmore Components" && r.model === "FM-120M")!;
    expect(gbp.rate).toMatchObject({ from: "GBP", to: "EUR", rate: "1.1725" });
    // 41.20 GBP × 1.1725 = 48.307 EUR a unit
    expect(gbp.unitPrice).toEqual({ amount: "48.307", currency: "EUR" });
    expect(gbp.offerUnitPrice).toEqual({ amount: "41.2", currency: "GBP" });
  });

  it("shows LiFePO4 dearer per usable kWh but cheaper per cycled kWh than AGM lead-acid", async () => {
    const { rows } = await compareOffers(scratch, teamId, "batteries", { ...need, quantity: 4 });
    const lfp = rows.find((r) => r.model === "WP-LFP12-100" && r.supplierName === "Vell Valley Electrical Wholesale")!;
    const agm = rows.find((r) => r.model === "KS-100AGM" && r.supplierName === "Vell Valley Electrical Wholesale")!;
    expect(compareAmounts(lfp.pricePerUsableKWh, agm.pricePerUsableKWh)).toBe(1); // 429 ÷ 1.152 = 372.40 vs 189 ÷ 0.6 = 315.00
    expect(compareAmounts(lfp.pricePerCycleKWh, agm.pricePerCycleKWh)).toBe(-1); // 0.0931 vs 0.5250
    // Cells sold in twelves: 4 needed, 12 bought.
    expect(rows.find((r) => r.model === "KS-1000F2")!.quantityBought).toBe(12);
  });

  it("seeds idempotently", async () => {
    const before = await scratch.selectFrom("offer").select("id").execute();
    await seedDemoSourcing(scratch, () => {});
    expect(await scratch.selectFrom("offer").select("id").execute()).toHaveLength(before.length);
    expect(await scratch.selectFrom("supplier").select("id").execute()).toHaveLength(3);
  });
});
