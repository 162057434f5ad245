// Fills the twelve irradiation cells from pasted numbers or a CSV file (month, irradiation, max, min,
// albedo — a header row is optional), so installers can bring their own weather data.
import Papa from "papaparse";
import { useState } from "react";

export interface PastedMonth {
  ghiKWhM2Day?: string;
  tMaxC?: string;
  tMinC?: string;
  albedo?: string;
}

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

export function parseMonthlyCsv(text: string): PastedMonth[] | string {
  const { data } = Papa.parse<string[]>(text.trim(), { skipEmptyLines: true });
  const rows = data.filter((row) => row.some((c) => /\d/.test(c)) && !/[a-df-z]/i.test(row.slice(1).join("")));
  if (rows.length !== 12) return `Found ${rows.length} data rows; the file needs 12 (one per month).`;
  return rows.map((row) => {
    // A first column holding the month (1–12 or a name) is skipped.
    const cells = /^\s*(\d{1,2}|[a-z]{3,})\s*$/i.test(row[0] ?? "") && row.length >= 4 ? row.slice(1) : row;
    const [ghiKWhM2Day, tMaxC, tMinC, albedo] = cells.map((c) => c.trim());
    return { ghiKWhM2Day, tMaxC, tMinC, albedo: albedo || undefined };
  });
}

export function MonthlyPaste({ onValues }: { onValues: (months: PastedMonth[]) => void }) {
  const [text, setText] = useState("");
  const [message, setMessage] = useState<string | null>(null);
  return (
    <details className="rounded-md border border-rule p-3 text-sm">
      <summary className="cursor-pointer font-medium">Paste or upload monthly data</summary>
      <label htmlFor="paste-ghi" className="mt-2 block">
        Twelve horizontal irradiation values, kWh/m² per day, January first:
      </label>
      <textarea
        id="paste-ghi"
        rows={2}
        value={text}
        onChange={(e) => setText(e.target.value)}
        className="mt-1 w-full rounded border border-rule bg-sheet p-2 font-mono text-xs"
      />
      <button
        type="button"
        className="mt-1 rounded border border-rule px-3 py-1"
        onClick={() => {
          const parsed = parseTwelveNumbers(text);
          if (typeof parsed === "string") return setMessage(parsed);
          setMessage("Filled the irradiation column.");
          onValues(parsed.map((v) => ({ ghiKWhM2Day: String(v) })));
        }}
      >
        Fill irradiation
      </button>
      <label htmlFor="upload-climate" className="mt-3 block">
        Or a CSV file with 12 rows: month, irradiation (kWh/m²/day), mean max °C, mean min °C, albedo (optional)
      </label>
      <input
        id="upload-climate"
        type="file"
        accept=".csv,text/csv"
        className="mt-1 text-xs"
        onChange={async (e) => {
          const file = e.target.files?.[0];
          if (!file) return;
          if (file.size > 100_000) return setMessage("That file is too large for 12 months of data.");
          const parsed = parseMonthlyCsv(await file.text());
          if (typeof parsed === "string") return setMessage(parsed);
          setMessage(`Filled 12 months from ${file.name}.`);
          onValues(parsed);
        }}
      />
      {message ? (
        <p className="mt-2 text-ink-soft" role="status">
          {message}
        </p>
      ) : null}
    </details>
  );
}
