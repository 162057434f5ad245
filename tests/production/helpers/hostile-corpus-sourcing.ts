// Sourcing: suppliers, offers (money as decimal text, price breaks), the CSV import page, exchange
// rates and the comparison and export pages' query strings.
import { badIdPaths, badNumberCases, get, postForm, postMultipart, withField, without, type HostileCase, type SeededIds } from "./hostile-corpus";
import type { FilePart, FormFields } from "./hostile-http";
import { binaryBytes, brokenCsv, filler, MEGABYTE, ODD_TEXT } from "./hostile-values";

const BAD_MONEY = ["-1", "1,5", "NaN", "Infinity", "1e3", "€12", "12.1234567", "9999999999999", " ", "0x10", "12 000", "+-1"];

export function supplierFields(name = "Hostile Test Supplies"): FormFields {
  return [
    ["name", name],
    ["contact", "orders@hostile.example"],
    ["currency", "EUR"],
    ["defaultShippingPerUnit", "1.50"],
    ["defaultShippingPerOrder", "25"],
    ["defaultLeadTimeDays", "10"],
  ];
}

export function sourcingCases(ids: SeededIds): HostileCase[] {
  const cases: HostileCase[] = [];
  const family = "sourcing";
  const supplier = supplierFields();
  const newSupplier = (label: string, fields: FormFields) => postForm(family, "installer", "/sourcing/suppliers/new", `new supplier: ${label}`, fields);
  BAD_MONEY.forEach((money, i) =>
    cases.push(newSupplier(`shipping ${JSON.stringify(money)}`, withField(supplier, i % 2 ? "defaultShippingPerOrder" : "defaultShippingPerUnit", money))),
  );
  cases.push(...badNumberCases(newSupplier, supplier, ["defaultLeadTimeDays"]).filter((c) => !c.label.endsWith('""')));
  for (const currency of ["EURO", "€", "eu", "XXX1", ODD_TEXT.nul])
    cases.push(newSupplier(`currency ${JSON.stringify(currency)}`, withField(supplier, "currency", currency)));
  cases.push(newSupplier("name missing", without(supplier, "name")));
  cases.push(newSupplier("notes of 10 MB", withField(supplier, "notes", filler(10 * MEGABYTE))));
  cases.push(newSupplier("name with NUL (otherwise valid)", withField(supplier, "name", ODD_TEXT.nul)));
  cases.push(newSupplier("contact with NUL (otherwise valid)", withField(supplier, "contact", `orders${ODD_TEXT.nul}`)));
  const editSupplier = `/sourcing/suppliers/${ids.supplierId}`;
  cases.push(postForm(family, "installer", editSupplier, "edit supplier: lead time -1 days", withField(supplier, "defaultLeadTimeDays", "-1")));
  cases.push(postForm(family, "installer", editSupplier, "edit supplier: name with NUL (otherwise valid)", withField(supplier, "name", ODD_TEXT.nul)));
  for (const { id, path } of badIdPaths((id) => `/sourcing/suppliers/${id}`))
    cases.push(postForm(family, "installer", path, `supplier ${id.slice(0, 20)}: delete`, [["intent", "delete"]]));

  const offer: FormFields = [
    ["supplierId", ids.supplierId],
    ["partKind", "modules"],
    ["partId", ids.moduleId],
    ["unitPrice", "99.90"],
    ["minimumOrder", "1"],
    ["validUntil", "2099-12-31"],
  ];
  const newOffer = (label: string, fields: FormFields) => postForm(family, "installer", "/sourcing/offers/new", `new offer: ${label}`, fields);
  BAD_MONEY.slice(0, 8).forEach((money) => cases.push(newOffer(`unit price ${JSON.stringify(money)}`, withField(offer, "unitPrice", money))));
  // A blank optional count is allowed (no minimum, no stock figure): not a bad input.
  cases.push(
    ...badNumberCases(newOffer, offer, ["minimumOrder", "leadTimeDays", "stock"])
      .filter((c) => !c.label.endsWith('""'))
      .slice(0, 8),
  );
  cases.push(newOffer("part kind 'solar'", withField(offer, "partKind", "solar")));
  cases.push(newOffer("supplier id with SQL", withField(offer, "supplierId", ODD_TEXT.sql)));
  cases.push(newOffer("unknown part", withField(offer, "partId", "00000000-0000-4000-8000-000000000000")));
  cases.push(newOffer("battery id given as a module", withField(offer, "partId", ids.batteryId)));
  cases.push(newOffer("valid until 31 February", withField(offer, "validUntil", "2027-02-31")));
  cases.push(newOffer("price break at quantity 1", [...offer, ["priceBreaks[0].minQuantity", "1"], ["priceBreaks[0].unitPrice", "90"]]));
  cases.push(
    newOffer("two breaks at one quantity", [
      ...offer,
      ["priceBreaks[0].minQuantity", "10"],
      ["priceBreaks[0].unitPrice", "90"],
      ["priceBreaks[1].minQuantity", "10"],
      ["priceBreaks[1].unitPrice", "80"],
    ]),
  );
  cases.push(newOffer("price break at list position 99 999 999", [...offer, ["priceBreaks[99999999].minQuantity", "10"]]));
  cases.push(
    newOffer("13 price breaks", [
      ...offer,
      ...Array.from({ length: 13 }, (_, i): [string, string][] => [
        [`priceBreaks[${i}].minQuantity`, String(i + 2)],
        [`priceBreaks[${i}].unitPrice`, "1"],
      ]).flat(),
    ]),
  );
  cases.push(newOffer("sku with NUL (otherwise valid)", withField(offer, "sku", `SKU${ODD_TEXT.nul}`)));
  const editOffer = `/sourcing/offers/${ids.offerId}`;
  cases.push(postForm(family, "installer", editOffer, "edit offer: price -5", withField(offer, "unitPrice", "-5")));
  cases.push(postForm(family, "installer", editOffer, "edit offer: notes with NUL (otherwise valid)", withField(offer, "notes", ODD_TEXT.nul)));
  for (const { id, path } of badIdPaths((id) => `/sourcing/offers/${id}`))
    cases.push(postForm(family, "installer", path, `offer ${id.slice(0, 20)}: delete`, [["intent", "delete"]]));

  const importCsv = (label: string, fields: FormFields, files: FilePart[] = [], extra = {}) =>
    postMultipart(family, "installer", "/sourcing/import", `import: ${label}`, fields, files, extra);
  const header =
    "supplier,kind,maker,model,sku,currency,unit_price,price_breaks,minimum_order,shipping_per_unit,shipping_per_order,lead_time_days,stock,valid_until,notes";
  cases.push(
    importCsv("broken quoting", [
      ["intent", "import"],
      ["csvText", brokenCsv(header)],
    ]),
  );
  cases.push(importCsv("binary file named .csv", [["intent", "import"]], [{ name: "file", filename: "offers.csv", type: "text/csv", bytes: binaryBytes() }]));
  cases.push(
    importCsv("file of 10 MB", [["intent", "import"]], [{ name: "file", filename: "offers.csv", type: "text/csv", bytes: filler(10 * MEGABYTE, ",") }]),
  );
  cases.push(
    importCsv("unknown intent", [
      ["intent", "merge"],
      ["csvText", `${header}\r\n`],
    ]),
  );
  // A valid row but for a NUL in the supplier's name, as a file (whose bytes the server's front
  // checks leave alone).
  const nulRow = `${header}\r\nNew\u0000Supplier,module,Fellmark Solar,FM-120M,,EUR,47.90,,,,,,,,\r\n`;
  cases.push(
    importCsv(
      "file with a NUL in a row (otherwise valid)",
      [["intent", "import"]],
      [{ name: "file", filename: "offers.csv", type: "text/csv", bytes: Buffer.from(nulRow) }],
    ),
  );
  cases.push(
    importCsv("bad cells", [
      ["intent", "import"],
      ["csvText", `${header}\r\nX\u0000,module,Nobody,None,,EURO,NaN,1:2;x,-1,,,1e309,,2027-02-31,\r\n`],
    ]),
  );

  const rates = (label: string, fields: FormFields) => postForm(family, "installer", "/sourcing/rates", `rates: ${label}`, fields);
  cases.push(rates("no intent", [["quotingCurrency", "EUR"]]));
  cases.push(
    rates("quoting currency 'Euro'", [
      ["intent", "currency"],
      ["quotingCurrency", "Euro"],
    ]),
  );
  cases.push(
    rates("rate 0", [
      ["intent", "add-rate"],
      ["fromCurrency", "GBP"],
      ["toCurrency", "EUR"],
      ["rate", "0"],
      ["asOf", "2026-01-01"],
    ]),
  );
  cases.push(
    rates("rate NaN", [
      ["intent", "add-rate"],
      ["fromCurrency", "GBP"],
      ["toCurrency", "EUR"],
      ["rate", "NaN"],
      ["asOf", "2026-01-01"],
    ]),
  );
  cases.push(
    rates("same currency twice", [
      ["intent", "add-rate"],
      ["fromCurrency", "EUR"],
      ["toCurrency", "eur"],
      ["rate", "1"],
      ["asOf", "2026-01-01"],
    ]),
  );
  cases.push(
    rates("date 2026-13-01", [
      ["intent", "add-rate"],
      ["fromCurrency", "GBP"],
      ["toCurrency", "EUR"],
      ["rate", "1.2"],
      ["asOf", "2026-13-01"],
    ]),
  );
  cases.push(
    rates("delete a rate id with SQL", [
      ["intent", "delete-rate"],
      ["rateId", ODD_TEXT.sql],
    ]),
  );
  cases.push(
    rates("delete an unknown rate", [
      ["intent", "delete-rate"],
      ["rateId", "00000000-0000-4000-8000-000000000000"],
    ]),
  );

  const page = (label: string, path: string) => get(family, "installer", path, label, { expect: "not5xx" });
  cases.push(page("compare an unknown kind", "/sourcing/compare/widgets"));
  cases.push(page("compare with bad quantities", `/sourcing/compare/modules?quantity=-1&planId=${encodeURIComponent(ODD_TEXT.nul)}&watts=NaN`));
  cases.push(page("export with odd filters", `/sourcing/export?kind=${encodeURIComponent(ODD_TEXT.sql)}&supplierId=abc%00`));
  cases.push(page("list with odd filters", `/sourcing?kind=solar&supplierId=${encodeURIComponent(ODD_TEXT.nul)}&q=%27`));
  return cases;
}
