// The sky-preset caveat as a small notice, in the one wording of app/domain/solar/sky-assumption.ts:
// beside a plan's figures, on the site page and in the customer's quote.
import { skyAssumptionSentence, type SkyAssumption } from "~/domain/solar/sky-assumption";

export function SkyAssumptionNote({ assumption, className = "" }: { assumption: SkyAssumption | null | undefined; className?: string }) {
  if (!assumption) return null;
  return (
    <p className={`flex gap-1.5 rounded-md border border-warn bg-warn-wash px-3 py-2 text-sm text-ink ${className}`} data-testid="sky-assumption">
      <span aria-hidden="true" className="text-warn">
        ⚠
      </span>
      <span>
        <span className="font-semibold">Assumption: </span>
        {skyAssumptionSentence(assumption)}
      </span>
    </p>
  );
}
