// Comparison columns for batteries, charge controllers and inverters: the figures that decide
// between them, beside the landed cost for the quantity.
import { createColumnHelper } from "@tanstack/react-table";
import { moneyValue, num, sharedColumns, Unit } from "./compare-cells";
import type { CompareColumns, CompareFeatures } from "./compare-table";
import { MoneyFigure } from "./money-figure";
import type { BatteryComparisonRow, ControllerComparisonRow, InverterComparisonRow } from "~/domain/sourcing/part-rows";

/** Headroom in words and an icon: a rating below the need says by how much it falls short. */
function Headroom({ pct, rating, need, unit, decimals = 0 }: { pct: number | null; rating: number | null; need: number; unit: string; decimals?: number }) {
  if (pct === null || rating === null) return <span className="text-xs text-ink-faint">—</span>;
  const short = pct < 0;
  return (
    <span className={`block whitespace-nowrap text-xs ${short ? "text-fail" : "text-pass"}`}>
      <span aria-hidden="true">{short ? "✕" : "✓"}</span>{" "}
      {short
        ? `${num(need - rating, decimals)} ${unit} short of ${num(need, decimals)} ${unit}`
        : `${num(pct, 0)} % headroom over ${num(need, decimals)} ${unit}`}
    </span>
  );
}

const b = createColumnHelper<CompareFeatures, BatteryComparisonRow>();
export const BATTERY_NUMERIC = new Set(["usableKWh", "cycleLife", "perUsableKWh", "perCycleKWh", "unitPrice", "landed", "leadTime"]);

/** How many of the model make the bank, and how: "for 12: 12 in series × 1 string, 12.00 kWh usable". */
function BankLine({ row, bankV }: { row: BatteryComparisonRow; bankV: number }) {
  const bank = row.bank;
  if (!bank) return null;
  return (
    <span className="block text-xs text-ink-soft" data-testid="bank-count">
      for {bank.count}: {bank.batteriesInSeries} in series × {bank.stringsInParallel} string{bank.stringsInParallel === 1 ? "" : "s"},{" "}
      {num(bank.bankUsableWh / 1000, 2)} kWh usable
      {bank.seriesExact ? null : (
        <span className="block text-fail">
          <span aria-hidden="true">✕</span> {num(row.nominalVoltageV, 1)} V blocks do not make a {bankV} V bank
        </span>
      )}
    </span>
  );
}

export function batteryCompareColumns(bankV: number): CompareColumns<BatteryComparisonRow> {
  const shared = sharedColumns<BatteryComparisonRow>();
  return [
    shared.offer,
    b.accessor("chemistry", {
      header: "Chemistry",
      sortFn: "text",
      cell: (info) => (
        <span className="whitespace-nowrap">
          {info.getValue()}
          <span className="block text-xs text-ink-faint">
            {num(info.row.original.nominalVoltageV, 1)} V · {num(info.row.original.capacityAh)} Ah
          </span>
        </span>
      ),
    }),
    b.accessor("usableKWhPerUnit", {
      id: "usableKWh",
      header: "Usable per unit",
      sortFn: "basic",
      cell: (info) => (
        <span className="block whitespace-nowrap">
          <Unit value={info.getValue()} unit="kWh" decimals={2} />
          <span className="block text-xs text-ink-faint">
            at {num(info.row.original.usableDodPct)} % depth{info.row.original.bank ? "" : `; ${num(info.row.original.usableKWhTotal, 2)} kWh in all`}
          </span>
          <BankLine row={info.row.original} bankV={bankV} />
        </span>
      ),
    }),
    b.accessor("cycleLife", { header: "Cycle life", sortFn: "basic", cell: (info) => <Unit value={info.getValue()} unit="cycles" /> }),
    b.accessor((r) => moneyValue(r.pricePerUsableKWh), {
      id: "perUsableKWh",
      header: "Price per usable kWh",
      sortFn: "money",
      sortUndefined: "last",
      cell: (info) => <MoneyFigure value={info.row.original.pricePerUsableKWh} unit="/ kWh" />,
    }),
    b.accessor((r) => moneyValue(r.pricePerCycleKWh), {
      id: "perCycleKWh",
      header: "Price per cycled kWh",
      sortFn: "money",
      sortUndefined: "last",
      cell: (info) => <MoneyFigure value={info.row.original.pricePerCycleKWh} extraDigits={2} unit="/ kWh" />,
    }),
    shared.unitPrice,
    // A model whose blocks cannot make the bank's voltage has no landed cost for this bank: it is not
    // priced, and sorts after every model that can.
    b.accessor((r) => (makesBank(r) ? moneyValue(r.landed) : undefined), {
      id: "landed",
      header: "Landed",
      sortFn: "money",
      sortUndefined: "last",
      cell: (info) => {
        if (makesBank(info.row.original)) {
          const sharedCell = shared.landed.cell as (context: typeof info) => React.ReactNode;
          return sharedCell(info);
        }
        return (
          <span className="block text-xs text-fail" data-testid="landed-none">
            not for a {bankV} V bank
          </span>
        );
      },
    }),
    shared.delivery,
  ];
}

