// A load sweep uploaded as CSV: a voltage column and a current column, optionally a time column.
// Headers name the quantity and may give the unit: "voltage", "voltage (V)", "voltage_mV", "V",
// "current [A]", "I_mA", "time (s)", "t_ms". Without a header row the first column is voltage in
// volts and the second current in amperes. Commas or semicolons separate the fields; with
// semicolons a decimal comma is accepted. Every bad row is named by its line number.
import Papa from "papaparse";
import type { SweepPoint } from "../solar/load-sweep";

export const SWEEP_CSV_MAX_BYTES = 200 * 1024;
export const SWEEP_MAX_POINTS = 2000;
const MAX_LISTED_ROW_ERRORS = 5;

type Quantity = "voltage" | "current" | "time";
const QUANTITY_NAMES: Record<string, Quantity> = {
  voltage: "voltage",
  volts: "voltage",
  volt: "voltage",
  v: "voltage",
  u: "voltage",
  current: "current",
  amps: "current",
  i: "current",
  time: "time",
  t: "time",
  elapsed: "time",
};
const UNITS: Record<Quantity, Record<string, number>> = {
  voltage: { v: 1, mv: 1e-3 },
  current: { a: 1, ma: 1e-3 },
  time: { s: 1, ms: 1e-3 },
};
const DEFAULT_UNIT: Record<Quantity, string> = { voltage: "V", current: "A", time: "s" };

interface Column {
  index: number;
  header: string;
  /** Multiplier to V, A or s. */
  scale: number;
}

export type SweepCsvResult =
  { ok: true; points: SweepPoint[]; durationS: number | null; units: { voltage: string; current: string } } | { ok: false; message: string };

/** "Voltage (mV)" → { quantity: "voltage", unit: "mv" }; null when the header is not recognised. */
export function readHeader(header: string): { quantity: Quantity; unit: string | null } | null {
  const text = header.trim().toLowerCase();
  const bracketed = /^([a-z]+)\s*[([]\s*([a-z]+)\s*[)\]]$/.exec(text);
  const suffixed = /^([a-z]+)[\s_/-]+([a-z]+)$/.exec(text);
  const bare = /^([a-z]+)$/.exec(text);
  const [name, unit] = bracketed ? [bracketed[1], bracketed[2]] : suffixed ? [suffixed[1], suffixed[2]] : bare ? [bare[1], null] : [null, null];
  if (!name || !(name in QUANTITY_NAMES)) return null;
  return { quantity: QUANTITY_NAMES[name], unit };
}

function parseNumber(cell: string, decimalComma: boolean): number {
  const text = (decimalComma ? cell.replace(",", ".") : cell).trim();
  if (text === "" || !/^[-+]?(\d+\.?\d*|\.\d+)(e[-+]?\d+)?$/i.test(text)) return Number.NaN;
  return Number(text);
}

function listRowErrors(errors: string[]): string {
  const listed = errors.slice(0, MAX_LISTED_ROW_ERRORS).join(" ");
  const more = errors.length - MAX_LISTED_ROW_ERRORS;
  return more > 0 ? `${listed} …and ${more} more row${more === 1 ? "" : "s"}.` : listed;
}

function findColumns(firstRow: string[]): { columns: Record<Quantity, Column | null>; hasHeader: boolean } | string {
  const numeric = firstRow.length >= 2 && firstRow.slice(0, 2).every((cell) => Number.isFinite(parseNumber(cell, true)));
  if (numeric) {
    return {
      hasHeader: false,
      columns: { voltage: { index: 0, header: "column 1", scale: 1 }, current: { index: 1, header: "column 2", scale: 1 }, time: null },
    };
  }
  const columns: Record<Quantity, Column | null> = { voltage: null, current: null, time: null };
  for (const [index, header] of firstRow.entries()) {
    const read = readHeader(header);
    if (!read || columns[read.quantity]) continue;
    const unit = read.unit ?? DEFAULT_UNIT[read.quantity].toLowerCase();
    const scale = UNITS[read.quantity][unit];
    if (scale === undefined) {
      const allowed = Object.keys(UNITS[read.quantity])
        .map((u) => u.replace("v", "V").replace("a", "A"))
        .join(" or ");
      return `Column "${header.trim()}" is in ${unit}; give ${read.quantity} in ${allowed}.`;
    }
    columns[read.quantity] = { index, header: header.trim(), scale };
  }
  if (!columns.voltage || !columns.current) {
    return `The first row must name a voltage column and a current column (e.g. "voltage (V),current (A)"); it reads "${firstRow.join(",").slice(0, 80)}".`;
  }
  return { columns, hasHeader: true };
}

export function parseSweepCsv(text: string): SweepCsvResult {
  if (new TextEncoder().encode(text).length > SWEEP_CSV_MAX_BYTES) {
    return { ok: false, message: `The file is larger than ${SWEEP_CSV_MAX_BYTES / 1024} KB; a sweep needs at most ${SWEEP_MAX_POINTS} rows.` };
  }
  const parsed = Papa.parse<string[]>(text.replace(/^\uFEFF/, ""), { skipEmptyLines: false, delimitersToGuess: [",", ";", "\t"] });
  const quoteError = parsed.errors.find((e) => e.type === "Quotes");
  if (quoteError) return { ok: false, message: `Row ${(quoteError.row ?? 0) + 1}: ${quoteError.message}.` };
  const decimalComma = parsed.meta.delimiter === ";" || parsed.meta.delimiter === "\t";
  // Keep each row's line number (1-based) while skipping blank lines.
  const rows = parsed.data.map((cells, i) => ({ line: i + 1, cells })).filter((r) => r.cells.some((c) => c.trim() !== ""));
  if (rows.length === 0) return { ok: false, message: "The file is empty." };

  const found = findColumns(rows[0].cells);
  if (typeof found === "string") return { ok: false, message: found };
  const { columns, hasHeader } = found;
  const dataRows = hasHeader ? rows.slice(1) : rows;
  if (dataRows.length > SWEEP_MAX_POINTS) {
    return { ok: false, message: `The file has ${dataRows.length} data rows; a sweep may have at most ${SWEEP_MAX_POINTS}.` };
  }

  const errors: string[] = [];
  const points: SweepPoint[] = [];
  const times: number[] = [];
  for (const row of dataRows) {
    const read = (column: Column) => parseNumber(row.cells[column.index] ?? "", decimalComma) * column.scale;
    const bad = (column: Column) => `Row ${row.line}: ${column.header} "${(row.cells[column.index] ?? "").trim()}" is not a number.`;
    const voltageV = read(columns.voltage!);
    const currentA = read(columns.current!);
    if (!Number.isFinite(voltageV)) errors.push(bad(columns.voltage!));
    else if (!Number.isFinite(currentA)) errors.push(bad(columns.current!));
    else points.push({ voltageV, currentA });
    if (columns.time) {
      const timeS = read(columns.time);
      if (Number.isFinite(timeS)) times.push(timeS);
    }
  }
  if (errors.length) return { ok: false, message: listRowErrors(errors) };
  if (points.length === 0) return { ok: false, message: "The file has a header row but no data rows." };
  const durationS = times.length >= 2 ? Math.max(...times) - Math.min(...times) : null;
  return {
    ok: true,
    points,
    durationS,
    units: hasHeader
      ? { voltage: columns.voltage!.scale === 1 ? "V" : "mV", current: columns.current!.scale === 1 ? "A" : "mA" }
      : { voltage: "V", current: "A" },
  };
}
