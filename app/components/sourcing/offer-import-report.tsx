// What checking an offer CSV found: every problem by row and column, new suppliers, offers that will
// be added or updated, and — only when every row is ready — the button that writes them all.
import { Form } from "react-router";
import { SubmitButton } from "../form-field";
import { Panel } from "../page-header";
import { CsvFileErrors, CsvProblemsTable } from "../csv-check-findings";
import type { OfferImportReport } from "~/lib/sourcing-types";

export function OfferImportReportPanel({ report, csvText, busy }: { report: OfferImportReport; csvText: string; busy: boolean }) {
  const clean = report.fileErrors.length === 0 && report.problems.length === 0 && report.readyCount > 0;
  return (
    <Panel title="2 · What the check found">
      <p className="mb-3 text-sm" data-testid="import-summary">
        {report.rowCount} row{report.rowCount === 1 ? "" : "s"}: {report.readyCount} ready
        {report.expiredKept.length ? `, ${report.expiredKept.length} expired offer${report.expiredKept.length === 1 ? "" : "s"} you already have` : ""}
        {report.problems.length ? `, ${report.problems.length} with problems` : ""}. Nothing has been written yet.
      </p>
      <CsvFileErrors errors={report.fileErrors} />
      <CsvProblemsTable problems={report.problems} subject="Offer" />
      {report.readyCount ? (
        <ul className="mb-3 space-y-1 text-sm" data-testid="import-effects">
          {report.newSuppliers.map((s) => (
            <li key={s.name}>
              <span aria-hidden="true">+</span> New supplier: <strong>{s.name}</strong> ({s.currency})
            </li>
          ))}
          <li>
            <span aria-hidden="true">+</span> {report.newOffers} new offer{report.newOffers === 1 ? "" : "s"}
          </li>
          {report.updatedOffers ? (
            <li>
              <span aria-hidden="true">→</span> {report.updatedOffers} existing offer{report.updatedOffers === 1 ? "" : "s"} get the file's terms
            </li>
          ) : null}
        </ul>
      ) : null}
      {report.expiredKept.length ? (
        <ul className="mb-3 space-y-1 text-sm text-ink-soft" data-testid="import-expired-kept">
          {report.expiredKept.map((k) => (
            <li key={k.row}>
              <span aria-hidden="true">ℹ</span> Row {k.row} · {k.label}: expired on {k.validUntil}, the same as the offer you have. It stays as it is (kept,
              flagged and left out of comparisons); nothing is written for this row.
            </li>
          ))}
        </ul>
      ) : null}
      {report.warnings.map((w) => (
        <p key={w} className="mb-2 text-sm text-warn">
          <span aria-hidden="true">⚠</span> {w}
        </p>
      ))}
      {clean ? (
        <Form method="post" className="flex flex-wrap items-center gap-3">
          <input type="hidden" name="csvText" value={csvText} />
          <p className="text-sm text-pass">
            <span aria-hidden="true">✓</span> Every row is ready.
          </p>
          <SubmitButton name="intent" value="import" pending={busy}>
            {`Import ${report.readyCount} offer${report.readyCount === 1 ? "" : "s"}`}
          </SubmitButton>
        </Form>
      ) : report.fileErrors.length === 0 && report.problems.length === 0 && report.expiredKept.length ? (
        <p className="text-sm text-ink-soft">Nothing to write: every row is an expired offer you already have.</p>
      ) : (
        <p className="text-sm text-ink-soft">Correct the rows in your file and check it again. The import writes all rows or none.</p>
      )}
    </Panel>
  );
}
