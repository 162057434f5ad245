// Monthly totals of the load sheet as the installer types (the load domain's own arithmetic).
import { applianceIssues, summarizeLoadSheet } from "~/domain/load/load-sheet";
import type { Appliance, InverterLoadParams } from "~/domain/load/load-sheet-types";
import { MONTH_NAMES } from "~/lib/yield-form";

export function LoadTotals({ appliances, inverter, skipped }: { appliances: Appliance[]; inverter: InverterLoadParams; skipped: number }) {
  const usable = appliances.filter((a) => Object.keys(applianceIssues(a)).length === 0);
  const summary = summarizeLoadSheet(usable, inverter);
  const heaviest = summary.months.reduce((a, b) => (b.totalWhPerDay > a.totalWhPerDay ? b : a));
  const ignored = skipped + appliances.length - usable.length;
  return (
    <div>
      <dl className="mb-3 grid grid-cols-2 gap-3 sm:grid-cols-4">
        <Figure label="Heaviest month" value={`${heaviest.totalWhPerDay.toFixed(0)} Wh/day`} note={MONTH_NAMES[heaviest.month - 1]} testId="heaviest-wh" />
        <Figure label="A year" value={`${summary.annualKWh.toFixed(0)} kWh`} />
        <Figure label="Peak AC at once" value={`${summary.peakAcW.toFixed(0)} W`} />
        <Figure
          label="Largest surge"
          value={summary.largestSurge ? `${summary.largestSurge.surgeW.toFixed(0)} W` : "—"}
          note={summary.largestSurge?.appliance}
        />
      </dl>
      {ignored > 0 ? (
        <p className="mb-2 text-sm text-warn">
          ⚠ {ignored} line{ignored === 1 ? " is" : "s are"} incomplete and left out of the totals until fixed.
        </p>
      ) : null}
      <div className="overflow-x-auto">
        <table className="figures w-full text-right text-xs">
          <thead className="text-ink-faint">
            <tr>
              <th className="text-left font-medium">Wh/day</th>
              {MONTH_NAMES.map((m) => (
                <th key={m} className="px-1 font-medium">
                  {m}
                </th>
              ))}
            </tr>
          </thead>
          <tbody>
            <Row label="DC loads" values={summary.months.map((m) => m.dcWhPerDay)} />
            <Row label="AC at appliances" values={summary.months.map((m) => m.acWhPerDay)} />
            <Row label="AC from battery" values={summary.months.map((m) => m.acFromBatteryWhPerDay)} />
            <Row label="Inverter idle" values={summary.months.map((m) => m.inverterIdleWhPerDay)} />
            <Row label="Total at battery" values={summary.months.map((m) => m.totalWhPerDay)} strong />
          </tbody>
        </table>
      </div>
      <ul className="mt-2 list-disc pl-5 text-xs text-ink-soft">
        {summary.assumptions.map((a) => (
          <li key={a}>{a}</li>
        ))}
      </ul>
    </div>
  );
}

function Figure({ label, value, note, testId }: { label: string; value: string; note?: string; testId?: string }) {
  return (
    <div className="rounded-lg border border-rule bg-sheet p-3">
      <dt className="text-xs uppercase tracking-wide text-ink-faint">{label}</dt>
      <dd className="figures text-xl font-semibold" data-testid={testId}>
        {value}
      </dd>
      {note ? <dd className="text-xs text-ink-soft">{note}</dd> : null}
    </div>
  );
}

function Row({ label, values, strong }: { label: string; values: number[]; strong?: boolean }) {
  return (
    <tr className={strong ? "border-t border-rule font-semibold" : undefined}>
      <td className="py-0.5 text-left">{label}</td>
      {values.map((v, i) => (
        <td key={i} className="px-1">
          {v.toFixed(0)}
        </td>
      ))}
    </tr>
  );
}
