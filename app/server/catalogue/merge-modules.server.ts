// Merging a duplicate module model into the one that stays: its readings (every status) move to the
// survivor, it is marked merged (hidden from lists; its page points to the survivor), earlier
// duplicates of it follow, and both modules' verified figures are recomputed — all in the caller's
// transaction so a failure leaves nothing half-moved.
import { sql, type Transaction } from "kysely";
import type { Database } from "../db-schema";
import { recomputeVerifiedFigures } from "./verified-figures.server";

export type MergeOutcome =
  | { ok: true; movedReadings: number; survivor: { verifiedPmaxW: number | null; readingCount: number; spreadPct: number | null } }
  | { ok: false; field: "survivorId" | "duplicate"; message: string };

export async function mergeModules(trx: Transaction<Database>, duplicateId: string, survivorId: string): Promise<MergeOutcome> {
  if (duplicateId === survivorId) return { ok: false, field: "survivorId", message: "Pick a different model: a model cannot be merged into itself." };
  // Lock both rows in a fixed order so two curators merging the same pair cannot deadlock.
  const rows = await trx.selectFrom("pv_module").select(["id", "merged_into"]).where("id", "in", [duplicateId, survivorId]).orderBy("id").forUpdate().execute();
  const duplicate = rows.find((r) => r.id === duplicateId);
  const survivor = rows.find((r) => r.id === survivorId);
  if (!duplicate) return { ok: false, field: "duplicate", message: "The duplicate is no longer in the catalogue." };
  if (duplicate.merged_into) return { ok: false, field: "duplicate", message: "This model was already merged into another one." };
  if (!survivor) return { ok: false, field: "survivorId", message: "The model to keep is not in the catalogue." };
  if (survivor.merged_into) return { ok: false, field: "survivorId", message: "That model was itself merged away; pick the model it was merged into." };

  const moved = await trx.updateTable("field_reading").set({ module_id: survivorId }).where("module_id", "=", duplicateId).executeTakeFirst();
  await trx
    .updateTable("pv_module")
    .set({ merged_into: survivorId, updated_at: sql`now()` })
    .where("merged_into", "=", duplicateId)
    .execute();
  await trx
    .updateTable("pv_module")
    .set({ merged_into: survivorId, updated_at: sql`now()` })
    .where("id", "=", duplicateId)
    .execute();
  const figures = await recomputeVerifiedFigures(trx, survivorId);
  await recomputeVerifiedFigures(trx, duplicateId);
  return { ok: true, movedReadings: Number(moved.numUpdatedRows), survivor: figures };
}
