// What the engine makes of the reading so far, before it is sent.
import { FlagList } from "~/components/readings/flag-list";
import { ReadingResult } from "~/components/readings/reading-result";
import type { ReadingPreview } from "~/lib/reading-preview";

export function PreviewPanel({ preview, nameplatePmaxW }: { preview: ReadingPreview; nameplatePmaxW: number | null }) {
  if (preview.state === "incomplete") {
    return <p className="text-sm text-ink-soft">The result appears here as you fill in the form. Still needed: {preview.missing.join(", ")}.</p>;
  }
  if (preview.state === "error") {
    return (
      <p role="alert" className="flex gap-2 text-sm text-fail">
        <span aria-hidden="true">✕</span>
        {preview.message}
      </p>
    );
  }
  const r = preview.evaluation.reading;
  return (
    <div className="space-y-4" aria-live="polite">
      <ReadingResult
        stcPmaxW={r.stcPmaxW}
        uncertaintyPct={r.uncertaintyPct}
        nameplatePmaxW={nameplatePmaxW ?? r.working.nameplatePmaxW}
        measuredPmaxW={r.measuredPmaxW}
        irradianceWm2={r.irradianceWm2}
        irradianceSource={r.irradianceSource}
        cellTempC={r.cellTempC}
        cellTempSource={r.working.cellTempSource}
        weight={r.weight}
        uncertaintyTerms={r.working.uncertaintyTerms}
        sunElevationDeg={r.working.sunElevationDeg}
        incidenceDeg={r.working.incidenceDeg}
      />
      <div>
        <h3 className="mb-1 text-sm font-semibold">Flags</h3>
        <FlagList flags={r.flags} empty="No flags: the conditions look good." />
        {r.flags.length ? <p className="mt-1 text-xs text-ink-faint">Flagged readings are still accepted; the curator sees each reason.</p> : null}
      </div>
    </div>
  );
}
