// Monthly climate brought in by the installer: twelve pasted numbers, or a CSV file with one row per
// month (month, irradiation kWh/m²/day, mean max °C, mean min °C, albedo; header and month column
// optional). The file's layout is decided once for the whole file, so no row is ever read shifted,
// and a month column puts each row in its month whatever order the file lists them in.
import Papa from "papaparse";

export interface PastedMonth {
  ghiKWhM2Day?: string;
  tMaxC?: string;
  tMinC?: string;
  albedo?: string;
}
type Field = keyof PastedMonth;

const FIELDS: Field[] = ["ghiKWhM2Day", "tMaxC", "tMinC", "albedo"];
const FIELD_WORDS: Record<Field, string> = { ghiKWhM2Day: "irradiation", tMaxC: "mean maximum", tMinC: "mean minimum", albedo: "albedo" };
const MONTHS = ["january", "february", "march", "april", "may", "june", "july", "august", "september", "october", "november", "december"];
const MONTH_WORDS = MONTHS.map((m) => m[0].toUpperCase() + m.slice(1));

/** Twelve numbers separated by spaces, commas, semicolons or new lines. */
export function parseTwelveNumbers(text: string): number[] | string {
  const parts = text
    .trim()
    .split(/[\s,;]+/)
    .filter(Boolean);
  if (parts.length !== 12) return `Found ${parts.length} values; paste exactly 12, January to December.`;
  const values = parts.map((p) => Number(p));
  const bad = values.findIndex((v) => !Number.isFinite(v));
  return bad >= 0 ? `Value ${bad + 1} ("${parts[bad]}") is not a number.` : values;
}

/** 1–12 for "3", "03", "Mar", "march", "Sept"; null for anything else. */
export function monthOf(cell: string): number | null {
  const t = cell.trim().toLowerCase();
  if (/^\d{1,2}$/.test(t)) return Number(t) >= 1 && Number(t) <= 12 ? Number(t) : null;
  if (t.length < 3) return null;
  const i = MONTHS.findIndex((m) => m.startsWith(t) || (t === "sept" && m === "september"));
  return i >= 0 ? i + 1 : null;
}

const isNumber = (cell: string) => cell.trim() !== "" && Number.isFinite(Number(cell.trim()));

/** Which header names mean which column (case-insensitive); checked in this order. */
function headerField(name: string): Field | "month" | null {
  const n = name.trim().toLowerCase();
  if (/^(month|mon|mo|m)\b/.test(n) || n === "month") return "month";
  if (/albedo/.test(n)) return "albedo";
  if (/max|high/.test(n)) return "tMaxC";
  if (/min|low/.test(n)) return "tMinC";
  if (/ghi|irrad|insol|radiation|kwh|horizontal|^h\b/.test(n)) return "ghiKWhM2Day";
  return null;
}

interface Layout {
  monthColumn: number | null;
  columns: { index: number; field: Field }[];
}

function layoutFromHeader(header: string[]): Layout | string {
  const named = header.map(headerField);
  const monthAt = named.indexOf("month");
  const columns = named.flatMap((f, index) => (f && f !== "month" ? [{ index, field: f }] : []));
  const twice = FIELDS.find((f) => columns.filter((c) => c.field === f).length > 1);
  if (twice) return `Two columns of the header read as the ${FIELD_WORDS[twice]}; name each column once.`;
  // Names it cannot read: the columns keep their places after the month column.
  if (columns.length === 0) return positional(header.length, monthAt >= 0 ? monthAt : null);
  return { monthColumn: monthAt >= 0 ? monthAt : null, columns };
}

function positional(width: number, monthColumn: number | null): Layout {
  const indices = Array.from({ length: width }, (_, i) => i).filter((i) => i !== monthColumn);
  return { monthColumn, columns: indices.slice(0, FIELDS.length).map((index, k) => ({ index, field: FIELDS[k] })) };
}

/** Without a header: a month column only if the first column is a month on every row. */
function layoutWithoutHeader(rows: string[][]): Layout | string {
  const width = Math.max(...rows.map((r) => r.length));
  const firsts = rows.map((r) => r[0] ?? "");
  const lettered = firsts.filter((c) => /[a-z]/i.test(c)).length;
  // Numbers count as months only when the column holds 1 to 12 exactly once each: a whole-number
  // irradiation column (2, 3, 3, 4…) is data.
  const numbers = firsts.map(monthOf);
  const exactlyTwelve = rows.length === 12 && new Set(numbers).size === 12 && !numbers.includes(null);
  if (lettered === rows.length || exactlyTwelve || width > FIELDS.length) return positional(width, 0);
  if (lettered > 0) return "Some rows start with a month name and some do not: give every row its month, or none (then January first).";
  return positional(width, null);
}

export function parseMonthlyCsv(text: string): PastedMonth[] | string {
  const parsed = Papa.parse<string[]>(text.trim(), { skipEmptyLines: "greedy" });
  // A semicolon file often writes decimals with a comma (1,4 for 1.4).
  const comma = parsed.meta.delimiter !== ",";
  const all = parsed.data.map((row) => row.map((c) => (comma && /^\s*-?\d+,\d+\s*$/.test(c) ? c.replace(",", ".") : c).trim()));
  const headerRow = all.findIndex((row) => row.some(isNumber));
  if (headerRow < 0) return "Found no numbers in the file.";
  // Rows before the first number are the header (its last line names the columns); later rows without
  // a number (notes, units) are left out.
  const header = headerRow > 0 ? all[headerRow - 1] : null;
  const rows = all.slice(headerRow).filter((row) => row.some(isNumber));
  const lineOf = new Map(rows.map((row) => [row, all.indexOf(row) + 1]));
  const layout = header ? layoutFromHeader(header) : layoutWithoutHeader(rows);
  if (typeof layout === "string") return layout;

  const used = new Set([...(layout.monthColumn === null ? [] : [layout.monthColumn]), ...layout.columns.map((c) => c.index)]);
  for (const row of rows) {
    const extra = row.findIndex((c, i) => c !== "" && !used.has(i));
    if (extra >= 0) return `Line ${lineOf.get(row)} has a value ("${row[extra]}") in a column the file's layout has no place for.`;
    const bad = layout.columns.find((c) => (row[c.index] ?? "") !== "" && !isNumber(row[c.index]));
    if (bad) return `Line ${lineOf.get(row)}: the ${FIELD_WORDS[bad.field]} ("${row[bad.index]}") is not a number.`;
  }
  const read = (row: string[]): PastedMonth => Object.fromEntries(layout.columns.filter((c) => row[c.index]).map((c) => [c.field, row[c.index]]));

  if (layout.monthColumn === null) {
    if (rows.length !== 12) return `Found ${rows.length} data rows; the file needs 12 (one per month, January first).`;
    return rows.map(read);
  }
  const byMonth = new Map<number, string[]>();
  for (const row of rows) {
    const cell = row[layout.monthColumn] ?? "";
    const month = monthOf(cell);
    if (month === null) return `Line ${lineOf.get(row)}: "${cell}" is not a month (1–12 or a month's name).`;
    if (byMonth.has(month)) return `${MONTH_WORDS[month - 1]} appears twice (lines ${lineOf.get(byMonth.get(month)!)} and ${lineOf.get(row)}).`;
    byMonth.set(month, row);
  }
  const missing = MONTH_WORDS.filter((_, i) => !byMonth.has(i + 1));
  if (missing.length) return `No row for ${missing.join(", ")}: the file needs 12 rows, one per month.`;
  return MONTH_WORDS.map((_, i) => read(byMonth.get(i + 1)!));
}
