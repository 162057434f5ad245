// The module table's columns: what a buyer compares — nameplate watts, power density on the
// nameplate and as measured, the verified ratio and how many readings it rests on.
import { createColumnHelper } from "@tanstack/react-table";
import { Link } from "react-router";
import type { CatalogueColumns, CatalogueFeatures } from "./data-table";
import { formatNumber, Num, RatioBadge } from "./figures";
import type { ModuleItem } from "~/lib/catalogue-types";

const helper = createColumnHelper<CatalogueFeatures, ModuleItem>();

export const MODULE_NUMERIC_COLUMNS = new Set([
  "pmaxW",
  "vocV",
  "nameplateDensityWm2",
  "measuredDensityWm2",
  "nameplateEfficiencyPct",
  "verifiedPmaxW",
  "verifiedRatio",
  "readingCount",
]);

export function moduleColumns(canEdit: boolean): CatalogueColumns<ModuleItem> {
  const columns: CatalogueColumns<ModuleItem> = [
    helper.accessor("maker", {
      header: "Model",
      cell: (info) => {
        const m = info.row.original;
        return (
          <span className="block min-w-44">
            <Link to={`/catalogue/modules/${m.id}`} className="font-medium text-ink underline decoration-rule hover:decoration-copper">
              {m.maker} {m.model}
            </Link>
            <span className="block text-xs text-ink-faint">
              {m.cellTechnology} · {m.cellsInSeries} cells
            </span>
          </span>
        );
      },
    }),
    helper.accessor("pmaxW", { header: "Nameplate", cell: (info) => <Num value={info.getValue()} unit="W" /> }),
    helper.accessor("vocV", { header: "Voc", cell: (info) => <Num value={info.getValue()} unit="V" decimals={1} /> }),
    helper.accessor("nameplateDensityWm2", { header: "W/m² nameplate", cell: (info) => <Num value={info.getValue()} /> }),
    helper.accessor("measuredDensityWm2", { header: "W/m² measured", cell: (info) => <Num value={info.getValue()} /> }),
    helper.accessor("nameplateEfficiencyPct", { header: "Efficiency", cell: (info) => <Num value={info.getValue()} unit="%" decimals={1} /> }),
    helper.accessor("verifiedPmaxW", {
      header: "Verified",
      cell: (info) => (info.getValue() === null ? <span className="text-xs text-ink-faint">—</span> : <Num value={info.getValue()} unit="W" decimals={1} />),
    }),
    helper.accessor("verifiedRatio", {
      header: "Verified ÷ nameplate",
      cell: (info) => (info.getValue() === null ? <span className="text-xs text-ink-faint">—</span> : <RatioBadge ratio={info.getValue()} compact />),
    }),
    helper.accessor("readingCount", {
      header: "Readings",
      cell: (info) => {
        const m = info.row.original;
        if (m.readingCount === 0) return <span className="text-xs text-ink-faint">none yet</span>;
        return (
          <span className="whitespace-nowrap">
            {m.readingCount}
            {m.spreadPct !== null ? <span className="block text-xs text-ink-faint">spread ±{formatNumber(m.spreadPct, 1)} %</span> : null}
          </span>
        );
      },
    }),
  ];
  if (canEdit) {
    columns.push(
      helper.display({
        id: "edit",
        header: () => <span className="sr-only">Curator actions</span>,
        cell: (info) => (
          <Link to={`/catalogue/modules/${info.row.original.id}/edit`} className="text-xs text-copper underline">
            Edit
          </Link>
        ),
      }),
    );
  }
  return columns;
}
