// Every moderation decision on a reading: who, when and why.
import { StatusBadge } from "./status-badge";

export interface DecisionEntry {
  id: string;
  decision: "approved" | "rejected";
  reason: string;
  decidedAt: Date | string;
  curatorName: string | null;
}

export function DecisionTimeline({
  decisions,
  submittedAt,
  submitterName,
}: {
  decisions: DecisionEntry[];
  submittedAt: Date | string;
  submitterName: string | null;
}) {
  return (
    <ol className="space-y-3 border-l-2 border-rule pl-4 text-sm" aria-label="Decisions">
      <li>
        <p className="text-ink-soft">
          <span className="figures">{new Date(submittedAt).toISOString().slice(0, 16).replace("T", " ")} UTC</span> — submitted by{" "}
          {submitterName ?? "a former user"}
        </p>
      </li>
      {decisions.map((d) => (
        <li key={d.id}>
          <p className="flex flex-wrap items-center gap-2">
            <StatusBadge status={d.decision} />
            <span className="figures text-ink-soft">{new Date(d.decidedAt).toISOString().slice(0, 16).replace("T", " ")} UTC</span>
            <span>by {d.curatorName ?? "a former curator"}</span>
          </p>
          <p className="mt-1">“{d.reason}”</p>
        </li>
      ))}
      {decisions.length === 0 ? <li className="text-ink-faint">No decision yet: the reading waits in the curator's queue.</li> : null}
    </ol>
  );
}
