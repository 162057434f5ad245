// Inputs for the catalogue's edit forms: a number with its unit beside it, a choice from a list,
// and a titled group. Each shows its error right under the field (Conform field metadata).
import { getInputProps, getSelectProps, type FieldMetadata } from "@conform-to/react";
import type { ReactNode } from "react";
import { FieldError, inputClass } from "../form-field";

export function NumberField({ field, label, unit, hint }: { field: FieldMetadata<unknown>; label: ReactNode; unit?: string; hint?: string }) {
  const { key, ...props } = getInputProps(field as FieldMetadata<string>, { type: "text" });
  return (
    <div>
      <label htmlFor={field.id} className="mb-1 block text-sm font-medium">
        {label}
      </label>
      <div className="flex items-center gap-2">
        <input key={key} {...props} inputMode="decimal" autoComplete="off" className={`${inputClass} figures`} />
        {unit ? <span className="w-14 shrink-0 text-sm text-ink-soft">{unit}</span> : null}
      </div>
      {hint ? <p className="mt-1 text-xs text-ink-faint">{hint}</p> : null}
      <FieldError id={field.errorId} errors={field.errors} />
    </div>
  );
}

export function TextInput({ field, label }: { field: FieldMetadata<unknown>; label: ReactNode }) {
  const { key, ...props } = getInputProps(field as FieldMetadata<string>, { type: "text" });
  return (
    <div>
      <label htmlFor={field.id} className="mb-1 block text-sm font-medium">
        {label}
      </label>
      <input key={key} {...props} autoComplete="off" className={inputClass} />
      <FieldError id={field.errorId} errors={field.errors} />
    </div>
  );
}

export function SelectField({ field, label, options }: { field: FieldMetadata<unknown>; label: ReactNode; options: readonly (readonly [string, string])[] }) {
  const { key, ...props } = getSelectProps(field as FieldMetadata<string>);
  return (
    <div>
      <label htmlFor={field.id} className="mb-1 block text-sm font-medium">
        {label}
      </label>
      <select key={key} {...props} className={inputClass}>
        <option value="">Choose…</option>
        {options.map(([value, text]) => (
          <option key={value} value={value}>
            {text}
          </option>
        ))}
      </select>
      <FieldError id={field.errorId} errors={field.errors} />
    </div>
  );
}

export function FieldGroup({ title, children, note }: { title: string; children: ReactNode; note?: ReactNode }) {
  return (
    <fieldset className="rounded-lg border border-rule p-4">
      <legend className="px-1 text-sm font-semibold">{title}</legend>
      <div className="grid gap-4 sm:grid-cols-2">{children}</div>
      {note ? <div className="mt-3 text-xs text-ink-faint">{note}</div> : null}
    </fieldset>
  );
}
