// The figures a comparison must meet, typed into the page's address (a GET form), each checked at
// its field. A saved kit plan fills them once when the page is opened from it.
import { Form } from "react-router";
import { FieldError, inputClass } from "~/components/form-field";
import type { OfferPartKind } from "~/domain/sourcing/offer-facts";
import { NEED_FIELDS, NEED_PARAMS, type NeedParam } from "~/lib/sourcing-compare-need";

const HINTS: Partial<Record<OfferPartKind, Partial<Record<NeedParam, string>>>> = {
  modules: {
    qty: "Blank: as many modules as the energy target needs.",
    sun: "Daily irradiation on the array in the design month, kWh/m².",
    losses: "Temperature, wiring, soiling, controller.",
  },
  batteries: {
    store: "Daily load × days of autonomy.",
    dod: "Blank: each battery's own usable depth.",
    qty: "Blank: each model counted for the bank.",
  },
};

export function NeedForm({
  kind,
  values,
  errors,
  sort,
}: {
  kind: OfferPartKind;
  values: Record<NeedParam, string>;
  errors: Partial<Record<NeedParam, string>>;
  sort: { id: string; dir: string };
}) {
  return (
    <Form method="get" className="flex flex-wrap items-end gap-3" aria-label="What to compare for">
      <input type="hidden" name="sort" value={sort.id} />
      <input type="hidden" name="dir" value={sort.dir} />
      {NEED_FIELDS[kind].map((param) => {
        const label =
          param === "qty" && kind === "modules"
            ? "Fixed module count (optional)"
            : param === "qty" && kind === "batteries"
              ? "Fixed battery count (optional)"
              : NEED_PARAMS[param].label;
        const hint = HINTS[kind]?.[param];
        return (
          <div key={param} className="w-48">
            <label htmlFor={`need-${param}`} className="mb-1 block text-sm font-medium">
              {label}
            </label>
            <input
              id={`need-${param}`}
              name={param}
              defaultValue={values[param]}
              inputMode="decimal"
              aria-invalid={errors[param] ? true : undefined}
              aria-describedby={errors[param] ? `need-${param}-error` : undefined}
              className={inputClass}
            />
            {hint ? <p className="mt-1 text-xs text-ink-faint">{hint}</p> : null}
            <FieldError id={`need-${param}-error`} errors={errors[param] ? [errors[param]!] : undefined} />
          </div>
        );
      })}
      <button type="submit" className="rounded-md border border-copper px-4 py-2 font-medium text-copper">
        Compare
      </button>
    </Form>
  );
}
