// CSV import: the check lists every row's problems and writes nothing; the import writes every row
// in one transaction, or none.
import { sql } from "kysely";
import { describe, expect, it } from "vitest";
import { userWithRole } from "../helpers/fixtures";
import { uniqueMaker } from "./catalogue-fixtures";
import * as importPage from "~/routes/catalogue.import";
import { csvTemplate } from "~/lib/catalogue-csv-columns";
import { db } from "~/server/db.server";

const HEADER = csvTemplate("modules").trim();

function row(maker: string, model: string, figures = "mono-PERC,36,100,18.6,5.38,22.4,5.75,-0.39,-0.29,0.05,noct,45,1010,665,6.9") {
  return `${maker},${model},${figures}`;
}

async function count(maker: string) {
  const { n } = await db
    .selectFrom("pv_module")
    .select((eb) => eb.fn.countAll<number>().as("n"))
    .where("maker", "=", maker)
    .executeTakeFirstOrThrow();
  return Number(n);
}

describe("CSV import of modules", () => {
  it("dry run: reports each bad row by number and column, and writes nothing", async () => {
    const curator = await userWithRole("curator", "csv-dry");
    const maker = uniqueMaker("csvdry");
    const csv = [
      HEADER,
      row(maker, "A-1"),
      row(maker, "A-2", "mono-PERC,36,100,23.0,5.38,22.4,5.75,-0.39,-0.29,0.05,noct,45,1010,665,6.9"), // Vmp above Voc
      row(maker, "A-3"),
      row(maker, "A-4", "mono-PERC,36,100,18.6,5.38,22.4,5.75,0.39,-0.29,0.05,noct,45,101,665,6.9"), // γ sign, length in cm
      row(maker, "A-1"), // repeats row 2
    ].join("\n");
    const result = await curator.client.action(importPage, "/catalogue/import", { kind: "modules", intent: "check", csvText: csv });
    expect(result.status).toBe(200);
    const report = result.data.report;
    expect(report).toMatchObject({ kind: "modules", rowCount: 5, readyCount: 2, fileErrors: [] });
    expect(report.problems.map((p: { row: number }) => p.row)).toEqual([3, 5, 6]);
    expect(report.problems[0].errors).toEqual([{ column: "vmp_v", message: expect.stringMatching(/Vmp must be below Voc/) }]);
    expect(report.problems[1].errors.map((e: { column: string }) => e.column).sort()).toEqual(["gamma_pmax_pct_per_c", "length_mm"]);
    expect(report.problems[2].errors).toEqual([{ column: "model", message: "The same maker and model is already on row 2." }]);
    expect(await count(maker)).toBe(0);
  });

  it("writes every row of a clean file, and reports rows already in the catalogue", async () => {
    const curator = await userWithRole("curator", "csv-clean");
    const maker = uniqueMaker("csvclean");
    const csv = [HEADER, row(maker, "C-1"), row(maker, "C-2"), row(maker, "C-3")].join("\n");
    const checked = await curator.client.action(importPage, "/catalogue/import", { kind: "modules", intent: "check", csvText: csv });
    expect(checked.data.report).toMatchObject({ rowCount: 3, readyCount: 3, problems: [] });
    expect(await count(maker)).toBe(0);

    const imported = await curator.client.action(importPage, "/catalogue/import", { kind: "modules", intent: "import", csvText: csv });
    expect(imported.status).toBe(302);
    expect(imported.location).toBe("/catalogue?kind=modules");
    const rows = await db.selectFrom("pv_module").select(["model", "pmax_w", "vmp_v", "length_mm"]).where("maker", "=", maker).orderBy("model").execute();
    expect(rows).toEqual(["C-1", "C-2", "C-3"].map((model) => ({ model, pmax_w: 100, vmp_v: 18.6, length_mm: 1010 })));

    const again = await curator.client.action(importPage, "/catalogue/import", {
      kind: "modules",
      intent: "check",
      csvText: csv.replace(maker, maker.toUpperCase()),
    });
    expect(again.data.report.problems.map((p: { row: number; errors: { message: string }[] }) => [p.row, p.errors[0].message])).toEqual([
      [2, "This maker and model is already in the catalogue: edit it there, or remove the row."],
      [3, "This maker and model is already in the catalogue: edit it there, or remove the row."],
      [4, "This maker and model is already in the catalogue: edit it there, or remove the row."],
    ]);
  });

  it("writes none of a file with one bad row, even when asked to import straight away", async () => {
    const curator = await userWithRole("curator", "csv-one-bad");
    const maker = uniqueMaker("csvbad");
    const csv = [
      HEADER,
      row(maker, "D-1"),
      row(maker, "D-2"),
      row(maker, "D-3", "mono-PERC,36,100,18.6,5.38,22.4,5.75,-0.39,-0.29,0.05,noct,45,1010,665,abc"),
      row(maker, "D-4"),
    ].join("\n");
    const result = await curator.client.action(importPage, "/catalogue/import", { kind: "modules", intent: "import", csvText: csv });
    expect(result.status).toBe(400);
    expect(result.data.report.problems).toEqual([{ row: 4, label: `${maker} D-3`, errors: [{ column: "mass_kg", message: "Mass must be a number in kg." }] }]);
    expect(await count(maker)).toBe(0);
  });

  it("stays all-or-nothing when the database refuses a row mid-write", async () => {
    // Another curator adds one of the file's models after the check: the import's insert of that row
    // waits on the other transaction, then fails; the rows written before it must disappear too.
    const curator = await userWithRole("curator", "csv-race");
    const maker = uniqueMaker("csvrace");
    const csv = [HEADER, ...Array.from({ length: 600 }, (_, i) => row(maker, `R-${String(i).padStart(3, "0")}`))].join("\n");
    let markInserted!: () => void;
    let release!: () => void;
    const inserted = new Promise<void>((resolve) => (markInserted = resolve));
    const held = new Promise<void>((resolve) => (release = resolve));
    const other = db.transaction().execute(async (trx) => {
      await trx
        .insertInto("pv_module")
        .values({
          maker,
          model: "R-599",
          cell_technology: "mono-PERC",
          cells_in_series: 36,
          pmax_w: 100,
          vmp_v: 18.6,
          imp_a: 5.38,
          voc_v: 22.4,
          isc_a: 5.75,
          gamma_pmax_pct_per_c: -0.39,
          beta_voc_pct_per_c: -0.29,
          alpha_isc_pct_per_c: 0.05,
          noct_c: 45,
          length_mm: 1010,
          width_mm: 665,
          mass_kg: 6.9,
        })
        .execute();
      markInserted();
      await held;
    });
    await inserted;
    const importing = curator.client.action(importPage, "/catalogue/import", { kind: "modules", intent: "import", csvText: csv });
    // Commit the other curator's row only once the import is waiting on it.
    for (let attempt = 0; attempt < 200; attempt++) {
      const { rows } = await sql<{
        n: number;
      }>`select count(*)::int as n from pg_stat_activity where wait_event_type = 'Lock' and query like 'insert into "pv_module"%'`.execute(db);
      if (rows[0].n > 0) break;
      await new Promise((r) => setTimeout(r, 50));
    }
    release();
    await other;
    const result = await importing;
    expect(result.status).toBe(400);
    expect(result.data.report.fileErrors[0]).toMatch(/nothing was written/);
    expect(await count(maker)).toBe(1);
  });

  it("refuses a file with unknown columns, and a missing file, with a message", async () => {
    const curator = await userWithRole("curator", "csv-columns");
    const wrong = await curator.client.action(importPage, "/catalogue/import", { kind: "batteries", intent: "check", csvText: HEADER + "\n" + row("X", "Y") });
    expect(wrong.data.report.fileErrors.join(" ")).toMatch(/Unknown columns: cell_technology/);
    const empty = await curator.client.action(importPage, "/catalogue/import", { kind: "modules", intent: "check", csvText: "  " });
    expect(empty.status).toBe(400);
    expect(empty.data.error).toBe("Choose a CSV file or paste its contents.");
    const badKind = await curator.client.action(importPage, "/catalogue/import", { kind: "cables", intent: "check", csvText: "a" });
    expect(badKind.status).toBe(400);
  });
});
