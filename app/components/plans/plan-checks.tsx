// Every check of a plan, worst first: status in a word and an icon, its kind, a plain sentence, the
// figures with units and the rule behind it. A failing check is always shown as a failure — an accepted
// override is written under it, never in place of it.
import type { ReactNode } from "react";
import { blockingFailures, sortChecks } from "~/domain/sizing/checks";
import type { CheckStatus, PlanCheck } from "~/domain/sizing/checks";
import { formatDate, formatFigure, plural } from "~/lib/plan-format";
import { CheckStatusMark, KIND_WORD } from "./check-status";

export interface PlanCheckOverrideView {
  checkId: string;
  reason: string;
  byName: string;
  /** ISO date-time string or Date. */
  at: string | Date;
}

const GROUPS: { status: CheckStatus; heading: string }[] = [
  { status: "fail", heading: "Failing" },
  { status: "warn", heading: "Warnings" },
  { status: "pass", heading: "Passing" },
];

export function PlanChecks({
  checks,
  overrides = [],
  overrideForm,
}: {
  checks: readonly PlanCheck[];
  overrides?: readonly PlanCheckOverrideView[];
  /** Rendered under every failing safety check (e.g. a form to accept it with a reason). */
  overrideForm?: (check: PlanCheck, override: PlanCheckOverrideView | null) => ReactNode;
}) {
  const sorted = sortChecks(checks);
  const accepted = new Map(overrides.filter((o) => o.reason.trim().length > 0).map((o) => [o.checkId, o]));
  const blocking = blockingFailures(checks, overrides);
  const count = (status: CheckStatus) => checks.filter((c) => c.status === status).length;
  return (
    <div>
      <p className="figures mb-1 text-sm text-ink-soft" data-testid="check-counts">
        {count("fail")} failing · {count("warn")} {plural(count("warn"), "warning")} · {count("pass")} passing
      </p>
      <p className={`mb-4 flex gap-2 text-sm font-medium ${blocking.length > 0 ? "text-fail" : "text-ink"}`} data-testid="quote-blockers">
        <span aria-hidden="true">{blocking.length > 0 ? "✕" : "✓"}</span>
        {blocking.length > 0
          ? `${blocking.length} failing safety ${plural(blocking.length, "check stops", "checks stop")} this plan from becoming a quote until the design is changed or the failure is accepted with a reason.`
          : "No failing safety check stands in the way of a quote."}
      </p>
      {GROUPS.map(({ status, heading }) => {
        const group = sorted.filter((c) => c.status === status);
        if (group.length === 0) return null;
        return (
          <section key={status} className="mb-5 last:mb-0" aria-label={`${heading} checks`}>
            <h3 className="mb-2 text-sm font-semibold uppercase tracking-wide text-ink-faint">
              {heading} <span className="figures">({group.length})</span>
            </h3>
            <ol className="space-y-3">
              {group.map((check) => {
                const needsOverride = check.kind === "safety" && check.status === "fail";
                const override = needsOverride ? (accepted.get(check.id) ?? null) : null;
                return (
                  <li key={check.id}>
                    <CheckItem check={check} override={override} form={needsOverride && overrideForm ? overrideForm(check, override) : null} />
                  </li>
                );
              })}
            </ol>
          </section>
        );
      })}
    </div>
  );
}

function CheckItem({ check, override, form }: { check: PlanCheck; override: PlanCheckOverrideView | null; form: ReactNode }) {
  const edge = check.status === "fail" ? "border-l-fail" : check.status === "warn" ? "border-l-warn" : "border-l-pass";
  return (
    <article className={`rounded-lg border border-l-4 border-rule ${edge} bg-sheet p-3`} data-check-id={check.id} data-status={check.status}>
      <header className="flex flex-wrap items-center gap-x-2 gap-y-1">
        <CheckStatusMark status={check.status} />
        <span className="text-xs font-medium uppercase tracking-wide text-ink-faint">{KIND_WORD[check.kind]}</span>
        <h4 className="font-semibold">{check.title}</h4>
      </header>
      <p className="mt-1 text-sm text-ink">{check.sentence}</p>
      {check.figures.length > 0 ? (
        <dl className="figures mt-2 flex flex-wrap gap-x-5 gap-y-1 text-sm">
          {check.figures.map((f, i) => (
            <div key={`${f.label}-${i}`} className="flex gap-1.5">
              <dt className="text-ink-soft">{f.label}</dt>
              <dd className="whitespace-nowrap font-medium">
                {formatFigure(f.value)}
                {f.unit ? <span className="font-normal text-ink-soft"> {f.unit}</span> : null}
              </dd>
            </div>
          ))}
        </dl>
      ) : null}
      <p className="mt-2 text-xs text-ink-faint">Basis: {check.basis}</p>
      {override ? (
        <p className="mt-2 rounded border border-warn bg-warn-wash px-2 py-1.5 text-sm" data-testid="override-note">
          <span aria-hidden="true">⚠ </span>
          <strong>Accepted anyway:</strong> {override.reason} — {override.byName}, {formatDate(override.at)}
        </p>
      ) : null}
      {form ? <div className="mt-2">{form}</div> : null}
    </article>
  );
}
