// The latest approved readings as numbers (the chart's values for those who read tables).
import { Panel } from "../page-header";
import { formatNumber } from "./figures";
import type { ReadingPoint } from "~/lib/catalogue-types";

const SOURCE_WORDS = { pyranometer: "pyranometer", "reference-cell": "reference cell", "clear-sky-estimate": "clear-sky estimate" } as const;
const SHOWN = 20;

export function ReadingsList({ points, nameplateW }: { points: ReadingPoint[]; nameplateW: number }) {
  const latest = points.slice(-SHOWN).reverse();
  return (
    <Panel title={points.length > SHOWN ? `Latest ${SHOWN} readings` : "Readings"}>
      <table className="figures w-full text-left text-sm">
        <thead className="border-b border-rule text-xs text-ink-soft">
          <tr>
            <th className="py-1 pr-2 font-medium">#</th>
            <th className="py-1 pr-2 font-medium">Taken</th>
            <th className="py-1 pr-2 font-medium">Irradiance</th>
            <th className="py-1 pr-2 text-right font-medium">At STC</th>
            <th className="py-1 text-right font-medium">÷ nameplate</th>
          </tr>
        </thead>
        <tbody className="divide-y divide-rule">
          {latest.map((p) => (
            <tr key={p.index}>
              <td className="py-1 pr-2 text-ink-faint">{p.index}</td>
              <td className="py-1 pr-2">{p.takenAt.slice(0, 10)}</td>
              <td className="py-1 pr-2 text-ink-soft">{SOURCE_WORDS[p.irradianceSource]}</td>
              <td className="py-1 pr-2 text-right">{formatNumber(p.stcPmaxW, 1)} W</td>
              <td className="py-1 text-right">{formatNumber((100 * p.stcPmaxW) / nameplateW, 0)} %</td>
            </tr>
          ))}
        </tbody>
      </table>
    </Panel>
  );
}
