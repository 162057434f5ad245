// Twelve rows of monthly climate: irradiation (or clearness index), air temperatures, albedo.
import type { MonthRow, YieldFormState } from "~/lib/yield-form";
import { MONTH_NAMES } from "~/lib/yield-form";
import { NumberInput } from "./number-input";

export function ClimateTable({
  state,
  errors,
  onMonth,
}: {
  state: YieldFormState;
  errors: Record<string, string>;
  onMonth: (index: number, patch: Partial<MonthRow>) => void;
}) {
  const measured = state.irradianceSource === "measured";
  return (
    <table className="w-full text-sm">
      <thead className="text-xs text-ink-faint">
        <tr>
          <th className="text-left font-medium">Month</th>
          <th className="font-medium">{measured ? "Horizontal kWh/m²/day" : "Clearness index"}</th>
          <th className="font-medium">Max °C</th>
          <th className="font-medium">Min °C</th>
          <th className="font-medium">Albedo</th>
        </tr>
      </thead>
      <tbody>
        {state.months.map((m, i) => {
          const path = `site.months.${i}`;
          const name = MONTH_NAMES[i];
          return (
            <tr key={name} className="align-top">
              <td className="py-1 pr-2 font-medium">{name}</td>
              <td className="px-1 py-0.5">
                {measured ? (
                  <NumberInput
                    compact
                    id={`ghi-${i}`}
                    label={`${name} horizontal irradiation`}
                    unit="kWh/m²/day"
                    value={m.ghi}
                    onChange={(v) => onMonth(i, { ghi: v })}
                    error={errors[`${path}.ghiKWhM2Day`] ?? errors[path]}
                  />
                ) : (
                  <NumberInput
                    compact
                    id={`kt-${i}`}
                    label={`${name} clearness index`}
                    value={m.kt}
                    onChange={(v) => onMonth(i, { kt: v })}
                    error={errors[`${path}.clearnessIndex`] ?? errors[path]}
                  />
                )}
              </td>
              <td className="px-1 py-0.5">
                <NumberInput
                  compact
                  id={`tmax-${i}`}
                  label={`${name} mean daily maximum`}
                  unit="°C"
                  value={m.tMax}
                  onChange={(v) => onMonth(i, { tMax: v })}
                  error={errors[`${path}.tMaxC`]}
                />
              </td>
              <td className="px-1 py-0.5">
                <NumberInput
                  compact
                  id={`tmin-${i}`}
                  label={`${name} mean daily minimum`}
                  unit="°C"
                  value={m.tMin}
                  onChange={(v) => onMonth(i, { tMin: v })}
                  error={errors[`${path}.tMinC`]}
                />
              </td>
              <td className="px-1 py-0.5">
                <NumberInput
                  compact
                  id={`albedo-${i}`}
                  label={`${name} albedo`}
                  value={m.albedo}
                  onChange={(v) => onMonth(i, { albedo: v })}
                  error={errors[`${path}.albedo`]}
                />
              </td>
            </tr>
          );
        })}
      </tbody>
    </table>
  );
}
