// "How this plan was made": the domain's own notes on methods, sources and simplifications.
import { useId } from "react";

export function PlanAssumptions({ assumptions }: { assumptions: readonly string[] }) {
  const headingId = useId();
  return (
    <section aria-labelledby={headingId}>
      <h3 id={headingId} className="mb-1 text-sm font-semibold">
        How this plan was made
      </h3>
      {assumptions.length > 0 ? (
        <ul className="list-disc space-y-1 pl-5 text-sm text-ink-soft" data-testid="plan-assumptions">
          {assumptions.map((note, i) => (
            <li key={`${i}-${note.slice(0, 24)}`}>{note}</li>
          ))}
        </ul>
      ) : (
        <p className="text-sm text-ink-faint">No notes were recorded with this plan.</p>
      )}
    </section>
  );
}
