// Offer CSV files: the columns, reading a file into checked rows (each problem named with its
// spreadsheet row number: the header is row 1), and writing the team's offers back out in the same
// columns, so an exported file imports again. Money cells stay text throughout.
import Papa from "papaparse";
import { isCurrencyCode } from "~/domain/money/money";
import { canonicalDecimal, decimalProblem } from "~/domain/sourcing/decimal-text";
import type { OfferPartKind } from "~/domain/sourcing/offer-facts";
import { isExpired, isIsoDate } from "~/domain/sourcing/offer-validity";
import { MONEY_RULES } from "./sourcing-forms";

export const MAX_OFFER_CSV_BYTES = 2 * 1024 * 1024;
export const MAX_OFFER_CSV_ROWS = 5000;

export const OFFER_CSV_COLUMNS = [
  { header: "supplier", required: true, what: "Supplier's name; a new name adds the supplier" },
  { header: "kind", required: true, what: "module, battery, controller or inverter" },
  { header: "maker", required: true, what: "Maker, as in the catalogue" },
  { header: "model", required: true, what: "Model, as in the catalogue" },
  { header: "sku", required: false, what: "Supplier's article number" },
  { header: "currency", required: false, what: "ISO code, e.g. EUR; blank = the supplier's" },
  { header: "unit_price", required: true, what: "Price of one unit, decimal point, e.g. 58.50" },
  { header: "price_breaks", required: false, what: "quantity:price pairs, e.g. 10:56.00; 40:54.20" },
  { header: "minimum_order", required: false, what: "Units per order at least (blank = 1)" },
  { header: "shipping_per_unit", required: false, what: "Blank = the supplier's default" },
  { header: "shipping_per_order", required: false, what: "Blank = the supplier's default" },
  { header: "lead_time_days", required: false, what: "Days from order to delivery" },
  { header: "stock", required: false, what: "Units in stock" },
  { header: "valid_until", required: false, what: "Last day the price holds, YYYY-MM-DD" },
  { header: "notes", required: false, what: "Anything else" },
] as const;

export type OfferCsvHeader = (typeof OFFER_CSV_COLUMNS)[number]["header"];

const KIND_WORDS: Record<string, OfferPartKind> = {
  module: "modules",
  modules: "modules",
  battery: "batteries",
  batteries: "batteries",
  controller: "controllers",
  controllers: "controllers",
  "charge controller": "controllers",
  inverter: "inverters",
  inverters: "inverters",
};

export const KIND_CSV_WORD: Record<OfferPartKind, string> = { modules: "module", batteries: "battery", controllers: "controller", inverters: "inverter" };

/** The cells that name an offer (supplier and part) and its valid-until day: enough to look it up. */
export interface OfferCsvIdentity {
  row: number;
  supplier: string;
  kind: OfferPartKind;
  maker: string;
  model: string;
  /** Null when blank or not a three-letter code. */
  currency: string | null;
  /** Null when blank or not a date. */
  validUntil: string | null;
  /** The valid-until day has passed: the import decides (only an offer already stored may stay expired). */
  expired: boolean;
}

export interface OfferCsvRow extends OfferCsvIdentity {
  sku: string;
  unitPrice: string;
  priceBreaks: { minQuantity: number; unitPrice: string }[];
  minimumOrder: number;
  shippingPerUnit: string | null;
  shippingPerOrder: string | null;
  leadTimeDays: number | null;
  stock: number | null;
  notes: string;
}

export interface RowProblem {
  row: number;
  /** "Supplier · Maker Model" as written, to find the row in the file. */
  label: string;
  errors: { column: string; message: string }[];
}

export interface OfferCsvCheck {
  rowCount: number;
  fileErrors: string[];
  problems: RowProblem[];
  rows: OfferCsvRow[];
  /** Rows with cell problems whose supplier, kind, maker and model cells are sound: still looked up, so
   * that a row's problems are listed all at once (a bad price and an unknown model). */
  problemRows: OfferCsvIdentity[];
}

/** Puts a row's problems in the file's column order, wherever they were found. */
export function byColumnOrder(errors: readonly { column: string; message: string }[]) {
  const order = (column: string) => OFFER_CSV_COLUMNS.findIndex((c) => c.header === column);
  return [...errors].sort((a, b) => order(a.column) - order(b.column));
}

function wholeNumber(text: string, label: string, min: number): { value?: number; problem?: string } {
  if (!/^\d+$/.test(text)) return { problem: `The ${label} must be a whole number.` };
  const value = Number(text);
  if (value < min) return { problem: `The ${label} must be at least ${min}.` };
  if (value > 1_000_000) return { problem: `The ${label} is too large.` };
  return { value };
}

