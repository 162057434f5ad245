// The result of checking a CSV file: every problem by row and column, and — only when every row is
// ready — the button that writes them all in one go.
import { Form } from "react-router";
import { SubmitButton } from "../form-field";
import { Panel } from "../page-header";
import { CsvFileErrors, CsvProblemsTable } from "../csv-check-findings";
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
      <CsvFileErrors errors={report.fileErrors} />
      <CsvProblemsTable problems={report.problems} subject="Part" />
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
