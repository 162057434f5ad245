// The module comparison's columns: price per nameplate watt and per verified watt side by side, the
// evidence behind the verified figure, and the roof area the energy target needs of each module.
import { createColumnHelper } from "@tanstack/react-table";
import { moneyValue, num, sharedColumns, Unit } from "./compare-cells";
import type { CompareColumns, CompareFeatures } from "./compare-table";
import { MoneyFigure } from "./money-figure";
import { powerOrigin, ratioStanding } from "~/domain/catalogue/derived-figures";
import type { ModuleComparisonRow } from "~/domain/sourcing/module-rows";

const h = createColumnHelper<CompareFeatures, ModuleComparisonRow>();

export const MODULE_NUMERIC = new Set(["verifiedRatio", "perNameplateW", "perVerifiedW", "areaNeeded", "unitPrice", "landed", "leadTime"]);

const STANDING = { below: { icon: "▼", word: "below" }, near: { icon: "●", word: "near" }, above: { icon: "▲", word: "above" } } as const;

export function moduleCompareColumns(): CompareColumns<ModuleComparisonRow> {
  const shared = sharedColumns<ModuleComparisonRow>();
  return [
    shared.offer,
    h.accessor((r) => r.verifiedRatio ?? undefined, {
      id: "verifiedRatio",
      header: "Power: verified ÷ nameplate",
      sortFn: "basic",
      sortUndefined: "last",
      cell: (info) => {
        const r = info.row.original;
        const standing = r.verifiedRatio === null ? null : STANDING[ratioStanding(r.verifiedRatio)];
        return (
          <span className="block whitespace-nowrap">
            {r.verifiedW === null ? <span className="text-ink-faint">no readings</span> : <Unit value={r.verifiedW} unit="W verified" decimals={1} />}
            <span className="block text-xs text-ink-soft">
              {num(r.nameplateW)} W nameplate
              {standing ? (
                <>
                  {" "}
                  · {(100 * r.verifiedRatio!).toFixed(0)} % <span aria-hidden="true">{standing.icon}</span> {standing.word}
                </>
              ) : null}
            </span>
            <span className="block text-xs text-ink-faint">{powerOrigin(r.readingCount)}</span>
          </span>
        );
      },
    }),
    h.accessor((r) => moneyValue(r.pricePerNameplateW), {
      id: "perNameplateW",
      header: "Price per nameplate W",
      sortFn: "money",
      sortUndefined: "last",
      cell: (info) => <MoneyFigure value={info.row.original.pricePerNameplateW} extraDigits={1} unit="/ W" testId="per-nameplate-w" />,
    }),
    h.accessor((r) => moneyValue(r.pricePerVerifiedW), {
      id: "perVerifiedW",
      header: "Price per verified W",
      sortFn: "money",
      sortUndefined: "last",
      cell: (info) => {
        const r = info.row.original;
        if (r.verifiedW === null) return <span className="text-xs text-ink-faint">no readings</span>;
        return <MoneyFigure value={r.pricePerVerifiedW} extraDigits={1} unit="/ W" testId="per-verified-w" />;
      },
    }),
    h.accessor("areaNeededM2", {
      id: "areaNeeded",
      header: "Area needed",
      sortFn: "basic",
      cell: (info) => {
        const r = info.row.original;
        return (
          <span className="block whitespace-nowrap">
            <Unit value={r.areaNeededM2} unit="m²" decimals={1} />
            <span className="block text-xs text-ink-soft">
              {r.quantityNeeded} modules{r.requiredArrayW === null ? " (as typed)" : ` on ${r.powerBasis} W`}
            </span>
            <span className="block text-xs text-ink-faint">
              {r.measuredDensityWm2 === null ? `${num(r.nameplateDensityWm2)} W/m² nameplate` : `${num(r.measuredDensityWm2)} W/m² measured`}
            </span>
          </span>
        );
      },
    }),
    shared.unitPrice,
    shared.landed,
    shared.delivery,
  ];
}
