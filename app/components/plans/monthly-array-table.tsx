// Month by month: what one module gives, what the load takes, what the array must deliver with the
// margin, how many modules that month alone needs, and how far the chosen array covers it.
import type { KitPlan } from "~/domain/sizing/plan-types";
import { MONTH_SHORT, formatNumber } from "~/lib/plan-format";
import { powerBasisWords } from "./plan-parts";

export function MonthlyArrayTable({ plan, verifiedReadingCount }: { plan: KitPlan; verifiedReadingCount?: number | null }) {
  const { array } = plan;
  return (
    <div>
      <div className="overflow-x-auto">
        <table className="figures w-full min-w-[40rem] text-right text-sm">
          <caption className="sr-only">Energy, load and modules needed by month</caption>
          <thead className="border-b border-rule text-xs text-ink-faint">
            <tr>
              <th scope="col" className="py-2 text-left font-medium">
                Month
              </th>
              <th scope="col" className="px-2 font-medium">
                Per module Wh/day
              </th>
              <th scope="col" className="px-2 font-medium">
                Load Wh/day
              </th>
              <th scope="col" className="px-2 font-medium">
                Required Wh/day
              </th>
              <th scope="col" className="px-2 font-medium">
                Modules needed
              </th>
              <th scope="col" className="px-2 font-medium">
                Array Wh/day
              </th>
              <th scope="col" className="pl-2 font-medium">
                Coverage
              </th>
            </tr>
          </thead>
          <tbody className="divide-y divide-rule">
            {array.months.map((m) => {
              const isDesign = m.month === array.designMonth;
              const short = m.coverage !== null && m.coverage < 1 - 1e-9;
              return (
                <tr key={m.month} className={isDesign ? "bg-copper-wash" : undefined} data-month={m.month}>
                  <th scope="row" className="py-1.5 text-left font-normal">
                    {MONTH_SHORT[m.month - 1]}
                    {isDesign ? <span className="ml-1 text-xs font-medium text-copper-dark">▼ design month</span> : null}
                  </th>
                  <td className="px-2">{formatNumber(m.energyPerModuleWhPerDay)}</td>
                  <td className="px-2">{formatNumber(m.loadWhPerDay)}</td>
                  <td className="px-2">{formatNumber(m.requiredArrayWhPerDay)}</td>
                  <td className="px-2">{m.modulesNeeded === null ? <span className="text-fail">no sun</span> : formatNumber(m.modulesNeeded, 2)}</td>
                  <td className="px-2">{formatNumber(m.arrayWhPerDay)}</td>
                  <td className={`pl-2 ${short ? "font-semibold text-warn" : ""}`}>
                    {m.coverage === null ? "—" : `${formatNumber(100 * m.coverage)} %`}
                    {short ? <span className="ml-1 text-xs">⚠ short</span> : null}
                  </td>
                </tr>
              );
            })}
          </tbody>
        </table>
      </div>
      <p className="mt-2 text-xs text-ink-faint">
        Per module: one module's energy to the battery on the month's average day, after losses and shade, on{" "}
        {formatNumber(array.modulePmaxUsedW, array.modulePmaxUsedW % 1 === 0 ? 0 : 1)} W ({powerBasisWords(array.powerBasisUsed, verifiedReadingCount)}).
        Required: the load ÷ the battery's round-trip efficiency, plus the design margin. Coverage: the chosen {array.layout.moduleCount}-module array's energy
        ÷ what is required (100 % is exactly enough with the margin).
      </p>
    </div>
  );
}
