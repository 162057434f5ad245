// CSV import of catalogue parts. The dry run checks every row (the form's rules, repeats inside the
// file, models already in the catalogue) and writes nothing; the import repeats the whole check and
// then writes all rows in one transaction, or none when any row has a problem.
import { sql, type Kysely } from "kysely";
import type { Database } from "../db-schema";
import { isUniqueViolation, partRow } from "./part-save.server";
import { PART_TABLES } from "./part-rows.server";
import type { PartKind } from "~/domain/catalogue/part-kinds";
import { checkCatalogueCsv, type CsvCheck, type ImportReport } from "~/lib/catalogue-csv-check";

export type { ImportReport };

function report(check: CsvCheck): ImportReport {
  const problems = [...check.problems].sort((a, b) => a.row - b.row);
  return { kind: check.kind, rowCount: check.rowCount, readyCount: check.rows.length, fileErrors: check.fileErrors, problems };
}

/** Checks the rows that passed the form's rules against the catalogue (same maker and model, any case). */
async function checkAgainstCatalogue(db: Kysely<Database>, check: CsvCheck) {
  if (!check.rows.length) return;
  const makers = [...new Set(check.rows.map((r) => r.value.maker.toLowerCase()))];
  const existing = await db
    .selectFrom(PART_TABLES[check.kind] as "battery")
    .select(["maker", "model"])
    .where(sql<string>`lower(maker)`, "in", makers)
    .execute();
  const taken = new Set(existing.map((e) => `${e.maker.toLowerCase()}\u0000${e.model.toLowerCase()}`));
  const clean: CsvCheck["rows"] = [];
  for (const r of check.rows) {
    if (taken.has(`${r.value.maker.toLowerCase()}\u0000${r.value.model.toLowerCase()}`)) {
      check.problems.push({
        row: r.row,
        label: `${r.value.maker} ${r.value.model}`,
        errors: [{ column: "model", message: "This maker and model is already in the catalogue: edit it there, or remove the row." }],
      });
    } else clean.push(r);
  }
  check.rows = clean;
}

export async function dryRunImport(db: Kysely<Database>, kind: PartKind, text: string): Promise<ImportReport> {
  const check = checkCatalogueCsv(kind, text);
  if (!check.fileErrors.length) await checkAgainstCatalogue(db, check);
  return report(check);
}

const INSERT_BATCH = 500;

export type ImportOutcome = { ok: true; written: number } | { ok: false; report: ImportReport };

export async function importCatalogueCsv(db: Kysely<Database>, kind: PartKind, text: string): Promise<ImportOutcome> {
  const check = checkCatalogueCsv(kind, text);
  if (!check.fileErrors.length) await checkAgainstCatalogue(db, check);
  if (check.fileErrors.length || check.problems.length) return { ok: false, report: report(check) };
  try {
    await db.transaction().execute(async (trx) => {
      for (let i = 0; i < check.rows.length; i += INSERT_BATCH) {
        const batch = check.rows.slice(i, i + INSERT_BATCH).map((r) => partRow(kind, r.value));
        await trx
          .insertInto(PART_TABLES[kind] as "battery")
          .values(batch as never[])
          .execute();
      }
    });
  } catch (error) {
    if (!isUniqueViolation(error)) throw error;
    // Another curator added one of these models between the check and the write: nothing was written.
    check.fileErrors.push("One of these models was added to the catalogue while you imported; nothing was written. Run the check again.");
    return { ok: false, report: report(check) };
  }
  return { ok: true, written: check.rows.length };
}
