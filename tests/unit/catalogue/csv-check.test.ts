// CSV rows get the edit form's messages, numbered as a spreadsheet numbers rows.
import { describe, expect, it } from "vitest";
import { checkCatalogueCsv } from "~/lib/catalogue-csv-check";
import { csvTemplate } from "~/lib/catalogue-csv-columns";

const HEADER = csvTemplate("modules").trim();
// Invented modules (demo data, no real product).
const GOOD_A = "Harrowgate Cells,HG-100M36,mono-PERC,36,100,18.6,5.38,22.4,5.75,-0.39,-0.29,0.05,noct,45,1010,665,6.9";
const GOOD_B = "Quillon Photonics,QP-150P,poly,36,150,18.0,8.33,21.9,8.93,-0.44,-0.33,0.06,noct,47,1480,670,11.5";
const VMP_OVER_VOC = "Quillon Photonics,QP-60P,poly,36,60,21.8,2.75,21.6,3.64,-0.45,-0.34,0.06,noct,47,770,540,5.1";

describe("catalogue CSV check", () => {
  it("accepts clean rows and maps them to form values", () => {
    const check = checkCatalogueCsv("modules", [HEADER, GOOD_A, GOOD_B].join("\n"));
    expect(check.fileErrors).toEqual([]);
    expect(check.problems).toEqual([]);
    expect(check.rowCount).toBe(2);
    expect(check.rows.map((r) => r.row)).toEqual([2, 3]);
    expect(check.rows[0].value).toMatchObject({ maker: "Harrowgate Cells", model: "HG-100M36", pmaxW: 100, vmpV: 18.6, nominalTempKind: "noct" });
  });

  it("numbers rows like a spreadsheet (header = row 1) and keeps counting across blank lines", () => {
    const check = checkCatalogueCsv("modules", [HEADER, GOOD_A, "", VMP_OVER_VOC, GOOD_B.replace("150,18.0", "150,abc")].join("\r\n"));
    expect(check.problems.map((p) => p.row)).toEqual([4, 5]);
    expect(check.problems[0]).toMatchObject({ label: "Quillon Photonics QP-60P" });
    expect(check.problems[0].errors).toContainEqual({ column: "vmp_v", message: expect.stringMatching(/Vmp must be below Voc/) });
    expect(check.problems[1].errors).toContainEqual({ column: "vmp_v", message: "Vmp must be a number in V." });
    expect(check.rows.map((r) => r.row)).toEqual([2]);
  });

  it("matches headers in any case and order, and allows quoted commas", () => {
    const columns = HEADER.split(",");
    const cells = GOOD_A.split(",");
    const reversed = [
      columns
        .map((c) => c.toUpperCase())
        .reverse()
        .join(","),
      cells.reverse().join(",").replace("HG-100M36", '"HG-100M36, rev. B"'),
    ].join("\n");
    const check = checkCatalogueCsv("modules", reversed);
    expect(check.problems).toEqual([]);
    expect(check.rows[0].value).toMatchObject({ model: "HG-100M36, rev. B", massKg: 6.9 });
  });

  it("reports unknown and missing columns before any row", () => {
    const check = checkCatalogueCsv("modules", "maker,model,wattage\nA,B,100");
    expect(check.fileErrors.join(" ")).toMatch(/Unknown column: wattage/);
    expect(check.fileErrors.join(" ")).toMatch(/Missing columns: cell_technology, cells_in_series, pmax_w/);
    expect(check.rows).toEqual([]);
  });

  it("flags the same maker and model twice in one file", () => {
    const check = checkCatalogueCsv("modules", [HEADER, GOOD_A, GOOD_A.replace("Harrowgate Cells", "harrowgate cells")].join("\n"));
    expect(check.problems).toEqual([
      { row: 3, label: "harrowgate cells HG-100M36", errors: [{ column: "model", message: "The same maker and model is already on row 2." }] },
    ]);
  });

  it("reads optional blank cells as absent (controllers without a 36 V rating)", () => {
    const csv = [csvTemplate("controllers").trim(), "Tollbridge Controls,TC-M20,mppt,260,520,,,100,20,97"].join("\n");
    const check = checkCatalogueCsv("controllers", csv);
    expect(check.problems).toEqual([]);
    expect(check.rows[0].value).toMatchObject({ maxPvPower12W: 260, maxPvPower24W: 520, maxPvPower36W: null, maxPvPower48W: null });
  });

  it("says so when there is nothing to import", () => {
    expect(checkCatalogueCsv("batteries", "").fileErrors).toEqual(["The file is empty: it needs a header row and at least one part."]);
    expect(checkCatalogueCsv("batteries", csvTemplate("batteries")).fileErrors).toEqual(["The file has a header row but no parts."]);
  });
});
