// The plan's checks as the customer reads them: each says pass, warning or fail in words; a failing
// safety check accepted by the installer stays a failure and shows the reason recorded for it.
import { CheckStatusMark, KIND_WORD } from "~/components/plans/check-status";
import type { SnapshotCheck } from "~/domain/quotes/quote-types";

export function QuoteChecksList({ checks }: { checks: SnapshotCheck[] }) {
  const shown = checks.filter((c) => c.kind !== "advisory" || c.status !== "pass");
  return (
    <ul className="space-y-1.5 text-sm" data-testid="quote-checks">
      {shown.map((c) => (
        <li key={c.id} className="flex items-start gap-2 break-inside-avoid">
          <CheckStatusMark status={c.status} />
          <span>
            <span className="font-medium">{c.title}</span> <span className="text-ink-faint">({KIND_WORD[c.kind]})</span> — {c.sentence}
            {c.override ? (
              <span className="block text-warn">
                Accepted by {c.override.byName}: {c.override.reason}
              </span>
            ) : null}
          </span>
        </li>
      ))}
    </ul>
  );
}