function parseBreaks(text: string, problems: string[]) {
  const breaks: { minQuantity: number; unitPrice: string }[] = [];
  if (!text) return breaks;
  for (const part of text
    .split(";")
    .map((p) => p.trim())
    .filter(Boolean)) {
    const match = /^(\d+)\s*:\s*(.+)$/.exec(part);
    if (!match) {
      problems.push(`Write price breaks as quantity:price pairs separated by semicolons, e.g. 10:56.00; 40:54.20 ("${part}" is not one).`);
      continue;
    }
    const quantity = wholeNumber(match[1], "break quantity", 2);
    const priceProblem = decimalProblem(match[2], `price from ${match[1]} units`, MONEY_RULES);
    if (quantity.problem) problems.push(quantity.problem);
    else if (priceProblem) problems.push(priceProblem);
    else if (breaks.some((b) => b.minQuantity === quantity.value)) problems.push(`Two price breaks start at ${quantity.value} units.`);
    else breaks.push({ minQuantity: quantity.value!, unitPrice: canonicalDecimal(match[2]) });
  }
  return breaks.sort((a, b) => a.minQuantity - b.minQuantity);
}

/** Checks one record's cells on their own (part, supplier, duplicates and expiry are judged against the team's data later). */
function checkRecord(
  cells: Record<OfferCsvHeader, string>,
  row: number,
  asOf: string,
): { value?: OfferCsvRow; problem?: RowProblem; identity?: OfferCsvIdentity } {
  const errors: { column: string; message: string }[] = [];
  const add = (column: string, message: string) => errors.push({ column, message });
  for (const c of OFFER_CSV_COLUMNS) if (c.required && !cells[c.header]) add(c.header, `The ${c.header.replace(/_/g, " ")} is empty.`);
  const kind = KIND_WORDS[cells.kind.toLowerCase()];
  if (cells.kind && !kind) add("kind", `Unknown kind "${cells.kind}": use module, battery, controller or inverter.`);
  const currency = cells.currency ? cells.currency.toUpperCase() : null;
  if (currency && !isCurrencyCode(currency)) add("currency", `"${cells.currency}" is not a three-letter currency code such as EUR.`);
  if (cells.unit_price) {
    const problem = decimalProblem(cells.unit_price, "unit price", MONEY_RULES);
    if (problem) add("unit_price", problem);
  }
  const breakProblems: string[] = [];
  const priceBreaks = parseBreaks(cells.price_breaks, breakProblems);
  for (const p of breakProblems) add("price_breaks", p);
  const money = (header: "shipping_per_unit" | "shipping_per_order", label: string) => {
    if (!cells[header]) return null;
    const problem = decimalProblem(cells[header], label, MONEY_RULES);
    if (problem) add(header, problem);
    return problem ? null : canonicalDecimal(cells[header]);
  };
  const count = (header: "minimum_order" | "lead_time_days" | "stock", label: string, min: number) => {
    if (!cells[header]) return null;
    const result = wholeNumber(cells[header], label, min);
    if (result.problem) add(header, result.problem);
    return result.value ?? null;
  };
  const shippingPerUnit = money("shipping_per_unit", "shipping per unit");
  const shippingPerOrder = money("shipping_per_order", "shipping per order");
  const minimumOrder = count("minimum_order", "minimum order", 1);
  const leadTimeDays = count("lead_time_days", "lead time", 0);
  const stock = count("stock", "stock", 0);
  let validUntil: string | null = null;
  if (cells.valid_until) {
    if (!isIsoDate(cells.valid_until)) add("valid_until", `"${cells.valid_until}" is not a date written YYYY-MM-DD.`);
    else validUntil = cells.valid_until;
  }
  const label = `${cells.supplier || "?"} · ${cells.maker} ${cells.model}`.trim();
  const identity =
    kind && cells.supplier && cells.maker && cells.model
      ? {
          row,
          supplier: cells.supplier,
          kind,
          maker: cells.maker,
          model: cells.model,
          currency: currency && isCurrencyCode(currency) ? currency : null,
          validUntil,
          expired: isExpired(validUntil, asOf),
        }
      : undefined;
  if (errors.length) return { problem: { row, label, errors }, identity };
  return {
    value: {
      ...identity!,
      sku: cells.sku,
      unitPrice: canonicalDecimal(cells.unit_price),
      priceBreaks,
      minimumOrder: minimumOrder ?? 1,
      shippingPerUnit,
      shippingPerOrder,
      leadTimeDays,
      stock,
      notes: cells.notes,
    },
  };
}

