// The ten cheapest kits that meet every check: total landed cost, what it saves or costs more than the
// current kit, cost per delivered kWh, the parts with their counts and offers, what differs from the
// plan, and a button to use the kit.
import { Form } from "react-router";
import { formatMoney, money } from "~/domain/money/money";
import type { alternativesJson } from "~/lib/alternatives-view";

type View = NonNullable<ReturnType<typeof alternativesJson>>;
type Row = View["alternatives"][number];

function PartLine({ label, part, currency }: { label: string; part: Row["module"]; currency: string }) {
  return (
    <li data-testid={`part-${label.toLowerCase()}`}>
      <span className="text-ink-faint">{label}:</span> {part.quantity} × {part.label}{" "}
      <span className="text-ink-faint">
        ({part.supplierName}, <span className="figures">{formatMoney(money(part.landedCost, currency))}</span> landed)
      </span>
    </li>
  );
}

export function AlternativesTable({ view, pending }: { view: View; pending: boolean }) {
  const c = view.currency;
  return (
    <div className="overflow-x-auto">
      <table className="w-full text-sm">
        <thead>
          <tr className="border-b border-rule text-left text-ink-soft">
            <th className="py-2 pr-3">#</th>
            <th className="py-2 pr-3">Total landed cost</th>
            <th className="py-2 pr-3">Against your kit</th>
            <th className="py-2 pr-3">Cost per delivered kWh</th>
            <th className="py-2 pr-3">Parts and counts</th>
            <th className="py-2 pr-3">What differs from the plan</th>
            <th className="py-2" />
          </tr>
        </thead>
        <tbody>
          {view.alternatives.map((a) => (
            <tr key={a.rank} className="border-b border-rule align-top" data-testid="alternative-row">
              <td className="py-3 pr-3 figures">{a.rank}</td>
              <td className="py-3 pr-3 figures font-semibold whitespace-nowrap" data-testid="total-landed">
                {formatMoney(money(a.totalLandedCost, c))}
              </td>
              <td className="py-3 pr-3 figures whitespace-nowrap" data-testid="against-current">
                {a.againstCurrentKit ? (
                  a.againstCurrentKit.words
                ) : (
                  <span className="text-ink-faint" title={view.currentKit.sentence}>
                    not known
                  </span>
                )}
              </td>
              <td className="py-3 pr-3 figures whitespace-nowrap">
                {a.costPerDeliveredKWh} {c}/kWh
                <div className="text-xs text-ink-faint">over {a.lifetimeYears} years</div>
              </td>
              <td className="py-3 pr-3">
                <ul className="space-y-0.5">
                  <PartLine label="Modules" part={a.module} currency={c} />
                  <PartLine label="Controller" part={a.controller} currency={c} />
                  <PartLine label="Batteries" part={a.battery} currency={c} />
                  {a.inverter ? <PartLine label="Inverter" part={a.inverter} currency={c} /> : <li className="text-ink-faint">No inverter (DC loads only)</li>}
                  <li className="text-ink-faint">
                    Layout {a.layout.modulesInSeries} in series × {a.layout.stringsInParallel} {a.layout.stringsInParallel === 1 ? "string" : "strings"};{" "}
                    {a.batteryStrings} battery {a.batteryStrings === 1 ? "string" : "strings"}
                  </li>
                </ul>
              </td>
              <td className="py-3 pr-3">
                <ul className="list-disc space-y-0.5 pl-4">
                  {a.differences.map((d) => (
                    <li key={d}>{d}</li>
                  ))}
                </ul>
                <p className="mt-1 text-xs">
                  {a.warnings === 0 ? (
                    <span className="text-pass">✓ Every check passes</span>
                  ) : (
                    <span className="text-warn">⚠ Every check passes or warns ({a.warnings} to read)</span>
                  )}
                </p>
              </td>
              <td className="py-3">
                <Form method="post">
                  <input type="hidden" name="moduleId" value={a.module.id} />
                  <input type="hidden" name="controllerId" value={a.controller.id} />
                  <input type="hidden" name="batteryId" value={a.battery.id} />
                  <input type="hidden" name="inverterId" value={a.inverter?.id ?? ""} />
                  <input type="hidden" name="modulesInSeries" value={a.layout.modulesInSeries} />
                  <input type="hidden" name="stringsInParallel" value={a.layout.stringsInParallel} />
                  <input type="hidden" name="batteryStrings" value={a.batteryStrings} />
                  <button
                    type="submit"
                    disabled={pending}
                    className="rounded-md bg-copper px-3 py-1.5 font-medium whitespace-nowrap text-sheet hover:bg-copper-dark disabled:cursor-wait disabled:opacity-60"
                  >
                    {pending ? "Working…" : "Use this kit"}
                  </button>
                </Form>
              </td>
            </tr>
          ))}
        </tbody>
      </table>
    </div>
  );
}
