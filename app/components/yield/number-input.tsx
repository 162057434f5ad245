import { inputClass } from "~/components/form-field";

export function NumberInput({
  id,
  label,
  unit,
  value,
  onChange,
  error,
  hint,
  compact,
}: {
  id: string;
  label: string;
  unit?: string;
  value: string;
  onChange: (value: string) => void;
  error?: string;
  hint?: string;
  compact?: boolean;
}) {
  return (
    <div>
      <label htmlFor={id} className={compact ? "sr-only" : "mb-1 block text-sm font-medium"}>
        {label}
        {unit ? <span className="font-normal text-ink-faint"> ({unit})</span> : null}
      </label>
      <input
        id={id}
        inputMode="decimal"
        value={value}
        onChange={(e) => onChange(e.target.value)}
        aria-invalid={error ? true : undefined}
        aria-describedby={error ? `${id}-error` : undefined}
        className={`${inputClass} figures ${compact ? "px-1.5 py-1 text-right text-sm" : ""}`}
      />
      {hint ? <p className="mt-1 text-xs text-ink-faint">{hint}</p> : null}
      {error ? (
        <p id={`${id}-error`} className="mt-0.5 text-xs text-fail">
          ✕ {error}
        </p>
      ) : null}
    </div>
  );
}
