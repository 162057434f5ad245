// What a CSV check found, shared by every import (catalogue parts, supplier offers): problems with the
// file as a whole, then every problem by row and column. Nothing is written until all rows are ready.
export interface CsvRowProblem {
  row: number;
  label: string;
  errors: { column: string; message: string }[];
}

export function CsvFileErrors({ errors }: { errors: readonly string[] }) {
  if (!errors.length) return null;
  return (
    <ul role="alert" className="mb-3 space-y-1 rounded-md border border-fail bg-fail-wash px-3 py-2 text-sm text-fail">
      {errors.map((e) => (
        <li key={e}>
          <span aria-hidden="true">✕</span> {e}
        </li>
      ))}
    </ul>
  );
}

export function CsvProblemsTable({ problems, subject }: { problems: readonly CsvRowProblem[]; subject: string }) {
  if (!problems.length) return null;
  return (
    <div className="mb-4 max-h-[28rem] overflow-auto">
      <table className="figures w-full text-left text-sm" data-testid="import-problems">
        <thead className="sticky top-0 border-b border-rule bg-sheet text-xs text-ink-soft">
          <tr>
            <th className="py-1 pr-2 font-medium">Row</th>
            <th className="py-1 pr-2 font-medium">{subject}</th>
            <th className="py-1 pr-2 font-medium">Column</th>
            <th className="py-1 font-medium">Problem</th>
          </tr>
        </thead>
        <tbody className="divide-y divide-rule">
          {problems.flatMap((p) =>
            p.errors.map((e, i) => (
              <tr key={`${p.row}-${i}`} data-row={p.row}>
                <td className="py-1 pr-2 align-top font-medium">{i === 0 ? p.row : ""}</td>
                <td className="py-1 pr-2 align-top">{i === 0 ? p.label : ""}</td>
                <td className="py-1 pr-2 align-top font-mono text-xs">{e.column}</td>
                <td className="py-1 align-top text-fail">
                  <span aria-hidden="true">✕</span> {e.message}
                </td>
              </tr>
            )),
          )}
        </tbody>
      </table>
    </div>
  );
}