/** Reads the file and checks every row's cells; `asOf` is the day expiry is judged on. */
export function checkOfferCsv(text: string, asOf: string): OfferCsvCheck {
  const check: OfferCsvCheck = { rowCount: 0, fileErrors: [], problems: [], rows: [], problemRows: [] };
  if (text.length > MAX_OFFER_CSV_BYTES) {
    check.fileErrors.push(`The file is larger than ${MAX_OFFER_CSV_BYTES / 1024 / 1024} MiB; split it into smaller files.`);
    return check;
  }
  // A NUL byte never occurs in text (and PostgreSQL text cannot store it): this is not a CSV file.
  if (text.includes("\0")) {
    check.fileErrors.push("The file contains NUL characters (byte 0): it is not a plain-text CSV file. Save it as CSV and try again.");
    return check;
  }
  const records = Papa.parse<string[]>(text.replace(/^\uFEFF/, ""), { header: false, skipEmptyLines: false }).data;
  const headerIndex = records.findIndex((r) => r.some((cell) => cell.trim() !== ""));
  if (headerIndex < 0) {
    check.fileErrors.push("The file is empty: it needs a header row and at least one offer.");
    return check;
  }
  const headers = records[headerIndex].map((h) => h.trim().toLowerCase());
  const known = new Set<string>(OFFER_CSV_COLUMNS.map((c) => c.header));
  const unknown = headers.filter((h) => h && !known.has(h));
  const missing = OFFER_CSV_COLUMNS.filter((c) => c.required && !headers.includes(c.header)).map((c) => c.header);
  if (unknown.length) check.fileErrors.push(`Unknown column${unknown.length > 1 ? "s" : ""}: ${unknown.join(", ")}. The columns are listed beside the form.`);
  if (missing.length) check.fileErrors.push(`Missing column${missing.length > 1 ? "s" : ""}: ${missing.join(", ")}.`);
  if (check.fileErrors.length) return check;
  const body = records.slice(headerIndex + 1).map((cells, i) => ({ cells, row: headerIndex + i + 2 }));
  const filled = body.filter((r) => r.cells.some((c) => c.trim() !== ""));
  if (filled.length === 0) check.fileErrors.push("The file has a header row but no offers.");
  if (filled.length > MAX_OFFER_CSV_ROWS) check.fileErrors.push(`The file has ${filled.length} offers; import at most ${MAX_OFFER_CSV_ROWS} at a time.`);
  if (check.fileErrors.length) return check;
  check.rowCount = filled.length;
  for (const { cells, row } of filled) {
    const record = Object.fromEntries(OFFER_CSV_COLUMNS.map((c) => [c.header, (cells[headers.indexOf(c.header)] ?? "").trim()])) as Record<
      OfferCsvHeader,
      string
    >;
    const { value, problem, identity } = checkRecord(record, row, asOf);
    if (value) check.rows.push(value);
    else {
      check.problems.push(problem!);
      if (identity) check.problemRows.push(identity);
    }
  }
  return check;
}

export interface OfferCsvLine {
  supplierName: string;
  partKind: OfferPartKind;
  maker: string | null;
  model: string | null;
  sku: string;
  currency: string;
  unitPrice: string;
  priceBreaks: { minQuantity: number; unitPrice: string }[];
  minimumOrder: number;
  shippingPerUnit: string;
  shippingPerOrder: string;
  leadTimeDays: number | null;
  stock: number | null;
  validUntil: string | null;
  notes: string;
}

export function offersToCsv(lines: readonly OfferCsvLine[]): string {
  const rows = lines.map((l) => [
    l.supplierName,
    KIND_CSV_WORD[l.partKind],
    l.maker ?? "",
    l.model ?? "",
    l.sku,
    l.currency,
    l.unitPrice,
    l.priceBreaks.map((b) => `${b.minQuantity}:${b.unitPrice}`).join("; "),
    String(l.minimumOrder),
    l.shippingPerUnit,
    l.shippingPerOrder,
    l.leadTimeDays === null ? "" : String(l.leadTimeDays),
    l.stock === null ? "" : String(l.stock),
    l.validUntil ?? "",
    l.notes,
  ]);
  return Papa.unparse({ fields: OFFER_CSV_COLUMNS.map((c) => c.header), data: rows }, { newline: "\r\n", escapeFormulae: true }) + "\r\n";
}
