// The site's twelve months: irradiation (unless a sky preset is chosen), air temperatures, albedo.
import { getInputProps, type FieldMetadata } from "@conform-to/react";
import { FieldError } from "~/components/form-field";
import { MONTH_NAMES } from "~/lib/yield-form";

interface MonthFields {
  ghiKWhM2Day?: number;
  tMaxC: number;
  tMinC: number;
  albedo?: number;
}

const cell = "w-full rounded border border-rule bg-sheet px-1.5 py-1 text-right text-sm figures aria-[invalid]:border-fail";

export function SiteClimateTable({ months, measured }: { months: FieldMetadata<MonthFields[] | undefined>; measured: boolean }) {
  const list = months.getFieldList();
  return (
    <table className="w-full text-sm">
      <thead className="text-xs text-ink-faint">
        <tr>
          <th className="text-left font-medium">Month</th>
          {measured ? <th className="font-medium">Horizontal kWh/m²/day</th> : null}
          <th className="font-medium">Mean max °C</th>
          <th className="font-medium">Mean min °C</th>
          <th className="font-medium">Albedo (optional)</th>
        </tr>
      </thead>
      <tbody>
        {list.map((month, i) => {
          const f = month.getFieldset();
          const name = MONTH_NAMES[i];
          return (
            <tr key={month.key} className="align-top">
              <td className="py-1 pr-2 font-medium">{name}</td>
              {measured ? (
                <td className="px-1 py-0.5">
                  <input
                    {...getInputProps(f.ghiKWhM2Day, { type: "text" })}
                    inputMode="decimal"
                    aria-label={`${name} horizontal irradiation, kWh/m² per day`}
                    className={cell}
                  />
                  <FieldError errors={f.ghiKWhM2Day.errors} />
                </td>
              ) : null}
              <td className="px-1 py-0.5">
                <input {...getInputProps(f.tMaxC, { type: "text" })} inputMode="decimal" aria-label={`${name} mean daily maximum, °C`} className={cell} />
                <FieldError errors={f.tMaxC.errors} />
              </td>
              <td className="px-1 py-0.5">
                <input {...getInputProps(f.tMinC, { type: "text" })} inputMode="decimal" aria-label={`${name} mean daily minimum, °C`} className={cell} />
                <FieldError errors={f.tMinC.errors} />
              </td>
              <td className="px-1 py-0.5">
                <input {...getInputProps(f.albedo, { type: "text" })} inputMode="decimal" aria-label={`${name} albedo`} className={cell} />
                <FieldError errors={f.albedo.errors} />
              </td>
            </tr>
          );
        })}
      </tbody>
    </table>
  );
}
