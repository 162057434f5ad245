// What a CSV import reads: a link to an empty template and each column with what it holds. Shared by
// the catalogue and the offer imports.
import { inputClass } from "~/components/form-field";
export interface CsvColumnHelp {
  header: string;
  what: string;
  required?: boolean;
}

export function CsvTemplateLink({ csv, fileName }: { csv: string; fileName: string }) {
  return (
    <a href={`data:text/csv;charset=utf-8,${encodeURIComponent(csv)}`} download={fileName} className="text-copper underline">
      Download an empty template
    </a>
  );
}

export function CsvColumnsList({ columns }: { columns: readonly CsvColumnHelp[] }) {
  return (
    <dl className="divide-y divide-rule text-sm">
      {columns.map((c) => (
        <div key={c.header} className="flex justify-between gap-3 py-1.5">
          <dt className="font-mono text-xs">{c.header}</dt>
          <dd className="text-right text-ink-soft">
            {c.what}
            {c.required ? "" : " (optional)"}
          </dd>
        </div>
      ))}
    </dl>
  );
}

/** The two ways to give an import its CSV: a file, or its contents pasted (fields `file`, `csvText`). */
export function CsvSourceFields({ fileLabel }: { fileLabel: string }) {
  return (
    <>
      <div>
        <label htmlFor="csv-file" className="mb-1 block text-sm font-medium">
          {fileLabel}
        </label>
        <input
          id="csv-file"
          type="file"
          name="file"
          accept=".csv,text/csv"
          className="block text-sm text-ink-soft file:mr-3 file:rounded-md file:border file:border-rule file:bg-sheet file:px-3 file:py-1.5 file:text-ink hover:file:bg-paper-deep"
        />
      </div>
      <div>
        <label htmlFor="csv-text" className="mb-1 block text-sm font-medium">
          …or paste its contents
        </label>
        <textarea id="csv-text" name="csvText" rows={6} className={`${inputClass} font-mono text-xs`} />
      </div>
    </>
  );
}
