// A labelled number input with its unit beside the label, conform-managed.
import { getInputProps, type FieldMetadata } from "@conform-to/react";
import type { ReactNode } from "react";
import { FieldError, inputClass } from "~/components/form-field";

export function UnitField({
  field,
  label,
  unit,
  hint,
  optional,
  type = "text",
}: {
  field: FieldMetadata<number | string | undefined>;
  label: string;
  unit?: string;
  hint?: ReactNode;
  optional?: boolean;
  type?: "text" | "datetime-local";
}) {
  const { key, ...props } = getInputProps(field, { type });
  return (
    <div>
      <label htmlFor={field.id} className="mb-1 block text-sm font-medium">
        {label}
        {unit ? <span className="font-normal text-ink-faint"> ({unit})</span> : null}
        {optional ? <span className="font-normal text-ink-faint"> — optional</span> : null}
      </label>
      <input key={key} {...props} inputMode={type === "text" ? "decimal" : undefined} className={`${inputClass} figures`} />
      {hint ? <p className="mt-1 text-xs text-ink-faint">{hint}</p> : null}
      <FieldError id={field.errorId} errors={field.errors} />
    </div>
  );
}

export function TextInputField({ field, label, hint }: { field: FieldMetadata<string | undefined>; label: string; hint?: ReactNode }) {
  const { key, ...props } = getInputProps(field, { type: "text" });
  return (
    <div>
      <label htmlFor={field.id} className="mb-1 block text-sm font-medium">
        {label}
      </label>
      <input key={key} {...props} className={inputClass} />
      {hint ? <p className="mt-1 text-xs text-ink-faint">{hint}</p> : null}
      <FieldError id={field.errorId} errors={field.errors} />
    </div>
  );
}
