// What checking an offer CSV found: every problem by row and column, new suppliers, offers that will
// be added or updated, and — only when every row is ready — the button that writes them all.
import { Form } from "react-router";
import { SubmitButton } from "../form-field";
import { Panel } from "../page-header";
import type { OfferImportReport } from "~/lib/sourcing-types";

export function OfferImportReportPanel({ report, csvText, busy }: { report: OfferImportReport; csvText: string; busy: boolean }) {
  const clean = report.fileErrors.length === 0 && report.problems.length === 0 && report.readyCount > 0;
  return (
    <Panel title="2 · What the check found">
      <p className="mb-3 text-sm" data-testid="import-summary">
        {report.rowCount} row{report.rowCount === 1 ? "" : "s"}: {report.readyCount} ready
        {report.problems.length ? `, ${report.problems.length} with problems` : ""}. Nothing has been written yet.
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
      {report.problems.length ? (
        <div className="mb-4 max-h-[28rem] overflow-auto">
          <table className="figures w-full text-left text-sm" data-testid="import-problems">
            <thead className="sticky top-0 border-b border-rule bg-sheet text-xs text-ink-soft">
              <tr>
                <th className="py-1 pr-2 font-medium">Row</th>
                <th className="py-1 pr-2 font-medium">Offer</th>
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
      ) : (
        <p className="text-sm text-ink-soft">Correct the rows in your file and check it again. The import writes all rows or none.</p>
      )}
    </Panel>
  );
}
