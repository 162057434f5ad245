// Offer CSV files: each row's cell problems with its spreadsheet row number (header = row 1), and an
// export that reads back as the same rows.
import { describe, expect, it } from "vitest";
import { checkOfferCsv, offersToCsv } from "~/lib/sourcing-csv";

const HEADER =
  "supplier,kind,maker,model,sku,currency,unit_price,price_breaks,minimum_order,shipping_per_unit,shipping_per_order,lead_time_days,stock,valid_until,notes";

describe("checking an offer CSV", () => {
  it("reads good rows with their money as text", () => {
    const check = checkOfferCsv(
      `${HEADER}\nKestrel Row,module,Quillon Photonics,QP-150P,KR-1,eur,57.90,10:56.00; 40:54.20,2,0.80,35.00,6,40,2027-03-31,\n`,
      "2026-12-01",
    );
    expect(check.fileErrors).toEqual([]);
    expect(check.problems).toEqual([]);
    expect(check.rows).toHaveLength(1);
    expect(check.rows[0]).toMatchObject({
      row: 2,
      kind: "modules",
      currency: "EUR",
      unitPrice: "57.90",
      priceBreaks: [
        { minQuantity: 10, unitPrice: "56.00" },
        { minQuantity: 40, unitPrice: "54.20" },
      ],
      minimumOrder: 2,
      shippingPerUnit: "0.80",
      shippingPerOrder: "35.00",
      validUntil: "2027-03-31",
    });
  });

  it("names every problem with its row number and column", () => {
    const text = [
      HEADER,
      "A,module,M,X,,EUR,12.50,,,,,,,,", // row 2: fine
      "A,module,M,Y,,EUR,12,50,,,,,,,,", // row 3: the comma split the price (one cell too many is ignored; price_breaks gets "50")
      "A,panel,M,Z,,EUR,abc,,,,,,,,", // row 4: unknown kind, bad price
      "", // row 5: blank, skipped
      "A,battery,M,B,,EURO,10,1:9,0,,,,-3,2026-11-30,", // row 6: currency, break quantity, minimum order, stock (and expired)
      "A,inverter,M,I,,EUR,10,,,,,,,2026-02-30,", // row 7: not a date
    ].join("\n");
    const check = checkOfferCsv(text, "2026-12-01");
    expect(check.rowCount).toBe(5);
    expect(check.rows.map((r) => r.row)).toEqual([2]);
    const byRow = Object.fromEntries(check.problems.map((p) => [p.row, p.errors.map((e) => `${e.column}: ${e.message}`)]));
    expect(Object.keys(byRow)).toEqual(["3", "4", "6", "7"]);
    expect(byRow[3].join(" ")).toMatch(/price_breaks: Write price breaks as quantity:price pairs/);
    expect(byRow[4]).toEqual(
      expect.arrayContaining([
        expect.stringMatching(/^kind: Unknown kind "panel"/),
        expect.stringMatching(/^unit_price: The unit price must be a plain number/),
      ]),
    );
    expect(byRow[6].join(" | ")).toMatch(/currency: "EURO" is not a three-letter/);
    expect(byRow[6].join(" | ")).toMatch(/price_breaks: The break quantity must be at least 2/);
    expect(byRow[6].join(" | ")).toMatch(/minimum_order: The minimum order must be at least 1/);
    expect(byRow[6].join(" | ")).toMatch(/stock: The stock must be a whole number/);
    // Expiry is judged by the import against the team's stored offers, not here.
    expect(byRow[6].join(" | ")).not.toMatch(/valid_until/);
    expect(byRow[7].join(" ")).toMatch(/valid_until: "2026-02-30" is not a date/);
    // Rows whose supplier and part cells are sound are named, so the import can still look them up;
    // row 4's kind is unknown, so it cannot be.
    expect(check.problemRows.map((r) => [r.row, r.kind, r.model, r.currency, r.validUntil, r.expired])).toEqual([
      [3, "modules", "Y", "EUR", null, false],
      [6, "batteries", "B", null, "2026-11-30", true],
      [7, "inverters", "I", "EUR", null, false],
    ]);
  });

  it("refuses a file with missing or unknown columns before reading rows", () => {
    const check = checkOfferCsv("supplier,kind,maker,model,price\nA,module,M,X,1\n", "2026-12-01");
    expect(check.fileErrors.join(" ")).toMatch(/Unknown column: price/);
    expect(check.fileErrors.join(" ")).toMatch(/Missing column: unit_price/);
    expect(check.rows).toEqual([]);
    expect(checkOfferCsv("", "2026-12-01").fileErrors[0]).toMatch(/empty/);
    expect(checkOfferCsv(`${HEADER}\n`, "2026-12-01").fileErrors[0]).toMatch(/no offers/);
  });

  it("keeps a price valid through its last day, and flags it expired the day after", () => {
    expect(checkOfferCsv(`${HEADER}\nA,module,M,X,,EUR,1,,,,,,,2026-12-01,\n`, "2026-12-01").rows[0]).toMatchObject({
      validUntil: "2026-12-01",
      expired: false,
    });
    const later = checkOfferCsv(`${HEADER}\nA,module,M,X,,EUR,1,,,,,,,2026-12-01,\n`, "2026-12-02");
    expect(later.problems).toEqual([]);
    expect(later.rows[0]).toMatchObject({ validUntil: "2026-12-01", expired: true });
  });
});

describe("exporting offers", () => {
  it("writes the import's columns and reads back the same values, money exactly", () => {
    const csv = offersToCsv([
      {
        supplierName: "Kestrel Row, Ltd",
        partKind: "batteries",
        maker: "Tamsin Cells",
        model: "TC-LFP-100",
        sku: "B-1",
        currency: "GBP",
        unitPrice: "0.1",
        priceBreaks: [{ minQuantity: 4, unitPrice: "0.0999" }],
        minimumOrder: 1,
        shippingPerUnit: "0.2",
        shippingPerOrder: "0",
        leadTimeDays: null,
        stock: 3,
        validUntil: "2027-01-31",
        notes: '=HYPERLINK("x")',
      },
    ]);
    expect(csv.split("\r\n")[0]).toBe(HEADER);
    const back = checkOfferCsv(csv, "2026-12-01");
    expect(back.problems).toEqual([]);
    expect(back.rows[0]).toMatchObject({
      supplier: "Kestrel Row, Ltd",
      kind: "batteries",
      unitPrice: "0.1",
      shippingPerUnit: "0.2",
      priceBreaks: [{ minQuantity: 4, unitPrice: "0.0999" }],
      stock: 3,
      leadTimeDays: null,
    });
    // A cell that a spreadsheet would run as a formula is written as text.
    expect(back.rows[0].notes.startsWith("'=")).toBe(true);
  });
});
