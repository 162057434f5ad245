// What was measured: one operating point, or a load sweep uploaded as CSV and analysed at once.
import { getInputProps, type FieldMetadata } from "@conform-to/react";
import { FieldError } from "~/components/form-field";
import { SweepChart } from "~/components/readings/sweep-chart";
import { SWEEP_CSV_MAX_BYTES, SWEEP_MAX_POINTS } from "~/domain/readings/sweep-csv";
import type { SweepPreview } from "~/lib/reading-preview";
import { UnitField } from "./unit-field";

interface Fields {
  kind: FieldMetadata<string | undefined>;
  measuredPmaxW: FieldMetadata<number | undefined>;
  measuredVoltageV: FieldMetadata<number | undefined>;
  measuredCurrentA: FieldMetadata<number | undefined>;
  sweepFile: FieldMetadata<File | undefined>;
  sweepDurationS: FieldMetadata<number | undefined>;
}

export function MeasuredFields({
  fields,
  kind,
  onKind,
  onSweepFile,
  sweep,
}: {
  fields: Fields;
  kind: "single" | "sweep";
  onKind: (kind: "single" | "sweep") => void;
  onSweepFile: (file: File | null) => void;
  sweep: SweepPreview;
}) {
  const { key: fileKey, ...fileProps } = getInputProps(fields.sweepFile, { type: "file" });
  return (
    <div className="space-y-4">
      <fieldset>
        <legend className="mb-1 text-sm font-medium">What did you measure?</legend>
        <div className="flex flex-wrap gap-4">
          {(
            [
              ["sweep", "A load sweep (CSV file)"],
              ["single", "One reading (power, or voltage and current)"],
            ] as const
          ).map(([value, label]) => (
            <label key={value} className="flex items-center gap-2 text-sm">
              <input type="radio" name={fields.kind.name} value={value} checked={kind === value} onChange={() => onKind(value)} />
              {label}
            </label>
          ))}
        </div>
        <FieldError id={fields.kind.errorId} errors={fields.kind.errors} />
      </fieldset>

      {kind === "single" ? (
        <div className="grid gap-3 sm:grid-cols-3">
          <UnitField field={fields.measuredPmaxW} label="Power" unit="W" hint="At the maximum power point." />
          <UnitField field={fields.measuredVoltageV} label="or voltage" unit="V" />
          <UnitField field={fields.measuredCurrentA} label="and current" unit="A" />
        </div>
      ) : (
        <div className="space-y-3">
          <div>
            <label htmlFor={fields.sweepFile.id} className="mb-1 block text-sm font-medium">
              Sweep file <span className="font-normal text-ink-faint">(CSV)</span>
            </label>
            <input
              key={fileKey}
              {...fileProps}
              accept=".csv,.txt,text/csv,text/plain"
              onChange={(e) => onSweepFile(e.currentTarget.files?.[0] ?? null)}
              className="block w-full text-sm file:mr-3 file:rounded-md file:border file:border-rule file:bg-paper-deep file:px-3 file:py-1.5"
            />
            <p className="mt-1 text-xs text-ink-faint">
              Columns: <code>voltage</code> in volts (V) and <code>current</code> in amperes (A), one row per point; mV and mA are accepted when the header says
              so, e.g. <code>voltage (mV)</code>. An optional <code>time (s)</code> column gives the sweep's duration. Without a header row, column 1 is volts
              and column 2 amperes. At most {SWEEP_MAX_POINTS} points, {SWEEP_CSV_MAX_BYTES / 1024} KB.
            </p>
            <FieldError id={fields.sweepFile.errorId} errors={fields.sweepFile.errors} />
          </div>
          <UnitField field={fields.sweepDurationS} label="Sweep duration" unit="s" optional hint="If the file has no time column." />
          <SweepSummary sweep={sweep} />
        </div>
      )}
    </div>
  );
}

function SweepSummary({ sweep }: { sweep: SweepPreview }) {
  if (sweep.state === "none") return null;
  if (sweep.state === "error") {
    return (
      <p role="alert" className="flex gap-2 rounded-md border border-fail bg-fail-wash px-3 py-2 text-sm text-fail">
        <span aria-hidden="true">✕</span>
        {sweep.message}
      </p>
    );
  }
  const a = sweep.sweep.analysis;
  const figures: [string, string][] = [
    ["Pmax", `${a.pmaxW.toFixed(1)} W`],
    ["Vmp", `${a.vmpV.toFixed(2)} V`],
    ["Imp", `${a.impA.toFixed(2)} A`],
    ["Voc", `${a.vocV.toFixed(2)} V${a.vocExtrapolated ? " (extrapolated)" : ""}`],
    ["Isc", `${a.iscA.toFixed(2)} A${a.iscExtrapolated ? " (extrapolated)" : ""}`],
    ["Fill factor", a.fillFactor.toFixed(3)],
  ];
  return (
    <div className="space-y-2" aria-label="Sweep analysis">
      <dl className="grid grid-cols-3 gap-2 text-sm sm:grid-cols-6">
        {figures.map(([label, value]) => (
          <div key={label}>
            <dt className="text-xs text-ink-faint">{label}</dt>
            <dd className="figures font-semibold" data-testid={`sweep-${label.toLowerCase().replace(" ", "-")}`}>
              {value}
            </dd>
          </div>
        ))}
      </dl>
      <p className="text-xs text-ink-faint">
        {a.pointCount} points{sweep.sweep.durationS !== null ? `, ${sweep.sweep.durationS.toFixed(2)} s` : ""}, as measured (not yet at STC).
      </p>
      <SweepChart points={sweep.sweep.points} mpp={{ vmpV: a.vmpV, impA: a.impA, pmaxW: a.pmaxW }} height={220} />
    </div>
  );
}
