// What a CSV import reads: a link to an empty template and each column with what it holds. Shared by
// the catalogue and the offer imports.
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
