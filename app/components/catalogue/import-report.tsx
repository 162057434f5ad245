// The result of checking a CSV file: every problem by row and column, and — only when every row is
// ready — the button that writes them all in one go.
import { Form } from "react-router";
import { SubmitButton } from "../form-field";
import { Panel } from "../page-header";
import { PART_KIND_LABELS } from "~/domain/catalogue/part-kinds";
import type { ImportReport } from "~/lib/catalogue-csv-check";

export function ImportReportPanel({ report, csvText, busy }: { report: ImportReport; csvText: string; busy: boolean }) {
  const label = PART_KIND_LABELS[report.kind];
  const clean = report.fileErrors.length === 0 && report.problems.length === 0 && report.readyCount > 0;
  const problemRows = report.problems.length;
  return (
    <Panel title="2 · What the check found">
      <p className="mb-3 text-sm" data-testid="import-summary">
        {report.rowCount} row{report.rowCount === 1 ? "" : "s"} of {label.plural.toLowerCase()}: {report.readyCount} ready
        {problemRows ? `, ${problemRows} with problems` : ""}. Nothing has been written yet.
      </p>
      {report.fileErrors.length ? (
        <ul role="alert" className="mb-3 space-y-1 rounded-md border border-fail bg-fail-wash px-3 py-2 text-sm text-fail">
          {report.fileErrors.map((e) => (
            <li key={e}>
              <span aria-hidden="true">✕</span> {e}
            </li>
          ))}
        </ul>
      ) : null}
      {problemRows ? (
        <div className="mb-4 max-h-[28rem] overflow-auto">
          <table className="figures w-full text-left text-sm">
            <thead className="sticky top-0 border-b border-rule bg-sheet text-xs text-ink-soft">
              <tr>
                <th className="py-1 pr-2 font-medium">Row</th>
                <th className="py-1 pr-2 font-medium">Part</th>
                <th className="py-1 pr-2 font-medium">Column</th>
                <th className="py-1 font-medium">Problem</th>
              </tr>
            </thead>
            <tbody className="divide-y divide-rule">
              {report.problems.flatMap((p) =>
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
      ) : null}
      {clean ? (
        <Form method="post" className="flex flex-wrap items-center gap-3">
          <input type="hidden" name="kind" value={report.kind} />
          <input type="hidden" name="csvText" value={csvText} />
          <p className="text-sm text-pass">
            <span aria-hidden="true">✓</span> Every row is ready.
          </p>
          <SubmitButton name="intent" value="import" pending={busy}>
            {`Import ${report.readyCount} ${report.readyCount === 1 ? label.singular : label.plural.toLowerCase()}`}
          </SubmitButton>
        </Form>
      ) : (
        <p className="text-sm text-ink-soft">Correct the rows in your file and check it again. The import writes all rows or none.</p>
      )}
    </Panel>
  );
}
