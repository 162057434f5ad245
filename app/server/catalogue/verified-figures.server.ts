// A module's verified figures, recomputed from its approved readings. Called inside the transaction
// that approves, rejects or moves readings (moderation, merging models), so they never disagree.
import type { Kysely, Transaction } from "kysely";
import type { Database } from "../db-schema";
import { median, scaledMad, weightedMedian } from "~/domain/catalogue/robust-stats";

export async function recomputeVerifiedFigures(db: Kysely<Database> | Transaction<Database>, moduleId: string) {
  const readings = await db
    .selectFrom("field_reading")
    .select(["stc_pmax_w", "weight"])
    .where("module_id", "=", moduleId)
    .where("status", "=", "approved")
    .execute();
  const values = readings.map((r) => r.stc_pmax_w);
  const verified = values.length
    ? weightedMedian(
        values,
        readings.map((r) => r.weight),
      )
    : null;
  // Spread as a share of the central value (scaled MAD / median), shown beside the count.
  const spreadPct = values.length >= 2 ? (100 * scaledMad(values)) / median(values) : null;
  await db
    .updateTable("pv_module")
    .set({ verified_pmax_w: verified, verified_reading_count: values.length, verified_spread_pct: spreadPct, verified_updated_at: new Date() })
    .where("id", "=", moduleId)
    .execute();
  return { verifiedPmaxW: verified, readingCount: values.length, spreadPct };
}
