// Formatting for the kit plan page: numbers with a true minus sign, check figures at a sensible
// precision, dates that read the same on the server and in the browser. Presentation only — no physics.
import { MONTH_NAMES } from "~/domain/sizing/format";

export { MONTH_NAMES };
export const MONTH_SHORT = MONTH_NAMES.map((m) => m.slice(0, 3));

/** Fixed decimals with a true minus sign; thousands grouped (en-GB) unless `group` is false; "—" when unknown. */
export function formatNumber(value: number | null | undefined, digits = 0, group = true): string {
  if (value === null || value === undefined || !Number.isFinite(value)) return "—";
  const rounded = Number(value.toFixed(digits));
  const text = Math.abs(rounded).toLocaleString("en-GB", { minimumFractionDigits: digits, maximumFractionDigits: digits, useGrouping: group });
  return rounded < 0 ? `−${text}` : text;
}

/**
 * A check figure as the domain gives it (full precision): whole numbers as they are (seeds, counts,
 * ratings); other values with a tenth of a unit up to 1000 (a string's 101.7 V against a 100 V limit
 * must not read "102"), more decimals for small values; never in scientific notation.
 */
export function formatFigure(value: number): string {
  if (!Number.isFinite(value)) return "—";
  if (Number.isInteger(value)) return formatNumber(value, 0, false);
  const size = Math.abs(value);
  const digits = size >= 1000 ? 0 : size >= 10 ? 1 : size >= 1 ? 2 : 3;
  return formatNumber(value, digits, false);
}

/** "3 in series × 2 strings" (modules) — the words a plan's layout is read in. */
export function layoutWords(inSeries: number, inParallel: number, what: "string" | "battery string" = "string"): string {
  return `${inSeries} in series × ${inParallel} ${what}${inParallel === 1 ? "" : "s"}`;
}

export function plural(count: number, one: string, many = `${one}s`): string {
  return count === 1 ? one : many;
}

const DATE_FORMAT = new Intl.DateTimeFormat("en-GB", { day: "numeric", month: "short", year: "numeric", timeZone: "UTC" });

/** A date as "1 Dec 2026", the same on the server and in any browser (UTC). */
export function formatDate(at: string | Date): string {
  const date = typeof at === "string" ? new Date(at) : at;
  return Number.isNaN(date.getTime()) ? String(at) : DATE_FORMAT.format(date);
}

/** Index (0-based day of the year) where each month begins, from the simulation's month-of-day list. */
export function monthStartDays(monthOfDay: readonly number[]): { month: number; dayIndex: number }[] {
  const starts: { month: number; dayIndex: number }[] = [];
  monthOfDay.forEach((month, dayIndex) => {
    if (dayIndex === 0 || monthOfDay[dayIndex - 1] !== month) starts.push({ month, dayIndex });
  });
  return starts;
}

/** "12 Jan" for a day of the simulated year (0-based), from the month-of-day list. */
export function dayLabel(monthOfDay: readonly number[], dayIndex: number): string {
  const month = monthOfDay[dayIndex];
  let first = dayIndex;
  while (first > 0 && monthOfDay[first - 1] === month) first--;
  return `${dayIndex - first + 1} ${MONTH_SHORT[month - 1] ?? ""}`.trim();
}