function makesBank(row: BatteryComparisonRow) {
  return !row.bank || row.bank.seriesExact;
}

const c = createColumnHelper<CompareFeatures, ControllerComparisonRow>();
export const CONTROLLER_NUMERIC = new Set(["rated", "current", "unitPrice", "landed", "leadTime"]);

export function controllerCompareColumns(bankV: number, arrayW: number): CompareColumns<ControllerComparisonRow> {
  const shared = sharedColumns<ControllerComparisonRow>();
  return [
    shared.offer,
    c.accessor("kind", { header: "Kind", sortFn: "text", cell: (info) => <span className="uppercase">{info.getValue()}</span> }),
    c.accessor((r) => r.powerHeadroomPct ?? undefined, {
      id: "rated",
      header: `PV power at ${bankV} V`,
      sortFn: "basic",
      sortUndefined: "last",
      cell: (info) => {
        const r = info.row.original;
        if (!r.supportsVoltage)
          return (
            <span className="text-xs text-fail">
              <span aria-hidden="true">✕</span> does not charge a {bankV} V bank
            </span>
          );
        return (
          <span className="block">
            <Unit value={r.ratedPvPowerW} unit="W" />
            <Headroom pct={r.powerHeadroomPct} rating={r.ratedPvPowerW} need={arrayW} unit="W" />
          </span>
        );
      },
    }),
    c.accessor("currentHeadroomPct", {
      id: "current",
      header: "Charge current",
      sortFn: "basic",
      cell: (info) => {
        const r = info.row.original;
        return (
          <span className="block">
            <Unit value={r.maxChargeCurrentA} unit="A" />
            <Headroom pct={r.currentHeadroomPct} rating={r.maxChargeCurrentA} need={r.chargeCurrentA} unit="A" decimals={1} />
          </span>
        );
      },
    }),
    c.accessor("maxPvVocV", { header: "Max PV Voc", sortFn: "basic", cell: (info) => <Unit value={info.getValue()} unit="V" /> }),
    shared.unitPrice,
    shared.landed,
    shared.delivery,
  ];
}

const i = createColumnHelper<CompareFeatures, InverterComparisonRow>();
export const INVERTER_NUMERIC = new Set(["continuous", "efficiency", "perKW", "unitPrice", "landed", "leadTime"]);

export function inverterCompareColumns(bankV: number, peakW: number): CompareColumns<InverterComparisonRow> {
  const shared = sharedColumns<InverterComparisonRow>();
  return [
    shared.offer,
    i.accessor("continuousHeadroomPct", {
      id: "continuous",
      header: "Continuous / surge",
      sortFn: "basic",
      cell: (info) => {
        const r = info.row.original;
        return (
          <span className="block">
            <Unit value={r.continuousW} unit="W" /> / <Unit value={r.surgeW} unit="W" />
            <Headroom pct={r.continuousHeadroomPct} rating={r.continuousW} need={peakW} unit="W" />
          </span>
        );
      },
    }),
    i.accessor("dcInputVoltageV", {
      header: "DC input",
      sortFn: "basic",
      cell: (info) =>
        info.row.original.voltageMatches ? (
          <span className="whitespace-nowrap text-pass">
            <span aria-hidden="true">✓</span> {info.getValue()} V
          </span>
        ) : (
          <span className="whitespace-nowrap text-fail">
            <span aria-hidden="true">✕</span> {info.getValue()} V, bank is {bankV} V
          </span>
        ),
    }),
    i.accessor("efficiencyPct", {
      id: "efficiency",
      header: "Efficiency",
      sortFn: "basic",
      cell: (info) => (
        <span className="block whitespace-nowrap">
          <Unit value={info.getValue()} unit="%" decimals={1} />
          <span className="block text-xs text-ink-faint">idle {num(info.row.original.idleDrawW, 1)} W</span>
        </span>
      ),
    }),
    i.accessor((r) => moneyValue(r.pricePerKW), {
      id: "perKW",
      header: "Price per continuous kW",
      sortFn: "money",
      sortUndefined: "last",
      cell: (info) => <MoneyFigure value={info.row.original.pricePerKW} unit="/ kW" />,
    }),
    shared.unitPrice,
    shared.landed,
    shared.delivery,
  ];
}
