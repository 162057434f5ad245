// The monthly table: every figure with its unit, and where it came from.
import type { YieldResult } from "~/domain/solar/yield-types";
import { MONTH_NAMES } from "~/lib/yield-form";

const f = (value: number | null, digits: number) => (value === null ? "—" : value.toFixed(digits));
/** Gains read "+", losses "−", so the column says which way output moved. */
const signed = (value: number) => `${value > 0.05 ? "+" : value < -0.05 ? "−" : ""}${Math.abs(value).toFixed(1)}`;

export function YieldResults({ result }: { result: YieldResult }) {
  const worst = result.months[result.worstMonth - 1];
  return (
    <div>
      <dl className="mb-4 grid grid-cols-2 gap-4 sm:grid-cols-3">
        <div className="rounded-lg border border-rule bg-sheet p-3">
          <dt className="text-xs uppercase tracking-wide text-ink-faint">Per module, a year</dt>
          <dd className="figures text-figure font-semibold" data-testid="annual-kwh">
            {result.annualKWh.toFixed(1)} <span className="text-base font-normal">kWh</span>
          </dd>
        </div>
        <div className="rounded-lg border border-rule bg-sheet p-3">
          <dt className="text-xs uppercase tracking-wide text-ink-faint">Worst month</dt>
          <dd className="figures text-figure font-semibold">
            {MONTH_NAMES[result.worstMonth - 1]} <span className="text-base font-normal">{worst.energyWhPerDay.toFixed(0)} Wh/day</span>
          </dd>
        </div>
        <div className="rounded-lg border border-rule bg-sheet p-3">
          <dt className="text-xs uppercase tracking-wide text-ink-faint">Best month</dt>
          <dd className="figures text-figure font-semibold">
            {(() => {
              const best = result.months.reduce((a, b) => (b.energyWhPerDay > a.energyWhPerDay ? b : a));
              return (
                <>
                  {MONTH_NAMES[best.month - 1]} <span className="text-base font-normal">{best.energyWhPerDay.toFixed(0)} Wh/day</span>
                </>
              );
            })()}
          </dd>
        </div>
      </dl>
      <div className="overflow-x-auto">
        <table className="figures w-full text-right text-sm">
          <thead className="border-b border-rule text-xs text-ink-faint">
            <tr>
              <th className="py-2 text-left font-medium">Month</th>
              <th className="px-2 font-medium">H₀ kWh/m²/d</th>
              <th className="px-2 font-medium">Horizontal kWh/m²/d</th>
              <th className="px-2 font-medium">Diffuse share</th>
              <th className="px-2 font-medium">In-plane kWh/m²/d</th>
              <th className="px-2 font-medium">Cell °C (day)</th>
              <th className="px-2 font-medium" title="Output change from cell temperature against 25 °C">
                Temp. effect
              </th>
              <th className="px-2 font-medium">Controller</th>
              <th className="pl-2 font-medium">Energy Wh/day</th>
            </tr>
          </thead>
          <tbody className="divide-y divide-rule">
            {result.months.map((m) => (
              <tr key={m.month} className={m.month === result.worstMonth ? "bg-copper-wash" : undefined}>
                <td className="py-1.5 text-left">
                  {MONTH_NAMES[m.month - 1]}
                  {m.month === result.worstMonth ? <span className="ml-1 text-xs text-copper-dark">▼ worst</span> : null}
                </td>
                <td className="px-2">{f(m.h0KWhM2Day, 2)}</td>
                <td className="px-2">
                  {f(m.ghiKWhM2Day, 2)}
                  {m.irradianceSource === "clearness-index" ? (
                    <abbr title={`assumed from clearness index ${m.clearnessIndex.toFixed(2)}`} className="ml-0.5 text-xs text-copper-dark">
                      *
                    </abbr>
                  ) : null}
                </td>
                <td className="px-2">{f(m.diffuseFraction * 100, 0)} %</td>
                <td className="px-2">{f(m.poaKWhM2Day, 2)}</td>
                <td className="px-2">{f(m.cellTempDaytimeC, 1)}</td>
                <td className="px-2">{signed(-m.temperatureLossPct)} %</td>
                <td className="px-2">{signed(-m.controllerLossPct)} %</td>
                <td className="pl-2 font-semibold">{f(m.energyWhPerDay, 0)}</td>
              </tr>
            ))}
          </tbody>
        </table>
      </div>
      <h3 className="mt-4 text-sm font-semibold">How these figures were made</h3>
      <ul className="mt-1 list-disc space-y-0.5 pl-5 text-sm text-ink-soft" data-testid="assumptions">
        {result.assumptions.map((a) => (
          <li key={a}>{a}</li>
        ))}
      </ul>
    </div>
  );
}
