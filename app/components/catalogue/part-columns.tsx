// Columns for batteries, charge controllers and inverters.
import { createColumnHelper } from "@tanstack/react-table";
import { Link } from "react-router";
import type { CatalogueColumns, CatalogueFeatures } from "./data-table";
import { formatNumber, Num } from "./figures";
import { CHEMISTRY_LABELS, type PartKind } from "~/domain/catalogue/part-kinds";
import type { BatteryItem, ControllerItem, InverterItem } from "~/lib/catalogue-types";

function modelCell(kind: PartKind, item: { id: string; maker: string; model: string }, note: string, canEdit: boolean) {
  return (
    <span className="block min-w-44">
      <span className="font-medium">
        {item.maker} {item.model}
      </span>
      <span className="block text-xs text-ink-faint">
        {note}
        {canEdit ? (
          <>
            {" · "}
            <Link to={`/catalogue/${kind}/${item.id}/edit`} className="text-copper underline">
              Edit
            </Link>
          </>
        ) : null}
      </span>
    </span>
  );
}

const battery = createColumnHelper<CatalogueFeatures, BatteryItem>();
export const BATTERY_NUMERIC = new Set(["nominalVoltageV", "capacityAh", "energyKWh", "usableEnergyKWh", "cycleLife", "roundTripEfficiencyPct", "massKg"]);

export function batteryColumns(canEdit: boolean): CatalogueColumns<BatteryItem> {
  return [
    battery.accessor("maker", { header: "Model", cell: (i) => modelCell("batteries", i.row.original, CHEMISTRY_LABELS[i.row.original.chemistry], canEdit) }),
    battery.accessor("nominalVoltageV", { header: "Nominal", cell: (i) => <Num value={i.getValue()} unit="V" decimals={1} /> }),
    battery.accessor("capacityAh", {
      header: "Capacity",
      cell: (i) => (
        <span>
          <Num value={i.getValue()} unit="Ah" />
          <span className="block text-xs text-ink-faint">at C{formatNumber(i.row.original.capacityHourRateH)}</span>
        </span>
      ),
    }),
    battery.accessor("energyKWh", { header: "Stored", cell: (i) => <Num value={i.getValue()} unit="kWh" decimals={2} /> }),
    battery.accessor("usableEnergyKWh", {
      header: "Usable",
      cell: (i) => (
        <span>
          <Num value={i.getValue()} unit="kWh" decimals={2} />
          <span className="block text-xs text-ink-faint">at {formatNumber(i.row.original.usableDodPct)} % DoD</span>
        </span>
      ),
    }),
    battery.accessor("cycleLife", { header: "Cycle life", cell: (i) => <Num value={i.getValue()} unit="cycles" /> }),
    battery.accessor("roundTripEfficiencyPct", { header: "Round trip", cell: (i) => <Num value={i.getValue()} unit="%" /> }),
    battery.accessor("massKg", { header: "Mass", cell: (i) => <Num value={i.getValue()} unit="kg" decimals={1} /> }),
  ];
}

const controller = createColumnHelper<CatalogueFeatures, ControllerItem>();
export const CONTROLLER_NUMERIC = new Set(["maxPvVocV", "maxChargeCurrentA", "efficiencyPct"]);

export function controllerColumns(canEdit: boolean): CatalogueColumns<ControllerItem> {
  return [
    controller.accessor("maker", { header: "Model", cell: (i) => modelCell("controllers", i.row.original, i.row.original.kind.toUpperCase(), canEdit) }),
    controller.accessor("batteryVoltagesV", {
      header: "Battery banks",
      enableSorting: false,
      cell: (i) => <span className="whitespace-nowrap">{i.getValue().join(" / ")} V</span>,
    }),
    controller.accessor("maxPvVocV", { header: "Max PV input", cell: (i) => <Num value={i.getValue()} unit="V" /> }),
    controller.accessor("maxChargeCurrentA", { header: "Max charge", cell: (i) => <Num value={i.getValue()} unit="A" /> }),
    controller.accessor("maxPvPowerW", {
      header: "Max PV power",
      enableSorting: false,
      cell: (i) => (
        <span className="figures block whitespace-nowrap text-xs">
          {Object.entries(i.getValue() as Record<string, number>).map(([v, w]) => (
            <span key={v} className="block">
              {formatNumber(w)} W at {v} V
            </span>
          ))}
        </span>
      ),
    }),
    controller.accessor("efficiencyPct", { header: "Efficiency", cell: (i) => <Num value={i.getValue()} unit="%" decimals={1} /> }),
  ];
}

const inverter = createColumnHelper<CatalogueFeatures, InverterItem>();
export const INVERTER_NUMERIC = new Set(["continuousW", "surgeW", "dcInputVoltageV", "efficiencyPct", "idleDrawW"]);

export function inverterColumns(canEdit: boolean): CatalogueColumns<InverterItem> {
  return [
    inverter.accessor("maker", { header: "Model", cell: (i) => modelCell("inverters", i.row.original, "inverter", canEdit) }),
    inverter.accessor("continuousW", { header: "Continuous", cell: (i) => <Num value={i.getValue()} unit="W" /> }),
    inverter.accessor("surgeW", { header: "Surge", cell: (i) => <Num value={i.getValue()} unit="W" /> }),
    inverter.accessor("dcInputVoltageV", { header: "Battery", cell: (i) => <Num value={i.getValue()} unit="V" /> }),
    inverter.accessor("efficiencyPct", { header: "Efficiency", cell: (i) => <Num value={i.getValue()} unit="%" decimals={1} /> }),
    inverter.accessor("idleDrawW", { header: "Idle draw", cell: (i) => <Num value={i.getValue()} unit="W" decimals={1} /> }),
  ];
}
