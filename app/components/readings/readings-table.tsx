// A team's field readings with their status (TanStack Table v9).
import { createColumnHelper, tableFeatures, useTable } from "@tanstack/react-table";
import { Link } from "react-router";
import { StatusBadge } from "./status-badge";
import { formatReadingTime } from "~/domain/readings/reading-time";
import { pct } from "~/lib/reading-labels";

export interface ReadingRow {
  id: string;
  status: "pending" | "approved" | "rejected";
  kind: "single" | "sweep";
  maker: string;
  model: string;
  nameplatePmaxW: number;
  stcPmaxW: number;
  uncertaintyPct: number;
  irradianceSource: string;
  flagCount: number;
  takenAt: string;
  utcOffsetMin: number | null;
  submitterName: string | null;
}

const features = tableFeatures({});
const column = createColumnHelper<typeof features, ReadingRow>();

const columns = column.columns([
  column.accessor("takenAt", {
    header: "Taken",
    cell: (info) => <span className="figures whitespace-nowrap">{formatReadingTime(new Date(info.getValue()), info.row.original.utcOffsetMin)}</span>,
  }),
  column.accessor((row) => `${row.maker} ${row.model}`, {
    id: "module",
    header: "Module",
    cell: (info) => (
      <Link to={`/readings/${info.row.original.id}`} className="font-medium underline">
        {info.getValue()}
      </Link>
    ),
  }),
  column.accessor("kind", { header: "Kind", cell: (info) => (info.getValue() === "sweep" ? "load sweep" : "one reading") }),
  column.accessor("stcPmaxW", {
    header: "At STC",
    cell: (info) => (
      <span className="figures whitespace-nowrap">
        {info.getValue().toFixed(1)} W ± {info.row.original.uncertaintyPct.toFixed(0)} %
      </span>
    ),
  }),
  column.accessor((row) => row.stcPmaxW / row.nameplatePmaxW, {
    id: "ratio",
    header: "Of nameplate",
    cell: (info) => <span className="figures">{pct(info.getValue())}</span>,
  }),
  column.accessor("flagCount", { header: "Flags", cell: (info) => (info.getValue() ? `⚑ ${info.getValue()}` : "none") }),
  column.accessor("status", { header: "Status", cell: (info) => <StatusBadge status={info.getValue()} /> }),
  column.accessor("submitterName", { header: "Submitted by", cell: (info) => info.getValue() ?? "—" }),
]);

export function ReadingsTable({ rows }: { rows: ReadingRow[] }) {
  const table = useTable({ features, columns, data: rows });
  return (
    <div className="overflow-x-auto">
      <table className="w-full text-left text-sm">
        <thead className="border-b border-rule text-xs uppercase tracking-wide text-ink-faint">
          {table.getHeaderGroups().map((group) => (
            <tr key={group.id}>
              {group.headers.map((header) => (
                <th key={header.id} scope="col" className="px-2 py-2 font-medium">
                  <table.FlexRender header={header} />
                </th>
              ))}
            </tr>
          ))}
        </thead>
        <tbody className="divide-y divide-rule">
          {table.getRowModel().rows.map((row) => (
            <tr key={row.id} className="hover:bg-paper">
              {row.getAllCells().map((cell) => (
                <td key={cell.id} className="px-2 py-2 align-top">
                  <table.FlexRender cell={cell} />
                </td>
              ))}
            </tr>
          ))}
        </tbody>
      </table>
    </div>
  );
}
