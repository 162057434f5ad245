// One editable appliance line of the load sheet.
import { MONTH_NAMES } from "~/lib/yield-form";

export interface ApplianceDraft {
  key: string;
  name: string;
  powerW: string;
  quantity: string;
  hoursPerDay: string;
  daysPerWeek: string;
  circuit: "ac" | "dc";
  surgeW: string;
  months: number[];
}

const cell = "w-full rounded border border-rule bg-sheet px-1.5 py-1 text-sm aria-[invalid]:border-fail";

export function ApplianceRow({
  row,
  index,
  errors,
  onChange,
  onRemove,
}: {
  row: ApplianceDraft;
  index: number;
  errors: Record<string, string>;
  onChange: (patch: Partial<ApplianceDraft>) => void;
  onRemove: () => void;
}) {
  const err = (field: string) => errors[`appliances.${index}.${field}`];
  const input = (field: keyof ApplianceDraft, label: string, extra = "") => (
    <td className="px-1 py-1 align-top">
      <input
        aria-label={`${label}, line ${index + 1}`}
        value={row[field] as string}
        inputMode={field === "name" ? undefined : "decimal"}
        aria-invalid={err(field) ? true : undefined}
        onChange={(e) => onChange({ [field]: e.target.value })}
        className={`${cell} ${extra}`}
      />
      {err(field) ? <p className="mt-0.5 text-xs text-fail">✕ {err(field)}</p> : null}
    </td>
  );
  return (
    <tr className="border-b border-rule">
      {input("name", "Appliance")}
      {input("powerW", "Power W", "text-right figures")}
      {input("quantity", "How many at once", "text-right figures")}
      {input("hoursPerDay", "Hours per day", "text-right figures")}
      {input("daysPerWeek", "Days per week", "text-right figures")}
      <td className="px-1 py-1 align-top">
        <select
          aria-label={`Circuit, line ${index + 1}`}
          value={row.circuit}
          onChange={(e) => onChange({ circuit: e.target.value as "ac" | "dc" })}
          className={cell}
        >
          <option value="ac">AC</option>
          <option value="dc">DC</option>
        </select>
      </td>
      {input("surgeW", "Surge W", "text-right figures")}
      <td className="px-1 py-1 align-top">
        <details>
          <summary className="cursor-pointer text-xs">
            {row.months.length === 12 ? "all year" : row.months.map((m) => MONTH_NAMES[m - 1]).join(" ") || "none"}
          </summary>
          <div className="mt-1 grid grid-cols-4 gap-1 text-xs">
            {MONTH_NAMES.map((name, i) => (
              <label key={name} className="inline-flex items-center gap-0.5">
                <input
                  type="checkbox"
                  checked={row.months.includes(i + 1)}
                  onChange={(e) =>
                    onChange({ months: e.target.checked ? [...row.months, i + 1].sort((a, b) => a - b) : row.months.filter((m) => m !== i + 1) })
                  }
                />
                {name}
              </label>
            ))}
          </div>
        </details>
        {err("months") ? <p className="mt-0.5 text-xs text-fail">✕ {err("months")}</p> : null}
      </td>
      <td className="px-1 py-1 align-top">
        <button type="button" onClick={onRemove} aria-label={`Remove line ${index + 1}`} className="rounded px-2 py-1 text-fail hover:bg-fail-wash">
          ✕
        </button>
      </td>
    </tr>
  );
}
