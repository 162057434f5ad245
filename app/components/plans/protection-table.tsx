// Fuses and breakers: where each goes, its rating, how many, and the rule that set it.
import type { ProtectionItem } from "~/domain/sizing/plan-types";
import { formatNumber } from "~/lib/plan-format";

export function ProtectionTable({ items }: { items: readonly ProtectionItem[] }) {
  return (
    <div className="overflow-x-auto">
      <table className="figures w-full min-w-[36rem] text-sm">
        <thead className="border-b border-rule text-xs text-ink-faint">
          <tr>
            <th scope="col" className="py-2 text-left font-medium">
              Where
            </th>
            <th scope="col" className="px-2 text-right font-medium">
              Rating
            </th>
            <th scope="col" className="px-2 text-right font-medium">
              Count
            </th>
            <th scope="col" className="pl-2 text-left font-medium">
              Basis
            </th>
          </tr>
        </thead>
        <tbody className="divide-y divide-rule">
          {items.map((item) => (
            <tr key={item.id} className="align-top *:py-1.5" data-protection={item.id}>
              <th scope="row" className="py-1.5 text-left font-normal">
                {item.where}
              </th>
              <td className="px-2 text-right whitespace-nowrap font-medium">
                {item.ratingA === null ? (
                  <span className="text-fail">
                    <span aria-hidden="true">✕ </span>no standard rating large enough
                  </span>
                ) : (
                  `${formatNumber(item.ratingA)} A`
                )}
              </td>
              <td className="px-2 text-right">{item.count}</td>
              <td className="pl-2 text-xs text-ink-soft">{item.basis}</td>
            </tr>
          ))}
        </tbody>
      </table>
    </div>
  );
}
