// Reads a catalogue CSV (papaparse) and checks every row with the kind's form schema, as if each
// row were a submitted form, so a row gets exactly the messages the edit form would show. Rows are
// numbered as a spreadsheet numbers them: the header is row 1, the first part is row 2.
import { parseWithZod } from "@conform-to/zod/v4";
import Papa from "papaparse";
import type { PartKind } from "~/domain/catalogue/part-kinds";
import { CSV_COLUMNS } from "./catalogue-csv-columns";
import { PART_FORM_SCHEMAS, type PartForm } from "./catalogue-forms";

export const MAX_CSV_ROWS = 5000;
export const MAX_CSV_BYTES = 2 * 1024 * 1024;

export interface RowProblem {
  row: number;
  /** "Maker Model" as written in the row, to find it in the file. */
  label: string;
  errors: { column: string; message: string }[];
}

/** What a check (or a refused import) tells the curator. */
export interface ImportReport {
  kind: PartKind;
  rowCount: number;
  readyCount: number;
  fileErrors: string[];
  problems: RowProblem[];
}

export interface CsvCheck {
  kind: PartKind;
  rowCount: number;
  /** Problems with the file as a whole (columns, size); when present, no row is checked. */
  fileErrors: string[];
  problems: RowProblem[];
  rows: { row: number; value: PartForm }[];
}

function headerKey(header: string) {
  return header
    .replace(/^\uFEFF/, "")
    .trim()
    .toLowerCase();
}

export function checkCatalogueCsv(kind: PartKind, text: string): CsvCheck {
  const check: CsvCheck = { kind, rowCount: 0, fileErrors: [], problems: [], rows: [] };
  if (text.length > MAX_CSV_BYTES) {
    check.fileErrors.push(`The file is larger than ${MAX_CSV_BYTES / 1024 / 1024} MiB; split it into smaller files.`);
    return check;
  }
  // A NUL byte never occurs in text (and PostgreSQL text cannot store it): this is not a CSV file.
  if (text.includes("\0")) {
    check.fileErrors.push("The file contains NUL characters (byte 0): it is not a plain-text CSV file. Save it as CSV and try again.");
    return check;
  }
  const parsed = Papa.parse<string[]>(text, { header: false, skipEmptyLines: false });
  const records = parsed.data;
  const headerIndex = records.findIndex((r) => r.some((cell) => cell.trim() !== ""));
  if (headerIndex < 0) {
    check.fileErrors.push("The file is empty: it needs a header row and at least one part.");
    return check;
  }
  const columns = CSV_COLUMNS[kind];
  const headers = records[headerIndex].map(headerKey);
  const known = new Map(columns.map((c) => [c.header, c]));
  const unknown = headers.filter((h) => h !== "" && !known.has(h));
  const missing = columns.filter((c) => c.required && !headers.includes(c.header)).map((c) => c.header);
  const repeated = headers.filter((h, i) => h !== "" && headers.indexOf(h) !== i);
  if (unknown.length)
    check.fileErrors.push(
      `Unknown column${unknown.length > 1 ? "s" : ""}: ${unknown.join(", ")}. The columns for this kind are: ${columns.map((c) => c.header).join(", ")}.`,
    );
  if (missing.length) check.fileErrors.push(`Missing column${missing.length > 1 ? "s" : ""}: ${missing.join(", ")}.`);
  if (repeated.length) check.fileErrors.push(`Column${repeated.length > 1 ? "s" : ""} given twice: ${[...new Set(repeated)].join(", ")}.`);
  if (check.fileErrors.length) return check;

  const parseErrors = new Map<number, string>();
  for (const e of parsed.errors) if (e.row !== undefined) parseErrors.set(e.row, e.message);
  const seen = new Map<string, number>();
  for (let i = headerIndex + 1; i < records.length; i++) {
    const cells = records[i];
    if (cells.every((cell) => cell.trim() === "")) continue;
    const row = i + 1;
    check.rowCount += 1;
    if (check.rowCount > MAX_CSV_ROWS) {
      check.fileErrors.push(`The file has more than ${MAX_CSV_ROWS} parts; split it into smaller files.`);
      check.rows = [];
      check.problems = [];
      return check;
    }
    const formData = new URLSearchParams();
    headers.forEach((h, c) => {
      const column = known.get(h);
      if (column && cells[c] !== undefined && cells[c].trim() !== "") formData.set(column.field, cells[c].trim());
    });
    const label = `${formData.get("maker") ?? "?"} ${formData.get("model") ?? "?"}`;
    const errors: RowProblem["errors"] = [];
    const parseError = parseErrors.get(i);
    if (parseError) errors.push({ column: "row", message: `${parseError} (check quotes and commas).` });
    if (cells.length > headers.length)
      errors.push({ column: "row", message: `The row has ${cells.length} cells but the header has ${headers.length} columns.` });
    const submission = parseWithZod(formData, { schema: PART_FORM_SCHEMAS[kind] });
    if (submission.status !== "success") {
      for (const [field, messages] of Object.entries(submission.error ?? {})) {
        if (!messages?.length) continue;
        errors.push({ column: columns.find((c) => c.field === field)?.header ?? field, message: messages.join(" ") });
      }
    } else {
      const key = `${submission.value.maker.toLowerCase()}\u0000${submission.value.model.toLowerCase()}`;
      const earlier = seen.get(key);
      if (earlier) errors.push({ column: "model", message: `The same maker and model is already on row ${earlier}.` });
      else seen.set(key, row);
      if (!errors.length) check.rows.push({ row, value: submission.value as PartForm });
    }
    if (errors.length) check.problems.push({ row, label, errors });
  }
  if (check.rowCount === 0) check.fileErrors.push("The file has a header row but no parts.");
  return check;
}
