// Labelled inputs with the error message right under the field (Conform field metadata).
import { getInputProps, type FieldMetadata } from "@conform-to/react";
import type { ReactNode } from "react";

export function FieldError({ id, errors }: { id?: string; errors?: string[] }) {
  if (!errors?.length) return null;
  return (
    <p id={id} className="mt-1 flex gap-1 text-sm text-fail">
      <span aria-hidden="true">✕</span>
      {errors.join(" ")}
    </p>
  );
}

export const inputClass =
  "block w-full rounded-md border border-rule bg-sheet px-3 py-2 text-ink shadow-inner outline-none focus:border-copper aria-[invalid]:border-fail";

export function TextField({
  field,
  label,
  type = "text",
  hint,
  autoComplete,
}: {
  // Any scalar field: text, e-mail, numbers typed as text.
  field: FieldMetadata<any, any, string[]>;
  label: ReactNode;
  type?: "text" | "email" | "password" | "number";
  hint?: string;
  autoComplete?: string;
}) {
  return (
    <div>
      <label htmlFor={field.id} className="mb-1 block text-sm font-medium">
        {label}
      </label>
      <input {...getInputProps(field, { type })} autoComplete={autoComplete} className={inputClass} />
      {hint ? <p className="mt-1 text-xs text-ink-faint">{hint}</p> : null}
      <FieldError id={field.errorId} errors={field.errors} />
    </div>
  );
}

export function FormErrors({ errors }: { errors?: string[] }) {
  if (!errors?.length) return null;
  return (
    <div role="alert" className="flex gap-2 rounded-md border border-fail bg-fail-wash px-3 py-2 text-sm text-fail">
      <span aria-hidden="true">✕</span>
      <span>{errors.join(" ")}</span>
    </div>
  );
}

export function SubmitButton({ children, pending, name, value }: { children: ReactNode; pending?: boolean; name?: string; value?: string }) {
  return (
    <button
      type="submit"
      name={name}
      value={value}
      disabled={pending}
      className="rounded-md bg-copper px-4 py-2 font-medium text-sheet hover:bg-copper-dark disabled:cursor-wait disabled:opacity-60"
    >
      {pending ? "Working…" : children}
    </button>
  );
}
