import { Link } from "react-router";

export interface HistoryRow {
  revision: number;
  note: string;
  created_at: Date | string;
  failing_safety_checks: number;
  byName: string | null;
}

export function PlanHistory({ planId, history, current }: { planId: string; history: HistoryRow[]; current: number }) {
  return (
    <ol className="divide-y divide-rule text-sm">
      {history.map((h) => (
        <li key={h.revision} className="flex flex-wrap justify-between gap-2 py-2">
          <span>
            {h.revision === current ? (
              <strong>Revision {h.revision} (shown)</strong>
            ) : (
              <Link to={`/plans/${planId}?revision=${h.revision}`} className="underline">
                Revision {h.revision}
              </Link>
            )}{" "}
            — {h.note}
          </span>
          <span className="text-ink-faint">
            {new Date(h.created_at).toISOString().slice(0, 16).replace("T", " ")} UTC{h.byName ? ` · ${h.byName}` : ""} ·{" "}
            {h.failing_safety_checks ? `✕ ${h.failing_safety_checks} safety check${h.failing_safety_checks === 1 ? "" : "s"} failing` : "✓ safety checks pass"}
          </span>
        </li>
      ))}
    </ol>
  );
}
