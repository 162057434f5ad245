// A module's datasheet figures at STC, with the figures derived from them.
import { formatNumber } from "./figures";
import { fillFactor } from "~/domain/catalogue/derived-figures";
import type { ModuleItem } from "~/lib/catalogue-types";

export function NameplateTable({ module: m, measuredEfficiencyPct }: { module: ModuleItem; measuredEfficiencyPct: number | null }) {
  const rows: [string, string][] = [
    ["Pmax", `${formatNumber(m.pmaxW, 1)} W`],
    ["Vmp / Imp", `${formatNumber(m.vmpV, 2)} V / ${formatNumber(m.impA, 2)} A`],
    ["Voc / Isc", `${formatNumber(m.vocV, 2)} V / ${formatNumber(m.iscA, 2)} A`],
    ["Fill factor (derived)", formatNumber(fillFactor(m.pmaxW, m.vocV, m.iscA), 3)],
    ["Pmax coefficient γ", `${formatNumber(m.gammaPmaxPctPerC, 3)} %/°C`],
    ["Voc coefficient β", `${formatNumber(m.betaVocPctPerC, 3)} %/°C`],
    ["Isc coefficient α", `${formatNumber(m.alphaIscPctPerC, 3)} %/°C`],
    [m.nominalTempKind === "nmot" ? "NMOT" : "NOCT", `${formatNumber(m.noctC, 1)} °C`],
    ["Cells in series", String(m.cellsInSeries)],
    ["Length × width", `${formatNumber(m.lengthMm)} × ${formatNumber(m.widthMm)} mm`],
    ["Area (derived)", `${formatNumber(m.areaM2, 3)} m²`],
    ["Mass", `${formatNumber(m.massKg, 1)} kg`],
    [
      "Efficiency at STC (derived)",
      `${formatNumber(m.nameplateEfficiencyPct, 1)} % nameplate${measuredEfficiencyPct !== null ? ` · ${formatNumber(measuredEfficiencyPct, 1)} % measured` : ""}`,
    ],
  ];
  return (
    <dl className="figures divide-y divide-rule text-sm">
      {rows.map(([label, value]) => (
        <div key={label} className="flex justify-between gap-4 py-1.5">
          <dt className="text-ink-soft">{label}</dt>
          <dd className="text-right font-medium">{value}</dd>
        </div>
      ))}
      {m.nominalTempKind === "nmot" ? (
        <p className="pt-2 text-xs text-ink-faint">
          NMOT is measured at maximum power, so it sits a few °C below a NOCT; the yield estimate uses it in the NOCT model.
        </p>
      ) : null}
    </dl>
  );
}
