// The benchmark's bulk seed sets verified figures in one SQL pass; they must agree with
// recomputeVerifiedFigures, which the app uses whenever readings change.
import { describe, expect, it } from "vitest";
import { sql } from "kysely";
import { db } from "~/server/db.server";
import { recomputeVerifiedFigures } from "~/server/catalogue/verified-figures.server";
import { validateModuleNameplate } from "~/domain/catalogue/module-validation";
import { moduleItem } from "~/server/catalogue/part-rows.server";
import { seedScale, SCALE_MAKER_PREFIX } from "../../../scripts/lib/seed-scale";

describe("scale seed", () => {
  it("makes 10 readings per model on average, all approved, with verified figures equal to recomputeVerifiedFigures", async () => {
    const first = await seedScale(db, 40, () => {});
    // Another run (or an earlier test file) may have made some of them already: the seed is idempotent.
    const again = await seedScale(db, 40, () => {});
    expect(again).toEqual({ modules: 0, readings: 0 });
    if (first.modules === 40) expect(first.readings).toBe(400);

    const modules = await db.selectFrom("pv_module").selectAll().where("maker", "like", `${SCALE_MAKER_PREFIX} %`).where("model", "like", "GM-0000%").execute();
    expect(modules.length).toBe(40);
    const invalid = modules
      .map((m) => [m.model, validateModuleNameplate({ ...moduleItem(m), maker: m.maker, model: m.model })] as const)
      .filter(([, issues]) => Object.keys(issues).length);
    expect(invalid).toEqual([]);

    const withReadings = modules.filter((m) => m.verified_reading_count > 0);
    expect(withReadings.length).toBe(36);
    for (const m of withReadings.slice(0, 12)) {
      const sqlFigures = { pmax: m.verified_pmax_w, count: m.verified_reading_count, spread: m.verified_spread_pct };
      const app = await recomputeVerifiedFigures(db, m.id);
      expect(app.readingCount).toBe(sqlFigures.count);
      expect(app.verifiedPmaxW).toBeCloseTo(sqlFigures.pmax!, 9);
      expect(app.spreadPct).toBeCloseTo(sqlFigures.spread!, 9);
    }
    const { rows } = await sql<{ weights: number[]; statuses: string[] }>`
      select array_agg(distinct weight) as weights, array_agg(distinct status) as statuses
      from field_reading where module_id = any(${modules.map((m) => m.id)}::uuid[])`.execute(db);
    expect(rows[0]).toEqual({ weights: [1], statuses: ["approved"] });
  });
});
