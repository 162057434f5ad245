// Fills the twelve irradiation cells from pasted numbers or a CSV file (month, irradiation, max, min,
// albedo — a header row and the month column are optional), so installers can bring their own weather
// data. The parsing is in app/lib/monthly-data.ts.
import { useState } from "react";
import { parseMonthlyCsv, parseTwelveNumbers, type PastedMonth } from "~/lib/monthly-data";

export type { PastedMonth };

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
        Or a CSV file with 12 rows: month, irradiation (kWh/m²/day), mean max °C, mean min °C, albedo (optional). With a month column (1–12 or names) the rows
        may come in any order; without one, January comes first.
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
