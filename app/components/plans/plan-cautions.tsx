// The safety panel every plan shows: the domain's cautions, then the licensed-person rule, always last.
import { useId } from "react";

export const LICENSED_PERSON_RULE = "The design must follow the local electrical code and be installed and signed off by a licensed person.";

export function PlanCautions({ cautions }: { cautions: readonly string[] }) {
  const headingId = useId();
  return (
    <aside role="note" aria-labelledby={headingId} className="rounded-xl border-2 border-warn bg-warn-wash p-4 text-sm sm:p-5">
      <h2 id={headingId} className="mb-2 flex items-center gap-2 text-base font-semibold">
        <span aria-hidden="true" className="text-lg text-warn">
          ⚠
        </span>
        Safety
      </h2>
      {cautions.length > 0 ? (
        <ul className="list-disc space-y-1.5 pl-5 text-ink">
          {cautions.map((caution) => (
            <li key={caution}>{caution}</li>
          ))}
        </ul>
      ) : null}
      <p className="mt-3 border-t border-warn/40 pt-3 font-semibold text-ink">{LICENSED_PERSON_RULE}</p>
    </aside>
  );
}
