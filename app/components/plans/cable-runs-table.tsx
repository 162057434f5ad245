// The DC cable runs: conductor, length, current, voltage drop against its target and the fuse or
// breaker that protects it.
import type { CableRunSizing } from "~/domain/sizing/cables";
import { formatNumber } from "~/lib/plan-format";

export function CableRunsTable({ cables }: { cables: readonly CableRunSizing[] }) {
  return (
    <div className="overflow-x-auto">
      <table className="figures w-full min-w-[44rem] text-right text-sm">
        <thead className="border-b border-rule text-xs text-ink-faint">
          <tr>
            <th scope="col" className="py-2 text-left font-medium">
              Run
            </th>
            <th scope="col" className="px-2 text-left font-medium">
              Conductor
            </th>
            <th scope="col" className="px-2 font-medium">
              One way
            </th>
            <th scope="col" className="px-2 font-medium">
              Current
            </th>
            <th scope="col" className="px-2 font-medium">
              Voltage drop
            </th>
            <th scope="col" className="pl-2 font-medium">
              Fuse / breaker
            </th>
          </tr>
        </thead>
        <tbody className="divide-y divide-rule">
          {cables.map((run) => (
            <tr key={run.id} className="align-top *:py-1.5" data-run={run.id}>
              <th scope="row" className="py-1.5 text-left font-normal">
                {run.label}
                <span className="block text-xs text-ink-faint">at {formatNumber(run.voltageV, 1)} V</span>
              </th>
              <td className="px-2 text-left">
                {run.conductor ? (
                  <>
                    <span className="whitespace-nowrap font-medium">{run.conductor.label}</span>
                    <span className="block text-xs text-ink-faint">
                      {run.limitedBy === "current" ? "sized for current" : "sized for voltage drop"} · carries {formatNumber(run.conductor.ampacityA)} A, needs
                      ≥ {formatNumber(run.minAmpacityA, 1)} A
                    </span>
                  </>
                ) : (
                  <span className="text-fail">
                    <span aria-hidden="true">✕ </span>None in the table carries {formatNumber(run.minAmpacityA, 1)} A — split the run or ask a specialist
                  </span>
                )}
              </td>
              <td className="px-2 whitespace-nowrap">{formatNumber(run.oneWayLengthM, 1)} m</td>
              <td className="px-2 whitespace-nowrap">
                {formatNumber(run.operatingCurrentA, 1)} A<span className="block text-xs text-ink-faint">max {formatNumber(run.maxCircuitCurrentA, 1)} A</span>
              </td>
              <td className="px-2 whitespace-nowrap">
                {run.dropPct === null ? "—" : `${formatNumber(run.dropPct, 2)} %`}
                <span className="text-ink-faint"> / {formatNumber(run.dropTargetPct, 1)} % target</span>
                {run.dropPct === null ? null : run.meetsDropTarget ? (
                  <span className="block text-xs text-pass">
                    <span aria-hidden="true">✓ </span>within target ({formatNumber(run.dropV, 2)} V)
                  </span>
                ) : (
                  <span className="block text-xs text-warn">
                    <span aria-hidden="true">⚠ </span>over target ({formatNumber(run.dropV, 2)} V)
                  </span>
                )}
              </td>
              <td className="pl-2 whitespace-nowrap">
                {run.protectionA === null ? (
                  <span className="text-fail">
                    <span aria-hidden="true">✕ </span>above the standard ratings
                  </span>
                ) : (
                  `${formatNumber(run.protectionA)} A`
                )}
              </td>
            </tr>
          ))}
        </tbody>
      </table>
    </div>
  );
}
